// The one web policy Heed's renderer runs under, shared by the Electron custom scheme and the
// Chromium launcher's static server so both serve the same headers and MIME types.
import path from 'node:path';

/**
 * Content Security Policy for every document Heed serves: own files only, no remote content, no
 * form ever submitted anywhere (forms are handled in script), no inline script and no inline
 * style. Styles set by script through the CSSOM (React's style props, Observable Plot's
 * element.style) are not inline styles; the <style> elements Plot adds to each plot and legend,
 * and the reader report's CSS, are adopted as constructed style sheets (src/ui/adopted-styles.ts).
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "img-src 'self' blob: data:",
  "script-src 'self'",
  "style-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
].join('; ');

/** MIME types for what `vite build` writes into dist/ (and the images a case set may carry). */
export const MIME_TYPES = Object.freeze({
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.gif': 'image/gif',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
  '.woff': 'font/woff',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
  '.txt': 'text/plain; charset=utf-8',
  '.wasm': 'application/wasm',
  '.csv': 'text/csv; charset=utf-8',
  '.pdf': 'application/pdf',
});

/** The Content-Type for a file name; unknown extensions are served as opaque bytes. */
export const contentTypeFor = (fileName) =>
  MIME_TYPES[path.extname(fileName).toLowerCase()] ?? 'application/octet-stream';

/** Headers sent with every response of Heed's own files. No CORS headers, on purpose. */
export const securityHeaders = () => ({
  'Content-Security-Policy': CONTENT_SECURITY_POLICY,
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Resource-Policy': 'same-origin',
});

/**
 * Maps a URL pathname (still percent-encoded, e.g. "/assets/a.js") to an absolute file path inside
 * `root`, or null when it would leave `root`, is malformed, or holds a NUL or a backslash.
 * "/" and any path ending in "/" map to that folder's index.html (never a listing).
 */
export const resolveInside = (root, urlPathname) => {
  if (typeof urlPathname !== 'string' || !urlPathname.startsWith('/')) return null;
  let decoded;
  try {
    decoded = decodeURIComponent(urlPathname);
  } catch {
    return null;
  }
  // Backslashes are separators on Windows and never appear in Vite's output names.
  if (decoded.includes('\0') || decoded.includes('\\')) return null;
  if (decoded.endsWith('/')) decoded += 'index.html';
  const base = path.resolve(root);
  const target = path.resolve(base, `.${decoded}`);
  if (target !== base && !target.startsWith(base + path.sep)) return null;
  if (target === base) return null;
  return target;
};
