import type { IncomingMessage } from 'node:http';
import { BlockList, isIP } from 'node:net';

/** The header a lab's reverse proxy writes the client's address into. */
export type ProxyHeader = 'x-forwarded-for' | 'forwarded';

export const proxyHeaders: readonly ProxyHeader[] = ['x-forwarded-for', 'forwarded'];

export interface ClientAddressOptions {
  /** Addresses (or CIDR ranges such as 10.0.0.0/8) of the lab's own reverse proxies. */
  proxyAddresses?: readonly string[];
  /** Which header those proxies append to. Default 'x-forwarded-for'. */
  proxyHeader?: ProxyHeader;
}

/** More hops than any lab's proxies add; a longer list is not walked further. */
const maxHops = 32;

/** "::ffff:10.0.0.5" (an IPv4 peer on a dual-stack socket) -> "10.0.0.5". */
function plainAddress(address: string): string {
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(address);
  return mapped ? mapped[1]! : address.toLowerCase();
}

/** One list entry -> an IP address, or null when it is not one ("unknown", an obfuscated name). */
function entryAddress(entry: string): string | null {
  let value = entry.trim();
  if (value.startsWith('"') && value.endsWith('"') && value.length >= 2) value = value.slice(1, -1);
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(value);
  if (bracketed) value = bracketed[1]!;
  else if (/^\d+\.\d+\.\d+\.\d+:\d+$/.test(value)) value = value.slice(0, value.lastIndexOf(':'));
  return isIP(value) ? plainAddress(value) : null;
}

/** The `for=` value of each element of an RFC 7239 Forwarded header, left to right. */
function forwardedFor(header: string): string[] {
  return header.split(',').map((element) => {
    for (const pair of element.split(';')) {
      const at = pair.indexOf('=');
      if (at > 0 && pair.slice(0, at).trim().toLowerCase() === 'for') return pair.slice(at + 1);
    }
    return '';
  });
}

/** Checks and compiles the configured proxies. Throws RangeError naming a bad one. */
function proxyList(addresses: readonly string[]): BlockList {
  const list = new BlockList();
  for (const raw of addresses) {
    const match = /^([^/]+)(?:\/(\d{1,3}))?$/.exec(raw.trim());
    const address = plainAddress(match?.[1] ?? '');
    const family = isIP(address);
    const maxPrefix = family === 6 ? 128 : 32;
    const prefix = match?.[2] === undefined ? maxPrefix : Number(match[2]);
    if (family === 0 || prefix > maxPrefix) {
      throw new RangeError(`"${raw}" is not a proxy address such as 10.0.0.2, fd00::2 or 10.0.0.0/24`);
    }
    list.addSubnet(address, prefix, family === 6 ? 'ipv6' : 'ipv4');
  }
  return list;
}

/**
 * How the server tells one phone from another for the failed-token limit. The socket's peer,
 * except when that peer is one of the lab's configured reverse proxies: then the right-most
 * entry of the proxy's header that is not itself a configured proxy (each proxy appends the
 * address it was reached from, so entries to the left of that may be anything the phone sent).
 * An entry that is not an address counts as the proxy itself. With no proxies configured, the
 * headers are never read.
 */
export function clientAddressOf(options: ClientAddressOptions = {}): (request: IncomingMessage) => string {
  const addresses = options.proxyAddresses ?? [];
  const header = options.proxyHeader ?? 'x-forwarded-for';
  if (!proxyHeaders.includes(header)) throw new RangeError(`proxy header must be ${proxyHeaders.join(' or ')}, not "${header}"`);
  const peerOf = (request: IncomingMessage) => plainAddress(request.socket.remoteAddress ?? 'unknown');
  if (addresses.length === 0) return peerOf;
  const proxies = proxyList(addresses);
  const isProxy = (address: string) => proxies.check(address, isIP(address) === 6 ? 'ipv6' : 'ipv4');

  return (request) => {
    const peer = peerOf(request);
    if (isIP(peer) === 0 || !isProxy(peer)) return peer;
    const value = request.headers[header];
    // Node joins repeated X-Forwarded-For lines with ", "; a repeated Forwarded arrives as one string too.
    const text = Array.isArray(value) ? value.join(',') : (value ?? '');
    const entries = header === 'forwarded' ? forwardedFor(text) : text.split(',');
    let client = peer;
    for (let i = entries.length - 1, hops = 0; i >= 0 && hops < maxHops; i--, hops++) {
      const address = entryAddress(entries[i]!);
      if (address === null) return client;
      client = address;
      if (!isProxy(address)) return address;
    }
    return client;
  };
}
