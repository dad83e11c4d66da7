/** Types for bundle.mjs (plain JavaScript, so that the entry script can load it before tsx). */
export declare const LEFT_OUTSIDE: readonly string[];
export declare function projectRoot(from?: string): string;
export declare function bundleKey(root?: string): string;
export declare function bundleFolder(root?: string): string;
export declare function ensureBundle(root?: string): Promise<string>;
export declare const OLD_BUILD_AGE_MS: number;
export declare function pruneOldBuilds(cacheFolder: string, keep: string, now?: number): string[];
