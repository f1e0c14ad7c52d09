/** The project's root folder. */
export declare const projectRoot: string;

/**
 * The bundle of `entry` (a path from the project root) as `name`.mjs (ESM) or `name`.cjs (CommonJS) in
 * node_modules/.cache/tramontane/, built first if it is missing or stale. Its absolute path, and whether it was just built.
 */
export declare function freshBundle(options: { entry: string; name: string; format: 'esm' | 'cjs' }): { file: string; rebuilt: boolean };
