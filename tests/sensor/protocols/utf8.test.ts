import { describe, expect, it } from 'vitest';
import { decodeUtf8 } from '../../../src/sensor/protocols/utf8.ts';

// WHATWG Encoding Standard, UTF-8 decoder with replacement; Node's TextDecoder implements the
// same standard and serves as the independent reference.
const reference = new TextDecoder('utf-8');

describe('decodeUtf8', () => {
  it('decodeUtf8 reads ASCII, 2-, 3- and 4-byte characters', () => {
    const text = 'head 78.2 °C — 沸点 🌡';
    expect(decodeUtf8(new TextEncoder().encode(text))).toBe(text);
  });

  it('decodeUtf8 replaces a stray byte, an overlong form, a surrogate and a truncated tail', () => {
    expect(decodeUtf8(Uint8Array.of(0x37, 0x38, 0xff, 0x2e, 0x31))).toBe('78\ufffd.1');
    expect(decodeUtf8(Uint8Array.of(0xc0, 0x80))).toBe('\ufffd\ufffd');
    expect(decodeUtf8(Uint8Array.of(0xed, 0xa0, 0x80))).toBe('\ufffd\ufffd\ufffd');
    expect(decodeUtf8(Uint8Array.of(0x41, 0xe2, 0x82))).toBe('A\ufffd');
  });

  it('decodeUtf8 agrees with the WHATWG decoder on 2000 random byte strings', () => {
    let seed = 12345;
    const random = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    for (let n = 0; n < 2000; n++) {
      const b = Uint8Array.from({ length: 1 + Math.floor(random() * 12) }, () => {
        const r = random();
        return r < 0.4 ? 0x20 + Math.floor(random() * 90) : r < 0.7 ? 0x80 + Math.floor(random() * 64) : 0xc0 + Math.floor(random() * 64);
      });
      expect(decodeUtf8(b)).toBe(reference.decode(b));
    }
  });

  it('decodeUtf8 of no bytes is the empty string', () => {
    expect(decodeUtf8(new Uint8Array(0))).toBe('');
  });
});
