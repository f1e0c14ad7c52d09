// `npm run build`: everything production runs, in dist/ — the client (Vite) in dist/client, and one esbuild
// bundle each of the server (dist/server.mjs), the worker pool's threads (dist/workers.cjs) and the command line
// (dist/estimate.cjs). Packages stay in node_modules (installed with `npm ci --omit=dev`); nothing is built at
// run time, so the app runs from a read-only image. With --if-stale (what `npm start` runs) it builds only
// when a source is newer than the last build.
import { existsSync, mkdirSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { bundleOptions, projectRoot } from '../workers/fresh-bundle.mjs';

const dist = path.join(projectRoot, 'dist');
const stamp = path.join(dist, 'build-stamp.json');
const sources = ['src', 'shared', 'server', 'workers', 'public', 'index.html', 'vite.config.ts', 'package-lock.json'];

function newestChange(entry) {
  const full = path.join(projectRoot, entry);
  if (!existsSync(full)) return 0;
  const stats = statSync(full);
  if (!stats.isDirectory()) return stats.mtimeMs;
  let newest = stats.mtimeMs;
  for (const child of readdirSync(full)) newest = Math.max(newest, newestChange(path.join(entry, child)));
  return newest;
}

if (process.argv.includes('--if-stale') && existsSync(stamp)) {
  const builtAt = statSync(stamp).mtimeMs;
  if (sources.every((entry) => newestChange(entry) <= builtAt)) {
    console.log('Build is up to date (dist/).');
    process.exit(0);
  }
}

const started = Date.now();
// Vite bundles React's production build only when NODE_ENV says so.
process.env.NODE_ENV = 'production';
const { build } = await import('vite');
await build({ root: projectRoot, logLevel: 'warn' });

const { build: bundle } = await import('esbuild');
const bundles = [
  // The server: the pool picks dist/workers.cjs when __TRAMONTANE_BUNDLE__ is set, instead of building on demand.
  { entry: 'server/index.ts', format: 'esm', outfile: 'server.mjs', define: { __TRAMONTANE_BUNDLE__: 'true' } },
  { entry: 'workers/dispatch.ts', format: 'cjs', outfile: 'workers.cjs' },
  { entry: 'server/cli/estimate.ts', format: 'cjs', outfile: 'estimate.cjs', compact: true },
];
mkdirSync(dist, { recursive: true });
await Promise.all(
  bundles.map(({ entry, format, outfile, define, compact }) => {
    const options = bundleOptions({ entry, format, compact });
    return bundle({ ...options, outfile: path.join(dist, outfile), packages: 'external', define: { ...options.define, ...define } });
  }),
);
writeFileSync(stamp, JSON.stringify({ builtAt: new Date().toISOString() }));
console.log(`Built dist/ (client, server.mjs, workers.cjs, estimate.cjs) in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
