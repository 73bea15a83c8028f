/**
 * A manifest written back out as `cases.csv` (docs/formats.md, "The case set"): one row per case and finding,
 * `\n` line ends, RFC 4180 quoting. Columns: the four required ones, then `model_score` and
 * `model_call` when any finding has them, `practice`, then `case_<name>` per attribute.
 * Reading the result back with readCaseSet gives the same manifest.
 * Example: casesCsv({ name: 'x', findings: ['nodule'], attributeNames: [], cases: [...] })
 *   -> "case_id,finding,truth,image,practice\nA1,nodule,1,images/A1.png,0\n".
 */
import Papa from 'papaparse';
import type { CaseSetManifest } from '../../core/case-set';
import { neutraliseCell } from '../../core/formula-text';

export const casesCsv = (manifest: CaseSetManifest): string => {
  const all = manifest.cases.flatMap((c) => c.findings);
  const scores = all.some((f) => f.modelScore !== null);
  const calls = all.some((f) => f.modelCall !== null);
  const fields = [
    'case_id', 'finding', 'truth', 'image',
    ...(scores ? ['model_score'] : []),
    ...(calls ? ['model_call'] : []),
    'practice',
    ...manifest.attributeNames.map((name) => `case_${name}`),
  ];
  const data = manifest.cases.flatMap((c) =>
    c.findings.map((f) => [
      c.caseId, f.finding, String(f.truth), c.images.join(';'),
      ...(scores ? [f.modelScore === null ? '' : String(f.modelScore)] : []),
      ...(calls ? [f.modelCall === null ? '' : String(f.modelCall)] : []),
      c.practice ? '1' : '0',
      ...manifest.attributeNames.map((name) => c.attributes[name] ?? ''),
    ]),
  );
  // a formula-looking cell never leaves Heed unquoted (core/formula-text), even if one got in
  const safe = data.map((row) => row.map(neutraliseCell));
  return `${Papa.unparse({ fields: fields.map(neutraliseCell), data: safe }, { newline: '\n' })}\n`;
};
