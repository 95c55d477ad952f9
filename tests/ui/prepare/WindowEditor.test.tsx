// @vitest-environment happy-dom
import { render } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import type { RunWindow } from '../../../src/run/index.ts';
import { WindowEditor } from '../../../src/ui/prepare/WindowEditor.tsx';

let host: HTMLElement;
afterEach(() => {
  render(null, host);
  host.remove();
});

const windows: RunWindow[] = [
  { receiver: 1, fromC: 68, toC: 72, compound: 'n-hexane', volumeMl: 40 },
  { receiver: 2, fromC: 72, toC: 110, compound: null, volumeMl: 2 },
  { receiver: 3, fromC: 110, toC: 111, compound: 'toluene', volumeMl: 50 },
];

function mount(unit: 'degC' | 'degF', separator: '.' | ',') {
  const changes: Array<RunWindow[] | null> = [];
  host = document.createElement('div');
  document.body.append(host);
  render(<WindowEditor windows={windows} receivers={[]} unit={unit} separator={separator} isEdited={false} onChange={(w) => changes.push(w)} />, host);
  return changes;
}

async function type(label: string, value: string) {
  const field = [...host.querySelectorAll('label')].find((l) => l.textContent === label)!;
  const input = host.querySelector<HTMLInputElement>(`#${CSS.escape(field.htmlFor)}`)!;
  input.value = value;
  input.dispatchEvent(new Event('input', { bubbles: true }));
  await new Promise((resolve) => setTimeout(resolve, 0));
  return input;
}

describe('WindowEditor', () => {
  it('shows the windows on the chemist\'s scale and hands back a valid edit in degC', async () => {
    const changes = mount('degF', ',');
    const upper = await type('Receiver 1 to', '163,4');
    expect(upper.value).toBe('163,4');
    // 163.4 degF = 73 degC (NIST SP 811 B.8); receiver 2 now starts below receiver 1's end: refused.
    expect(changes.length).toBe(0);
    expect(host.textContent).toMatch(/overlap/);
    await type('Receiver 2 from', '163,4');
    expect(changes.at(-1)![0]!.toC).toBeCloseTo(73, 9);
    expect(changes.at(-1)![1]!.fromC).toBeCloseTo(73, 9);
  });

  it('keeps a bad bound as typed, says what is wrong, and sends nothing', async () => {
    const changes = mount('degC', '.');
    const lower = await type('Receiver 1 from', '68,5');
    expect(lower.value).toBe('68,5');
    expect(host.textContent).toMatch(/write decimals with "\."/);
    expect(changes).toEqual([]);
  });

  it('joins two receivers into one and numbers the rest again', () => {
    const changes = mount('degC', '.');
    const join = [...host.querySelectorAll('button')].find((b) => b.textContent === 'Collect receivers 2 and 3 in one')!;
    join.click();
    expect(changes[0]).toEqual([windows[0], { receiver: 2, fromC: 72, toC: 111, compound: null, volumeMl: 52 }]);
  });
});
