export type StaticServer = { url: string; port: number; close(): Promise<void> };
export declare const startStaticServer: (options: { root: string; port?: number; token?: string }) => Promise<StaticServer>;
