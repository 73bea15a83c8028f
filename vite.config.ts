import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';

// The development server (`npx vite`) injects each CSS file as a <style> element, which the
// page's policy (no inline styles) would block; only there, inline styles are allowed. Built
// files (dist/) keep the strict policy.
const inlineStylesInDevelopment = (): Plugin => ({
  name: 'heed-dev-inline-styles',
  apply: 'serve',
  transformIndexHtml: (html) => html.replace("style-src 'self';", "style-src 'self' 'unsafe-inline';"),
});

// The renderer: built into dist/ with relative paths so Electron can load it from files it owns
// and the Chromium launcher can serve it from 127.0.0.1.
export default defineConfig({
  plugins: [react(), inlineStylesInDevelopment()],
  base: './',
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true, chunkSizeWarningLimit: 1500 },
  server: { host: '127.0.0.1' },
});
