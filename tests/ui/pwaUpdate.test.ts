import { beforeEach, describe, expect, it } from 'vitest';
import { registrations, updates } from '../support/pwa-register-stub.ts';
import { startUpdateService } from '../../src/ui/update/pwaUpdate.ts';

beforeEach(() => {
  registrations.length = 0;
  updates.length = 0;
});

describe('startUpdateService', () => {
  it('registers the service worker once, at once', () => {
    startUpdateService();
    expect(registrations).toHaveLength(1);
    expect(registrations[0]!.immediate).toBe(true);
  });

  it('tells listeners that an update is ready, even those that subscribe later', () => {
    const service = startUpdateService();
    let early = 0;
    let late = 0;
    service.onUpdateReady(() => early++);
    registrations[0]!.onNeedRefresh!();
    service.onUpdateReady(() => late++);
    expect([early, late]).toEqual([1, 1]);
  });

  it('applyUpdate activates the waiting worker and reloads', async () => {
    const service = startUpdateService();
    await service.applyUpdate();
    expect(updates).toEqual([true]);
  });

  it('reports offline readiness', () => {
    const service = startUpdateService();
    let ready = false;
    service.onOfflineReady(() => (ready = true));
    registrations[0]!.onOfflineReady!();
    expect(ready).toBe(true);
  });
});
