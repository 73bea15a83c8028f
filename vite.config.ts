import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// The renderer: built into dist/ with relative paths so Electron can load it from files it owns
// and the Chromium launcher can serve it from 127.0.0.1.
export default defineConfig({
  plugins: [react()],
  base: './',
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true, chunkSizeWarningLimit: 1500 },
  server: { host: '127.0.0.1' },
});
