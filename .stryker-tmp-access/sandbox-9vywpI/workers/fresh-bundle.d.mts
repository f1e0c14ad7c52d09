/** The project's root folder. */
// @ts-nocheck

export declare const projectRoot: string;

/**
 * The bundle of `entry` (a path from the project root) as `name`.mjs (ESM) or `name`.cjs (CommonJS) in
 * node_modules/.cache/tramontane/, built first if it is missing or stale. Its absolute path, and whether it was just built.
 */
export declare function freshBundle(options: { entry: string; name: string; format: 'esm' | 'cjs' }): { file: string; rebuilt: boolean };

/** esbuild's options for one Node 20 bundle of `entry` (a path from the project root). */
export declare function bundleOptions(options: { entry: string; format: 'esm' | 'cjs' }): Record<string, unknown>;
