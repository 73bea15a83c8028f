export type BuildTarget = { readonly inputs: readonly string[]; readonly output: readonly string[] };
export declare const newestMtime: (paths: readonly string[]) => number | null;
export declare const needsRebuild: (mtimes: { inputs: number | null; output: number | null }) => boolean;
export declare const RENDERER: BuildTarget;
export declare const ELECTRON: BuildTarget;
export declare const targetIsStale: (root: string, target: BuildTarget) => boolean;
