import { describe, expect, it } from 'vitest';
import { checkStorage } from '../../src/store/index.ts';

describe('checkStorage', () => {
  it('asks for persistence when asked to and reports the quota', async () => {
    let asked = 0;
    const health = await checkStorage(
      { persisted: async () => false, persist: async () => (asked++, true), estimate: async () => ({ usage: 1e6, quota: 1e9 }) },
      true,
    );
    expect(asked).toBe(1);
    expect(health).toMatchObject({ isPersistent: true, usageBytes: 1e6, quotaBytes: 1e9, warning: null });
  });

  it('warns early when free space is short', async () => {
    const health = await checkStorage({ persisted: async () => true, estimate: async () => ({ usage: 990e6, quota: 1000e6 }) }, false);
    expect(health.warning).toMatch(/nearly full/);
  });

  it('warns that storage may be cleared when the browser does not keep it', async () => {
    const health = await checkStorage({ persisted: async () => false, persist: async () => false, estimate: async () => ({ usage: 0, quota: 1e9 }) }, true);
    expect(health.warning).toMatch(/may clear/);
  });

  it('copes with a browser without a storage manager, or whose estimate throws', async () => {
    expect((await checkStorage(undefined, true)).warning).toMatch(/no storage information/);
    const health = await checkStorage({ estimate: async () => { throw new Error('private window'); } }, false);
    expect(health.usageBytes).toBeNull();
  });
});
