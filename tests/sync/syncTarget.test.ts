import { describe, expect, it } from 'vitest';
import { normaliseServerUrl, syncTargetFrom } from '../../src/sync/index.ts';

describe('syncTargetFrom', () => {
  it('syncTargetFrom is null without a token', () => {
    expect(syncTargetFrom({ syncServer: 'http://lab:8080', syncToken: '  ' }, 'http://app')).toBeNull();
  });
  it('syncTargetFrom uses the page origin when no server is typed', () => {
    expect(syncTargetFrom({ syncServer: '', syncToken: 'cb1.x' }, 'http://127.0.0.1:4173')).toEqual({ serverUrl: 'http://127.0.0.1:4173/', token: 'cb1.x' });
  });
  it('normaliseServerUrl adds http:// and the trailing slash, drops query and fragment', () => {
    expect(normaliseServerUrl('lab-pc:8080')).toBe('http://lab-pc:8080/');
    expect(normaliseServerUrl('https://lab.example/cutbell?x=1#y')).toBe('https://lab.example/cutbell/');
  });
  it('normaliseServerUrl refuses other schemes and garbage', () => {
    expect(() => normaliseServerUrl('ftp://lab')).toThrow(RangeError);
    expect(() => normaliseServerUrl('http://')).toThrow(RangeError);
  });
});
