import { expect, inject, it } from 'vitest';

interface ManifestIcon {
  src: string;
  sizes: string;
  type: string;
  purpose?: string;
}

// Web App Manifest (W3C): name, start_url, display and icons are what an install needs;
// Chromium's installability check wants a 192 px and a 512 px PNG icon (from memory).
it('serves a valid web app manifest whose icons exist', async () => {
  const base = inject('baseUrl');
  const html = await (await fetch(base)).text();
  const href = /<link rel="manifest" href="([^"]+)"/.exec(html)?.[1];
  expect(href).toBeDefined();
  const response = await fetch(new URL(href!, base));
  expect(response.status).toBe(200);
  expect(response.headers.get('content-type')).toMatch(/manifest\+json|application\/json/);
  const manifest = (await response.json()) as Record<string, unknown>;
  expect(manifest.name).toMatch(/Cutbell/);
  expect(manifest.short_name).toBe('Cutbell');
  expect(manifest.start_url).toBe('/');
  expect(manifest.display).toBe('standalone');
  expect(manifest.orientation).toBe('portrait');
  expect(manifest.theme_color).toMatch(/^#[0-9a-f]{6}$/i);
  const icons = manifest.icons as ManifestIcon[];
  const sizes = icons.filter((i) => i.type === 'image/png').map((i) => i.sizes);
  expect(sizes).toEqual(expect.arrayContaining(['192x192', '512x512']));
  for (const icon of icons) {
    const file = await fetch(new URL(icon.src, new URL(href!, base)));
    expect(file.status, icon.src).toBe(200);
    expect(file.headers.get('content-type')).toBe(icon.type);
    const bytes = new Uint8Array(await file.arrayBuffer());
    if (icon.type === 'image/png') {
      // PNG signature, then the IHDR width and height (PNG spec, ISO/IEC 15948).
      expect([...bytes.subarray(1, 4)]).toEqual([0x50, 0x4e, 0x47]);
      const view = new DataView(bytes.buffer, bytes.byteOffset);
      const [w, h] = icon.sizes.split('x').map(Number);
      expect(view.getUint32(16)).toBe(w);
      expect(view.getUint32(20)).toBe(h);
    }
  }
});

it('precaches the app shell in the service worker', async () => {
  const base = inject('baseUrl');
  const sw = await (await fetch(new URL('sw.js', base))).text();
  const html = await (await fetch(base)).text();
  const shellAssets = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+)"/g)].map((m) => m[1]!);
  expect(shellAssets.length).toBeGreaterThan(1);
  for (const asset of [...shellAssets, 'index.html', 'manifest.webmanifest', 'icons/cutbell-192.png']) {
    expect(sw, asset).toContain(`"${asset}"`);
  }
});
