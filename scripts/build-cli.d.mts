export declare const cliPaths: (root?: string) => { bundle: string; inputs: string };
export declare const cliBundleIsFresh: (root?: string) => boolean;
export declare const buildCli: (root?: string) => Promise<{ bundle: string; inputs: number }>;
export declare const ensureCliBundle: (root?: string) => Promise<string | null>;
