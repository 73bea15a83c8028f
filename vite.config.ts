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

// The database is opened ahead of the app's bundle (src/store/warm-open.ts): a chunk of its own,
// named after its content like the others, loaded by a module script placed before the entry's,
// so it runs as soon as it is in, while the bundle is still being fetched and compiled. (A second
// script in index.html itself would be merged into the entry chunk.)
const WARM_OPEN = 'src/ui/warm-open.ts';
const warmOpenFirst = (): Plugin => ({
  name: 'heed-warm-open',
  apply: 'build',
  buildStart() {
    this.emitFile({ type: 'chunk', id: WARM_OPEN, name: 'warm-open' });
  },
  transformIndexHtml: {
    order: 'post',
    handler: (html, context) => {
      const chunk = Object.values(context.bundle ?? {}).find((c) => c.type === 'chunk' && c.facadeModuleId?.endsWith(WARM_OPEN));
      if (!chunk) throw new Error(`heed-warm-open: no chunk built from ${WARM_OPEN}`);
      if (chunk.type === 'chunk' && chunk.imports.length > 0) throw new Error(`heed-warm-open: ${chunk.fileName} imports ${chunk.imports.join(', ')}; it must stand alone`);
      const entry = /\n(\s*)<script type="module"/.exec(html);
      if (!entry) throw new Error('heed-warm-open: index.html has no module script');
      const tag = `\n${entry[1] ?? ''}<script type="module" crossorigin src="./${chunk.fileName}"></script>`;
      return html.slice(0, entry.index) + tag + html.slice(entry.index);
    },
  },
});

// The renderer: built into dist/ with relative paths so Electron can load it from files it owns
// and the Chromium launcher can serve it from 127.0.0.1.
export default defineConfig({
  plugins: [react(), inlineStylesInDevelopment(), warmOpenFirst()],
  base: './',
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true, chunkSizeWarningLimit: 1500 },
  server: { host: '127.0.0.1' },
});
