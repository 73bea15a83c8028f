// Compares the security scanner's findings with the accepted list (scripts/security-scan-accepted.json).
// A finding is matched by check id and file, not by line, so editing a file does not un-accept it;
// a HIGH finding that is not accepted fails the scan. Pure, so it is unit-tested without the scanner.

/** Severities that fail the scan unless accepted with a reason. */
export const BLOCKING = Object.freeze(['HIGH']);

/**
 * Reads the accepted list; every entry needs a check id, a file and a reason of a few words.
 * @param {unknown} value the parsed JSON
 * @returns {{ ok: true; accepted: { id: string; file: string; reason: string }[] } | { ok: false; error: string }}
 */
export const parseAccepted = (value) => {
  const entries = value !== null && typeof value === 'object' && !Array.isArray(value) ? value.accepted : undefined;
  if (!Array.isArray(entries)) return { ok: false, error: 'the accepted list must be an object with an "accepted" array' };
  const accepted = [];
  for (const [index, entry] of entries.entries()) {
    const where = `accepted[${index}]`;
    if (entry === null || typeof entry !== 'object') return { ok: false, error: `${where} is not an object` };
    for (const key of ['id', 'file', 'reason']) {
      if (typeof entry[key] !== 'string' || entry[key].trim() === '') return { ok: false, error: `${where}.${key} must be a non-empty text` };
    }
    if (entry.reason.trim().length < 20) return { ok: false, error: `${where}.reason is too short to say why the finding is accepted` };
    accepted.push({ id: entry.id, file: entry.file, reason: entry.reason });
  }
  return { ok: true, accepted };
};

/**
 * @param {{ id: string; severity: string; file: string }[]} findings
 * @param {{ id: string; file: string; reason: string }[]} accepted
 */
export const compareFindings = (findings, accepted) => {
  const key = (x) => `${x.id}\u0000${x.file}`;
  const acceptedKeys = new Map(accepted.map((a) => [key(a), a]));
  const seen = new Set(findings.map(key));
  const known = [];
  const blocking = [];
  const notes = [];
  for (const finding of findings) {
    const reason = acceptedKeys.get(key(finding));
    if (reason !== undefined) known.push({ ...finding, reason: reason.reason });
    else if (BLOCKING.includes(finding.severity)) blocking.push(finding);
    else notes.push(finding);
  }
  // An accepted entry the scanner no longer reports should be removed, so the list stays true.
  const unused = accepted.filter((a) => !seen.has(key(a)));
  return { blocking, known, notes, unused };
};
