// One file of JavaScript from a TypeScript entry and everything it imports, built with esbuild into
// node_modules/.cache/tramontane/ and rebuilt only when a source it was built from has changed since.
// The worker pool's threads and the command line run from such bundles: they start in a fraction of the
// time a TypeScript loader needs and run as fast as the main thread. Plain JavaScript, so it loads
// before any TypeScript does.
import { existsSync, mkdirSync, readFileSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const cacheDir = path.join(projectRoot, 'node_modules', '.cache', 'tramontane');

function isFresh(bundle, inputsFile) {
  if (!existsSync(bundle) || !existsSync(inputsFile)) return false;
  const builtAt = statSync(bundle).mtimeMs;
  const inputs = JSON.parse(readFileSync(inputsFile, 'utf8'));
  // One stat per source (no separate existence check): the command line pays for these on every start.
  return inputs.every((file) => {
    const stats = statSync(path.join(projectRoot, file), { throwIfNoEntry: false });
    return stats !== undefined && stats.mtimeMs <= builtAt;
  });
}

/** Written aside and renamed, so a process starting meanwhile never reads half a file. */
function writeWhole(file, contents) {
  const aside = `${file}.${process.pid}.${Math.random().toString(36).slice(2)}`;
  writeFileSync(aside, contents);
  renameSync(aside, file);
}

/**
 * esbuild's options for one bundle of `entry` (a path from the project root) for Node 20: the same for the bundles
 * built on demand here and for the ones `npm run build` writes to dist/ (server/build.mjs).
 * `compact` drops white space and comments and writes only ASCII (names are kept, so stack traces and profiles still
 * read): a smaller file that Node reads as Latin-1 and V8 loads faster, for the command line, which pays for loading
 * its bundle on every call.
 * @param {{ entry: string, format: 'esm' | 'cjs', compact?: boolean }} options
 */
export function bundleOptions({ entry, format, compact = false }) {
  return {
    ...(compact ? { minifyWhitespace: true, minifySyntax: true, legalComments: 'none', charset: 'ascii' } : {}),
    entryPoints: [path.join(projectRoot, entry)],
    absWorkingDir: projectRoot,
    bundle: true,
    platform: 'node',
    format,
    target: 'node20',
    logLevel: 'error',
    // a native addon: loaded from node_modules where the bundle runs (the run queue's threads store runs through it)
    external: ['better-sqlite3'],
    // papaparse is CommonJS; an ESM bundle needs a require to load it. A CommonJS bundle has no import.meta: the few
    // modules that find files from their own address (server/paths.ts) get the bundle's own, as an ESM bundle would.
    ...(format === 'esm'
      ? { banner: { js: "import { createRequire as __createRequire } from 'node:module'; const require = __createRequire(import.meta.url);" } }
      : { banner: { js: "const __bundleUrl = require('node:url').pathToFileURL(__filename).href;" }, define: { 'import.meta.url': '__bundleUrl' } }),
  };
}

/**
 * The bundle of `entry` (a path from the project root) as `name`.mjs (ESM) or `name`.cjs (CommonJS), built
 * first if it is missing or stale (`compact`: see bundleOptions). Returns its absolute path and whether it was just built.
 * @param {{ entry: string, name: string, format: 'esm' | 'cjs', compact?: boolean }} options
 * @returns {{ file: string, rebuilt: boolean }}
 */
export function freshBundle({ entry, name, format, compact = false }) {
  const file = path.join(cacheDir, `${name}.${format === 'esm' ? 'mjs' : 'cjs'}`);
  const inputsFile = path.join(cacheDir, `${name}.inputs.json`);
  if (isFresh(file, inputsFile)) return { file, rebuilt: false };
  mkdirSync(cacheDir, { recursive: true });
  // Loaded only to build: a fresh bundle is the common case, and loading esbuild costs more than the check.
  const { buildSync } = createRequire(import.meta.url)('esbuild');
  const result = buildSync({ ...bundleOptions({ entry, format, compact }), outfile: file, write: false, metafile: true });
  writeWhole(file, result.outputFiles[0].contents);
  // this file too: a change to the bundle options rebuilds every bundle
  writeWhole(inputsFile, JSON.stringify([...Object.keys(result.metafile.inputs), path.relative(projectRoot, fileURLToPath(import.meta.url))]));
  return { file, rebuilt: true };
}
