// @ts-nocheck
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
  return inputs.every((file) => {
    const full = path.join(projectRoot, file);
    return existsSync(full) && statSync(full).mtimeMs <= builtAt;
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
 * @param {{ entry: string, format: 'esm' | 'cjs' }} options
 */
export function bundleOptions({ entry, format }) {
  return {
    entryPoints: [path.join(projectRoot, entry)],
    absWorkingDir: projectRoot,
    bundle: true,
    platform: 'node',
    format,
    target: 'node20',
    logLevel: 'error',
    // papaparse is CommonJS; an ESM bundle needs a require to load it.
    ...(format === 'esm'
      ? { banner: { js: "import { createRequire as __createRequire } from 'node:module'; const require = __createRequire(import.meta.url);" } }
      : {}),
  };
}

/**
 * The bundle of `entry` (a path from the project root) as `name`.mjs (ESM) or `name`.cjs (CommonJS), built
 * first if it is missing or stale. Returns its absolute path and whether it was just built.
 * @param {{ entry: string, name: string, format: 'esm' | 'cjs' }} options
 * @returns {{ file: string, rebuilt: boolean }}
 */
export function freshBundle({ entry, name, format }) {
  const file = path.join(cacheDir, `${name}.${format === 'esm' ? 'mjs' : 'cjs'}`);
  const inputsFile = path.join(cacheDir, `${name}.inputs.json`);
  if (isFresh(file, inputsFile)) return { file, rebuilt: false };
  mkdirSync(cacheDir, { recursive: true });
  // Loaded only to build: a fresh bundle is the common case, and loading esbuild costs more than the check.
  const { buildSync } = createRequire(import.meta.url)('esbuild');
  const result = buildSync({ ...bundleOptions({ entry, format }), outfile: file, write: false, metafile: true });
  writeWhole(file, result.outputFiles[0].contents);
  writeWhole(inputsFile, JSON.stringify(Object.keys(result.metafile.inputs)));
  return { file, rebuilt: true };
}
