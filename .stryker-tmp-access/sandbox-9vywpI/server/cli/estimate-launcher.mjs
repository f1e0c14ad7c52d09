#!/usr/bin/env node
// @ts-nocheck
// `npm run estimate` starts here. The command runs from a single bundled file, so it starts in a
// fraction of the time a TypeScript loader needs; the bundle is rebuilt first whenever any source it
// was built from has changed since (workers/fresh-bundle.mjs), so the command always runs the code in the
// tree. V8's code cache for the bundle is kept beside it (Node 20 has no built-in compile cache for user
// code), so later runs skip compiling it again.
import { existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import vm from 'node:vm';
import { freshBundle } from '../../workers/fresh-bundle.mjs';

const { file: bundle, rebuilt } = freshBundle({ entry: 'server/cli/estimate.ts', name: 'estimate', format: 'cjs' });
const codeCacheFile = bundle.replace(/\.cjs$/, '.v8cache');
if (rebuilt) rmSync(codeCacheFile, { force: true });

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
