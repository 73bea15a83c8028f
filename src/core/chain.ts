/**
 * The hash chain of a study. Every event of a study (and so every answer, which is committed with
 * its event) carries `hash` = SHA-256 over the previous hash and its own canonical content, so an
 * edited, removed, reordered or inserted record breaks every later link.
 *
 *   genesis(studyId) = sha256hex("heed-chain/1\n" + studyId)
 *   hash             = sha256hex(prev + "\n" + canonicalJson({ at, type, detail }))
 *
 * The SHA-256 is the synchronous one of @noble/hashes (audited, no dependencies), not WebCrypto:
 * the store computes a link inside the Dexie transaction that commits the answer, and awaiting
 * WebCrypto's promise there would let IndexedDB auto-commit the transaction half way. A link of a
 * few hundred bytes hashes in microseconds, so the answer commit stays fast.
 *
 * Example: linkHash(genesisHash('s1'), { at: '2026-12-01T10:00:00.000Z', type: 'study-created', detail: {} })
 *   is the same 64 hex digits on every machine.
 */
import { sha256 } from '@noble/hashes/sha2';
import { bytesToHex, utf8ToBytes } from '@noble/hashes/utils';

export const CHAIN_PREFIX = 'heed-chain/1';

export type Sha256Hex = (data: Uint8Array | string) => string;

// Link texts (a few hundred bytes, tens of thousands per bundle) are encoded into one reused
// buffer instead of a new array each: the allocation cost more than the hashing. The digest is
// taken synchronously and keeps no reference, so reusing the buffer is safe; long texts (whole
// files) get their own array, so the buffer stays small.
const encoder = new TextEncoder();
const SHORT_TEXT = 1 << 16;
const scratch = new Uint8Array(SHORT_TEXT * 3);
const utf8Of = (text: string): Uint8Array => {
  if (text.length > SHORT_TEXT) return utf8ToBytes(text);
  return scratch.subarray(0, encoder.encodeInto(text, scratch).written);
};

const nobleSha256Hex: Sha256Hex = (data) => bytesToHex(sha256(typeof data === 'string' ? utf8Of(data) : data));
let active: Sha256Hex = nobleSha256Hex;

/** SHA-256 as 64 lower-case hex digits. */
export const sha256Hex: Sha256Hex = (data) => active(data);

/**
 * Swaps in another implementation of the same SHA-256 (the CLI uses Node's native one, several
 * times faster on large bundles); the digests are the same, so this changes speed only.
 */
export const useSha256 = (implementation: Sha256Hex): void => { active = implementation; };

const compareKeys = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);

/**
 * True when JSON.stringify already writes the canonical text of `value`: it holds only null,
 * booleans, finite numbers, text, arrays and plain objects (no undefined anywhere), and every
 * object's own keys are already in sorted order, which is the order JSON.stringify writes them in.
 * That is the case for anything parsed from canonical JSON (a verified bundle's events), where the
 * native JSON.stringify is several times faster than building the text key by key.
 */
const stringifiesCanonically = (value: unknown): boolean => {
  if (value === null) return true;
  switch (typeof value) {
    case 'string': case 'boolean': return true;
    case 'number': return Number.isFinite(value);
    case 'object': {
      if (Array.isArray(value)) {
        for (let i = 0; i < value.length; i++) if (!stringifiesCanonically(value[i])) return false;
        return true;
      }
      const proto: unknown = Object.getPrototypeOf(value);
      if (proto !== Object.prototype && proto !== null) return false;
      const record = value as Record<string, unknown>;
      let previous: string | null = null;
      for (const k in record) {
        if (!Object.hasOwn(record, k)) return false;
        if (previous !== null && compareKeys(previous, k) >= 0) return false;
        if (!stringifiesCanonically(record[k])) return false;
        previous = k;
      }
      return true;
    }
    default: return false;
  }
};

/**
 * JSON with object keys sorted (by UTF-16 code units) at every depth and no spaces: one text per
 * value. Keys whose value is undefined are left out, as JSON.stringify does. Throws RangeError on
 * a number JSON cannot hold (NaN, Infinity), which would not survive a round trip.
 */
export const canonicalJson = (value: unknown): string => (stringifiesCanonically(value) ? JSON.stringify(value) : canonicalText(value));

const canonicalText = (value: unknown): string => {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string': return JSON.stringify(value);
    case 'boolean': return value ? 'true' : 'false';
    case 'number':
      if (!Number.isFinite(value)) throw new RangeError(`canonical JSON cannot hold the number ${value}`);
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) {
        let out = '[';
        for (let i = 0; i < value.length; i++) out += `${i > 0 ? ',' : ''}${value[i] === undefined ? 'null' : canonicalText(value[i])}`;
        return `${out}]`;
      }
      const record = value as Record<string, unknown>;
      const keys = Object.keys(record).sort(compareKeys);
      let out = '{';
      let first = true;
      for (const k of keys) {
        const v = record[k];
        if (v === undefined) continue;
        out += `${first ? '' : ','}${JSON.stringify(k)}:${canonicalText(v)}`;
        first = false;
      }
      return `${out}}`;
    }
    default:
      throw new RangeError(`canonical JSON cannot hold a ${typeof value}`);
  }
};

/** The content of one link: what an event says, without its place in the chain. */
export type LinkContent = { at: string; type: string; detail: Record<string, unknown> };

/** A link as carried in a bundle and in the store. */
export type ChainedEvent = LinkContent & { prev: string; hash: string };

/** The hash a study's chain starts from; the key '' is the workstation's own chain (events of no study). */
export const genesisHash = (chainKey: string): string => sha256Hex(`${CHAIN_PREFIX}\n${chainKey}`);

/** canonicalJson({ at, type, detail }), from the detail's canonical text (computed once by callers that also need it). */
export const contentText = (at: string, type: string, detailText: string): string =>
  `{"at":${JSON.stringify(at)},"detail":${detailText},"type":${JSON.stringify(type)}}`;

export const linkHash = (prev: string, content: LinkContent): string =>
  sha256Hex(`${prev}\n${contentText(content.at, content.type, canonicalJson(content.detail))}`);

/** One line of events.jsonl: canonicalJson({ at, detail, hash, prev, type }). */
export const eventLine = (e: ChainedEvent, detailText: string = canonicalJson(e.detail)): string =>
  `{"at":${JSON.stringify(e.at)},"detail":${detailText},"hash":"${e.hash}","prev":"${e.prev}","type":${JSON.stringify(e.type)}}`;

/** Links `contents` in order after `prev` (the genesis for a new chain). */
export const chainLinks = (prev: string, contents: readonly LinkContent[]): ChainedEvent[] => {
  const out: ChainedEvent[] = [];
  let head = prev;
  for (const c of contents) {
    const hash = linkHash(head, c);
    out.push({ at: c.at, type: c.type, detail: c.detail, prev: head, hash });
    head = hash;
  }
  return out;
};
