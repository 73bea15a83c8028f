export declare const PROOF_PATH: string;
export declare const TOKEN_FILE: string;
export declare const profileToken: (dir: string) => string;
export declare const proofFor: (token: string, nonce: string) => string | null;
export declare const provesHeed: (url: string, token: string) => Promise<boolean>;
