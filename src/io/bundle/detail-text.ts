/**
 * The canonical text of an event's detail, made once per detail object and remembered: the
 * merge's content key, the link hashes of a simulated study and the writer's events.jsonl lines
 * reuse it instead of serialising the detail again (tens of thousands of events per bundle).
 * The verifier does not remember its texts: measured, the extra weak entries cost its check more
 * than they save later. Event details are never changed in place (a changed event is a new
 * object), so a remembered text cannot go stale.
 */
import { canonicalJson, contentText, sha256Hex, type ChainedEvent, type LinkContent } from '../../core/chain';

const texts = new WeakMap<object, string>();

/** canonicalJson(detail), remembered. */
export const detailText = (detail: Record<string, unknown>): string => {
  let text = texts.get(detail);
  if (text === undefined) {
    text = canonicalJson(detail);
    texts.set(detail, text);
  }
  return text;
};

/** canonicalJson({ at, detail, type }): an event's content, the text its link hashes after the previous hash. */
export const contentKeyOf = (c: LinkContent): string => contentText(c.at, c.type, detailText(c.detail));

/** core/chain.ts chainLinks, from remembered texts: the same links. */
export const chainFromTexts = (prev: string, contents: readonly LinkContent[]): ChainedEvent[] => {
  const out: ChainedEvent[] = [];
  let head = prev;
  for (const c of contents) {
    const hash = sha256Hex(`${head}\n${contentKeyOf(c)}`);
    out.push({ at: c.at, type: c.type, detail: c.detail, prev: head, hash });
    head = hash;
  }
  return out;
};
