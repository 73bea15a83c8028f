/**
 * A case set's content fingerprint (SHA-256, hex): the cases as read from cases.csv (the manifest
 * without the set's name, so a renamed or moved copy is still the same content) and the SHA-256 of
 * every image with its path, in path order. Two imports of one folder give the same fingerprint.
 */
import type { CaseImage, CaseSetManifest } from '../core/case-set';

const hex = (digest: ArrayBuffer): string => Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');

const sha256 = async (bytes: Uint8Array): Promise<string> => hex(await crypto.subtle.digest('SHA-256', bytes.slice().buffer));

export const caseSetContentHash = async (manifest: CaseSetManifest, images: readonly Pick<CaseImage, 'path' | 'bytes'>[]): Promise<string> => {
  const { name: _name, ...content } = manifest;
  const sorted = [...images].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const imageLines: string[] = [];
  for (const image of sorted) imageLines.push(`${image.path}\t${await sha256(image.bytes)}`);
  return sha256(new TextEncoder().encode(JSON.stringify({ cases: content, images: imageLines })));
};
