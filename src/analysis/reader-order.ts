// The order readers are listed in: by id, numeric-aware ('R2' before 'R10'), as
// `a.localeCompare(b, 'en', { numeric: true })` orders them. Building that collator loads ICU's
// collation data, about 9 ms of a `heed analyze` run, while most logs name readers as one prefix
// of ASCII letters and a number (R1 ... R50): such a pair is compared here without the collator.

// a prefix of ASCII letters (possibly none), then decimal digits without a leading zero
const letters = (code: number): boolean => (code >= 65 && code <= 90) || (code >= 97 && code <= 122);
const digit = (code: number): boolean => code >= 48 && code <= 57;

const MAX_PLAIN_DIGITS = 254;

// where the number of a plain id starts, or -1 when the id is not letters then a plain number
const numberStart = (id: string): number => {
  let i = 0;
  while (i < id.length && letters(id.charCodeAt(i))) i++;
  if (i === id.length) return -1;
  // a leading zero ('R01') is left to the collator, which ranks it against 'R1' by its own rules
  if (id.charCodeAt(i) === 48 && i + 1 < id.length) return -1;
  // ICU compares a number of over 254 digits in 254-digit pieces: left to the collator too
  if (id.length - i > MAX_PLAIN_DIGITS) return -1;
  for (let j = i; j < id.length; j++) if (!digit(id.charCodeAt(j))) return -1;
  return i;
};

let collator: Intl.Collator | null = null;

/**
 * Compares reader ids as `a.localeCompare(b, 'en', { numeric: true })` does (negative, 0 or
 * positive): two ids made of the same ASCII-letter prefix and a number without leading zeros are
 * ordered by that number (longer digit strings are larger, equal lengths compare digit by digit);
 * every other pair goes to the collator, made on first need.
 * Example: ['R10', 'R2', 'R1'].sort(compareReaderIds) → ['R1', 'R2', 'R10'].
 */
export const compareReaderIds = (a: string, b: string): number => {
  const i = numberStart(a);
  if (i !== -1 && i === numberStart(b) && a.startsWith(b.slice(0, i))) {
    if (a.length !== b.length) return a.length < b.length ? -1 : 1;
    return a < b ? -1 : a > b ? 1 : 0;
  }
  collator ??= new Intl.Collator('en', { numeric: true });
  return collator.compare(a, b);
};
