// @vitest-environment happy-dom
import { render } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import { UpdateNotice } from '../../src/ui/update/UpdateNotice.tsx';

let host: HTMLElement;
afterEach(() => {
  render(null, host);
  host.remove();
});

function mount(isRunGoing: boolean, onApply: () => void) {
  host = document.createElement('div');
  document.body.append(host);
  render(<UpdateNotice isRunGoing={isRunGoing} onApply={onApply} />, host);
  return host.querySelector('button')!;
}

describe('UpdateNotice', () => {
  it('offers the update between runs', () => {
    let applied = 0;
    const button = mount(false, () => applied++);
    expect(button.disabled).toBe(false);
    button.click();
    expect(applied).toBe(1);
  });

  it('holds the update back while a run is going (a reload would drop the sensor and wake lock)', () => {
    let applied = 0;
    const button = mount(true, () => applied++);
    expect(button.disabled).toBe(true);
    expect(host.textContent).toMatch(/wait until this run has ended/);
    button.click();
    expect(applied).toBe(0);
  });
});
