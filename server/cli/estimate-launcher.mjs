// `npm run estimate` starts here. The command runs from a single bundled file, so it starts in a
// fraction of the time a TypeScript loader needs; the bundle is rebuilt first whenever any source it
// was built from has changed since, so the command always runs the code in the tree. V8's code cache
// for the bundle is kept beside it (Node 20 has no built-in compile cache for user code), so later
// runs skip compiling it again.
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import vm from 'node:vm';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const cacheDir = path.join(root, 'node_modules', '.cache', 'tramontane');
const bundle = path.join(cacheDir, 'estimate.cjs');
const inputsFile = path.join(cacheDir, 'estimate.inputs.json');
const codeCacheFile = path.join(cacheDir, 'estimate.v8cache');

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
  rmSync(codeCacheFile, { force: true });
  const result = await build({
    entryPoints: [path.join(root, 'server/cli/estimate.ts')],
    absWorkingDir: root,
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    outfile: bundle,
    write: false,
    metafile: true,
    logLevel: 'error',
  });
  // Written aside and renamed, so a command started meanwhile never reads half a bundle.
  const aside = `${bundle}.${process.pid}`;
  writeFileSync(aside, result.outputFiles[0].contents);
  renameSync(aside, bundle);
  writeFileSync(inputsFile, JSON.stringify(Object.keys(result.metafile.inputs)));
}

// The bundle runs as Node runs a CommonJS module, compiled through vm.Script so its code cache can be
// handed in; V8 refuses a cache made from other source or by another V8, and the cache is then made afresh.
const cachedData = existsSync(codeCacheFile) ? readFileSync(codeCacheFile) : undefined;
const script = new vm.Script(`(function (exports, require, module, __filename, __dirname) {${readFileSync(bundle, 'utf8')}\n})`, {
  filename: bundle,
  cachedData,
});
if (cachedData === undefined || script.cachedDataRejected) {
  // Made at exit, so the cache also holds the functions compiled while the command ran.
  process.once('exit', () => {
    try {
      writeFileSync(codeCacheFile, script.createCachedData());
    } catch {
      // A read-only checkout only loses the speed-up.
    }
  });
}
const module = { exports: {} };
script.runInThisContext()(module.exports, createRequire(bundle), module, bundle, path.dirname(bundle));
