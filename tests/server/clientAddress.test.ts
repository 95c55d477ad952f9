import type { IncomingMessage } from 'node:http';
import { describe, expect, it } from 'vitest';
import { clientAddressOf } from '../../src/server/clientAddress.ts';

const request = (peer: string | undefined, headers: Record<string, string | string[]> = {}) =>
  ({ socket: { remoteAddress: peer }, headers }) as unknown as IncomingMessage;

describe('clientAddressOf', () => {
  const behindProxy = clientAddressOf({ proxyAddresses: ['10.0.0.2', '10.1.0.0/16', 'fd00::2'] });

  it('with no proxies configured gives the socket peer and never reads the headers', () => {
    const plain = clientAddressOf();
    expect(plain(request('198.51.100.7', { 'x-forwarded-for': '203.0.113.1', forwarded: 'for=203.0.113.2' }))).toBe('198.51.100.7');
    expect(plain(request('::ffff:198.51.100.7'))).toBe('198.51.100.7');
    expect(plain(request(undefined))).toBe('unknown');
  });

  it('ignores the header on a request whose peer is not a configured proxy', () => {
    expect(behindProxy(request('198.51.100.7', { 'x-forwarded-for': '203.0.113.1' }))).toBe('198.51.100.7');
  });

  it('takes the right-most entry from a configured proxy, whatever the phone put to its left', () => {
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '192.0.2.99, 203.0.113.1' }))).toBe('203.0.113.1');
    expect(behindProxy(request('::ffff:10.0.0.2', { 'x-forwarded-for': '203.0.113.1' }))).toBe('203.0.113.1');
  });

  it('skips entries that are themselves configured proxies (a chain of two), by address or range', () => {
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '192.0.2.99, 203.0.113.1, 10.1.4.5' }))).toBe('203.0.113.1');
    expect(behindProxy(request('fd00::2', { 'x-forwarded-for': '2001:db8::17, 10.0.0.2' }))).toBe('2001:db8::17');
  });

  it('reads an entry with a port or in brackets, and joins repeated header lines', () => {
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '203.0.113.1:50312' }))).toBe('203.0.113.1');
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '[2001:DB8::17]:443' }))).toBe('2001:db8::17');
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': ['192.0.2.99', '203.0.113.1'] }))).toBe('203.0.113.1');
  });

  it('counts the proxy itself when the header is missing, empty, or its entry is not an address', () => {
    expect(behindProxy(request('10.0.0.2'))).toBe('10.0.0.2');
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '' }))).toBe('10.0.0.2');
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '203.0.113.1, not-an-address' }))).toBe('10.0.0.2');
    expect(behindProxy(request('10.0.0.2', { 'x-forwarded-for': '203.0.113.1, unknown, 10.1.0.9' }))).toBe('10.1.0.9');
  });

  // RFC 7239 section 4 examples (for=192.0.2.60;proto=http;by=203.0.113.43, For="[2001:db8:cafe::17]:4711",
  // for=192.0.2.43, for=198.51.100.17) and section 6 (a quoted IPv4 with port; "unknown"; "_gazonk").
  it('with proxyHeader "forwarded" reads the for= of each RFC 7239 element', () => {
    const rfc = clientAddressOf({ proxyAddresses: ['10.0.0.2'], proxyHeader: 'forwarded' });
    expect(rfc(request('10.0.0.2', { forwarded: 'for=192.0.2.60;proto=http;by=203.0.113.43' }))).toBe('192.0.2.60');
    expect(rfc(request('10.0.0.2', { forwarded: 'For="[2001:db8:cafe::17]:4711"' }))).toBe('2001:db8:cafe::17');
    expect(rfc(request('10.0.0.2', { forwarded: 'for=192.0.2.43, for=198.51.100.17' }))).toBe('198.51.100.17');
    expect(rfc(request('10.0.0.2', { forwarded: 'for="192.0.2.43:47011"' }))).toBe('192.0.2.43');
    expect(rfc(request('10.0.0.2', { forwarded: 'for=192.0.2.43, for="_gazonk"' }))).toBe('10.0.0.2');
    expect(rfc(request('10.0.0.2', { forwarded: 'for=unknown' }))).toBe('10.0.0.2');
    expect(rfc(request('10.0.0.2', { forwarded: 'proto=https' }))).toBe('10.0.0.2');
    // Only the configured header counts: X-Forwarded-For is not read in this mode.
    expect(rfc(request('10.0.0.2', { 'x-forwarded-for': '203.0.113.1' }))).toBe('10.0.0.2');
  });

  it('refuses a proxy that is not an address or range, and an unknown header, naming it', () => {
    for (const bad of ['lab-proxy', '10.0.0.300', '10.0.0.0/33', 'fd00::/129', '10.0.0.1/8/2', '']) {
      expect(() => clientAddressOf({ proxyAddresses: [bad] }), bad).toThrow(new RangeError(`"${bad}" is not a proxy address such as 10.0.0.2, fd00::2 or 10.0.0.0/24`));
    }
    expect(() => clientAddressOf({ proxyAddresses: ['10.0.0.2'], proxyHeader: 'via' as never })).toThrow(/x-forwarded-for or forwarded, not "via"/);
  });
});
