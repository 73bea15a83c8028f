export declare const CONTENT_SECURITY_POLICY: string;
export declare const MIME_TYPES: Readonly<Record<string, string>>;
export declare const contentTypeFor: (fileName: string) => string;
export declare const securityHeaders: () => Record<string, string>;
export declare const resolveInside: (root: string, urlPathname: string) => string | null;
