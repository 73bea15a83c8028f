import type { Finding } from './scan-findings.mjs';
export declare const SCANNED: readonly string[];
export declare const SKIPPED_CHECKS: readonly string[];
export declare const scanShell: (options: { root: string; files?: readonly string[]; electronVersion: string }) => Promise<{ findings: Finding[]; failedFiles: string[] }>;
