/**
 * Decodes UTF-8, replacing each malformed sequence with U+FFFD instead of throwing. Written out
 * here because the pure core has no TextDecoder. Follows the WHATWG Encoding Standard's
 * "maximal subpart" replacement, so one stray byte costs one replacement character.
 */
export function decodeUtf8(bytes: Uint8Array): string {
  let out = '';
  let i = 0;
  while (i < bytes.length) {
    const b0 = bytes[i]!;
    if (b0 < 0x80) {
      out += String.fromCharCode(b0);
      i++;
      continue;
    }
    let need: number;
    let code: number;
    let lower = 0x80;
    let upper = 0xbf;
    if (b0 >= 0xc2 && b0 <= 0xdf) {
      need = 1;
      code = b0 & 0x1f;
    } else if (b0 >= 0xe0 && b0 <= 0xef) {
      need = 2;
      code = b0 & 0x0f;
      if (b0 === 0xe0) lower = 0xa0;
      if (b0 === 0xed) upper = 0x9f; // no UTF-16 surrogates
    } else if (b0 >= 0xf0 && b0 <= 0xf4) {
      need = 3;
      code = b0 & 0x07;
      if (b0 === 0xf0) lower = 0x90;
      if (b0 === 0xf4) upper = 0x8f; // nothing above U+10FFFF
    } else {
      out += '\ufffd';
      i++;
      continue;
    }
    let j = i + 1;
    let ok = true;
    for (let k = 0; k < need; k++, j++) {
      const b = bytes[j];
      if (b === undefined || b < lower || b > upper) {
        ok = false;
        break;
      }
      code = (code << 6) | (b & 0x3f);
      lower = 0x80;
      upper = 0xbf;
    }
    if (!ok) {
      out += '\ufffd';
      i = j;
      continue;
    }
    out += String.fromCodePoint(code);
    i = j;
  }
  return out;
}
