export type Finding = { id: string; severity: string; confidence: string; file: string; line: number; column: number; description: string };
export type Accepted = { id: string; file: string; reason: string };
export declare const BLOCKING: readonly string[];
export declare const parseAccepted: (value: unknown) => { ok: true; accepted: Accepted[] } | { ok: false; error: string };
export declare const compareFindings: <F extends { id: string; severity: string; file: string }>(findings: F[], accepted: Accepted[]) => {
  blocking: F[];
  known: (F & { reason: string })[];
  notes: F[];
  unused: Accepted[];
};
