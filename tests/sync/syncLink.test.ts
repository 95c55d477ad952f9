import { describe, expect, it } from 'vitest';
import { syncLink } from '../../src/server/syncLink.ts';
import { readSyncLink } from '../../src/sync/index.ts';

describe('readSyncLink', () => {
  it('readSyncLink reads the link the server prints, token and server included', () => {
    const link = new URL(syncLink('http://lab-pc:8080/', 'https://app.example/', 'cb1.a-b_c'));
    expect(readSyncLink(link.hash, 'https://app.example')).toEqual({ syncServer: 'http://lab-pc:8080', syncToken: 'cb1.a-b_c' });
  });
  it('readSyncLink takes the page origin as the server when the link names none', () => {
    const link = new URL(syncLink('http://lab-pc:8080/', null, 'cb1.t'));
    expect(readSyncLink(link.hash, 'http://lab-pc:8080')).toEqual({ syncServer: 'http://lab-pc:8080', syncToken: 'cb1.t' });
  });
  it('readSyncLink is null for a fragment without a token', () => {
    expect(readSyncLink('', 'http://x')).toBeNull();
    expect(readSyncLink('#sync=', 'http://x')).toBeNull();
    expect(readSyncLink('#watch', 'http://x')).toBeNull();
  });
});
