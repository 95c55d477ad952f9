import { describe, expect, it } from 'vitest';
import { focusAppWindow, type AppClientsLike, type AppWindowLike } from '../../src/sw/focusAppWindow.ts';

const scope = 'https://lab.example/';

function windowAt(url: string, focused = false): AppWindowLike & { focusedByUs: number } {
  const w = { url, focused, focusedByUs: 0, focus: async () => { w.focusedByUs++; return w; } };
  return w;
}

function clientsWith(windows: AppWindowLike[]): AppClientsLike & { opened: string[] } {
  const opened: string[] = [];
  return { opened, matchAll: async () => windows, openWindow: async (url) => { opened.push(url); return null; } };
}

describe('focusAppWindow (a tapped alarm notification)', () => {
  it('brings the app window already open to the front, the focused one first, and opens nothing', async () => {
    const other = windowAt('https://elsewhere.example/');
    const first = windowAt(`${scope}#runs`);
    const focused = windowAt(scope, true);
    const clients = clientsWith([other, first, focused]);
    await focusAppWindow(clients, scope);
    expect([focused.focusedByUs, first.focusedByUs, other.focusedByUs]).toEqual([1, 0, 0]);
    expect(clients.opened).toEqual([]);
  });

  it('focuses the first app window when none has focus', async () => {
    const first = windowAt(`${scope}#runs`);
    const clients = clientsWith([windowAt('https://elsewhere.example/', true), first]);
    await focusAppWindow(clients, scope);
    expect(first.focusedByUs).toBe(1);
  });

  it('opens the app when no window of it is open', async () => {
    const clients = clientsWith([windowAt('https://elsewhere.example/')]);
    await focusAppWindow(clients, scope);
    expect(clients.opened).toEqual([scope]);
  });
});
