// Stands in for the `got` HTTP client inside the security scanner: the scanner would otherwise
// fetch translations and Electron's release list from the internet on every run. Offline, it
// falls back to its bundled English texts, and the release check is switched off (scan.mjs).
'use strict';
const offline = () => Promise.reject(new Error('the security scan runs offline'));
offline.head = offline;
offline.get = offline;
module.exports = offline;
module.exports.default = offline;
