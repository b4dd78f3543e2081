export declare const CLIENT_INPUTS: string[];
export declare const STAMP: string;
export declare function clientSourceHash(root: string): string;
export declare function needsBuild(root: string, outDir?: string): boolean;
