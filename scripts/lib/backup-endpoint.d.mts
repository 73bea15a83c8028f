export declare const BACKUP_PATH: string;
export declare const SECRET_HEADER: string;
export declare const MAX_BACKUP_BYTES: number;
