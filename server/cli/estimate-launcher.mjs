// `npm run estimate` starts here. The command runs from a single bundled file, so it starts in a
// fraction of the time a TypeScript loader needs; the bundle is rebuilt first whenever any source it
// was built from has changed since, so the command always runs the code in the tree.
import { existsSync, readFileSync, statSync, mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const cacheDir = path.join(root, 'node_modules', '.cache', 'tramontane');
const bundle = path.join(cacheDir, 'estimate.mjs');
const inputsFile = path.join(cacheDir, 'estimate.inputs.json');

function isFresh() {
  if (!existsSync(bundle) || !existsSync(inputsFile)) return false;
  const builtAt = statSync(bundle).mtimeMs;
  const inputs = JSON.parse(readFileSync(inputsFile, 'utf8'));
  return inputs.every((file) => {
    const full = path.join(root, file);
    return existsSync(full) && statSync(full).mtimeMs <= builtAt;
  });
}

if (!isFresh()) {
  const { build } = await import('esbuild');
  mkdirSync(cacheDir, { recursive: true });
  const result = await build({
    entryPoints: [path.join(root, 'server/cli/estimate.ts')],
    absWorkingDir: root,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    outfile: bundle,
    metafile: true,
    logLevel: 'error',
    // papaparse is CommonJS; give the ESM bundle a require for it.
    banner: { js: "import { createRequire as __createRequire } from 'node:module'; const require = __createRequire(import.meta.url);" },
  });
  writeFileSync(inputsFile, JSON.stringify(Object.keys(result.metafile.inputs)));
}

await import(pathToFileURL(bundle).href);
