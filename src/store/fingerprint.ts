/** A short content fingerprint of a case set's manifest (SHA-256, hex), to tie a study file to its set. */
import type { CaseSetManifest } from '../core/case-set';

export const manifestFingerprint = async (manifest: CaseSetManifest): Promise<string> => {
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(JSON.stringify(manifest)));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
};
