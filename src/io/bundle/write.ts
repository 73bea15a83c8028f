/**
 * Writes a study bundle (docs/bundle.md): one zip holding reads.csv, events.jsonl, study.json,
 * data-dictionary.md, datapackage.json, cases.csv, the images when asked, and manifest.json
 * (written last: size and SHA-256 of every other file, and the head of the chain).
 * Pure: the app (through the store), the CLI's simulate and merge, and backups all call this.
 * The same snapshot always gives the same files, byte for byte.
 */
import { zipSync, type Zippable } from 'fflate';
import { genesisHash, sha256Hex } from '../../core/chain';
import { RESEARCH_CAUTION } from '../../core/research-caution';
import packageJson from '../../../package.json';
import { dataPackageJson } from './datapackage';
import { readsOfChain, type StudySnapshot } from './snapshot';
import {
  BUNDLE_FORMAT, BUNDLE_VERSION, bundleCasesCsv, bundleDictionary, bundleStudyJson, caseSetFingerprint, designFingerprint, eventsJsonl, readsCsv,
} from './texts';

export const HEED_VERSION: string = packageJson.version;

export const MANIFEST = 'manifest.json';
export const IMAGE_FOLDER = 'images/';

export type ManifestFile = { path: string; bytes: number; sha256: string };

export type BundleManifest = {
  format: string;
  version: number;
  heed_version: string;
  notice: string;
  study_id: string;
  design_fingerprint: string;
  case_set_fingerprint: string;
  images_included: boolean;
  chain: { genesis: string; head: string; events: number; reads: number };
  files: ManifestFile[];
};

/** One key a line and one file a line, so a fault in the manifest can be named by its line. */
export const manifestText = (m: BundleManifest): string => [
  '{',
  `  "format": ${JSON.stringify(m.format)},`,
  `  "version": ${m.version},`,
  `  "heed_version": ${JSON.stringify(m.heed_version)},`,
  `  "notice": ${JSON.stringify(m.notice)},`,
  `  "study_id": ${JSON.stringify(m.study_id)},`,
  `  "design_fingerprint": ${JSON.stringify(m.design_fingerprint)},`,
  `  "case_set_fingerprint": ${JSON.stringify(m.case_set_fingerprint)},`,
  `  "images_included": ${m.images_included},`,
  '  "chain": {',
  `    "genesis": ${JSON.stringify(m.chain.genesis)},`,
  `    "head": ${JSON.stringify(m.chain.head)},`,
  `    "events": ${m.chain.events},`,
  `    "reads": ${m.chain.reads}`,
  '  },',
  '  "files": [',
  ...m.files.map((f, i) => `    ${JSON.stringify({ path: f.path, bytes: f.bytes, sha256: f.sha256 })}${i < m.files.length - 1 ? ',' : ''}`),
  '  ]',
  '}',
  '',
].join('\n');

/** Every file of the bundle but the manifest, by path. */
export const bundleFiles = (snapshot: StudySnapshot): Map<string, Uint8Array> => {
  const enc = new TextEncoder();
  const { manifest } = snapshot.caseSet;
  const files = new Map<string, Uint8Array>([
    ['reads.csv', enc.encode(readsCsv(snapshot))],
    ['events.jsonl', enc.encode(eventsJsonl(snapshot.events))],
    ['study.json', enc.encode(bundleStudyJson(snapshot))],
    ['data-dictionary.md', enc.encode(bundleDictionary(manifest))],
    ['datapackage.json', enc.encode(dataPackageJson(snapshot.study.id, snapshot.study.name, manifest))],
    ['cases.csv', enc.encode(bundleCasesCsv(manifest, snapshot.caseSet.imageSha256))],
  ]);
  for (const image of snapshot.images ?? []) files.set(`${IMAGE_FOLDER}${image.path}`, image.bytes);
  return files;
};

/**
 * The SHA-256 of each file, by path, from the browser's native WebCrypto (the same digests as
 * sha256Hex, several times faster on the tens of megabytes of a large study's text), or null
 * where WebCrypto is missing.
 */
const nativeFileHashes = async (files: ReadonlyMap<string, Uint8Array>): Promise<Map<string, string> | null> => {
  const subtle = globalThis.crypto?.subtle;
  if (!subtle) return null;
  const hex = (digest: ArrayBuffer): string => Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
  const hashed = await Promise.all([...files].map(async ([path, bytes]): Promise<[string, string]> => [path, hex(await subtle.digest('SHA-256', bytes as Uint8Array<ArrayBuffer>))]));
  return new Map(hashed);
};

export const bundleManifest = (snapshot: StudySnapshot, files: ReadonlyMap<string, Uint8Array>, fileSha256: ReadonlyMap<string, string> | null = null): BundleManifest => ({
  format: BUNDLE_FORMAT,
  version: BUNDLE_VERSION,
  heed_version: HEED_VERSION,
  notice: RESEARCH_CAUTION,
  study_id: snapshot.study.id,
  design_fingerprint: designFingerprint(snapshot),
  case_set_fingerprint: caseSetFingerprint(snapshot.caseSet.manifest),
  images_included: snapshot.images !== null,
  chain: {
    genesis: genesisHash(snapshot.study.id),
    head: snapshot.events.at(-1)?.hash ?? genesisHash(snapshot.study.id),
    events: snapshot.events.length,
    reads: [...readsOfChain(snapshot.events).values()].filter((r) => r.read.final !== null).length,
  },
  files: [...files].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([path, bytes]) => ({ path, bytes: bytes.length, sha256: fileSha256?.get(path) ?? sha256Hex(bytes) })),
});

// A fixed time stamp for every entry: the zip's bytes then depend on its content only.
const ENTRY_TIME = new Date(2000, 0, 1);

/**
 * Deflate level of the text files. Level 3 rather than fflate's default 6: on a large study's
 * text (30 MB) it takes about two thirds of the time for about 8% more bytes (bench/README.md,
 * "Study bundles, sixth session"). The level changes the zip's bytes, never the files in it.
 */
export const TEXT_LEVEL = 3;

const zipOf = (files: ReadonlyMap<string, Uint8Array>, manifest: string): Uint8Array => {
  const zippable: Zippable = {};
  for (const [path, bytes] of files) zippable[path] = [bytes, { level: path.startsWith(IMAGE_FOLDER) ? 0 : TEXT_LEVEL, mtime: ENTRY_TIME }];
  zippable[MANIFEST] = [new TextEncoder().encode(manifest), { level: TEXT_LEVEL, mtime: ENTRY_TIME }];
  return zipSync(zippable);
};

/** The whole bundle as zip bytes. Text is deflated; images, already compressed, are stored. */
export const writeBundle = (snapshot: StudySnapshot): Uint8Array => {
  const files = bundleFiles(snapshot);
  return zipOf(files, manifestText(bundleManifest(snapshot, files)));
};

/**
 * writeBundle, the same bytes, with each file's SHA-256 taken by WebCrypto (asynchronous, native)
 * instead of the synchronous JavaScript SHA-256: the app's save and backups, which may await.
 */
export const writeBundleAsync = async (snapshot: StudySnapshot): Promise<Uint8Array> => {
  const files = bundleFiles(snapshot);
  return zipOf(files, manifestText(bundleManifest(snapshot, files, await nativeFileHashes(files))));
};
