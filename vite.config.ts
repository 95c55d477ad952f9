import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

// Theme colours: the deep teal of the head-temperature display, used by the manifest and the page.
const themeColour = '#0b4f5c';

export default defineConfig({
  oxc: { jsx: { runtime: 'automatic', importSource: 'preact' } },
  build: { target: 'es2022', sourcemap: false, manifest: true },
  worker: { format: 'es' },
  plugins: [
    VitePWA({
      // 'prompt', never 'autoUpdate': a reload in the middle of a run would drop the serial port
      // and the wake lock. The app applies an update only between runs (see ui/UpdateNotice).
      registerType: 'prompt',
      injectRegister: false,
      // A worker of our own (src/sw/sw.ts, built to sw.js): the precache below plus Background
      // Sync of the outbox, which a generated worker cannot do.
      strategies: 'injectManifest',
      srcDir: 'src/sw',
      filename: 'sw.ts',
      includeAssets: ['favicon.svg', 'icons/*.png', 'icons/*.svg'],
      manifest: {
        id: '/',
        name: 'Cutbell: distillation watch',
        short_name: 'Cutbell',
        description: 'Plans the cuts of a batch fractional distillation, watches the head temperature and calls each receiver change.',
        lang: 'en',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        orientation: 'portrait',
        background_color: '#0e1416',
        theme_color: themeColour,
        categories: ['education', 'productivity', 'utilities'],
        icons: [
          { src: 'icons/cutbell-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
          { src: 'icons/cutbell-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
          { src: 'icons/cutbell-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
          { src: 'icons/cutbell.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
        ],
      },
      injectManifest: {
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest,woff2}'],
        // One classic script with nothing to import: every browser with service workers runs it.
        rollupFormat: 'iife',
      },
    }),
  ],
});
