/**
 * `npm run bench` — every speed and memory target of the project, measured in one run.
 * Each suite is a module in this folder exporting `suite: BenchSuite`; ratios are taken
 * against a reference measured in the same run, never against a fixed time.
 * `npm run bench -- --json` prints one JSON line merging every suite's figures.
 */
// @ts-nocheck

import { readdir } from 'node:fs/promises';
import { fileURLToPath, pathToFileURL } from 'node:url';
import path from 'node:path';
import type { BenchSuite } from './suite';

const json = process.argv.includes('--json');
const only = process.argv.find((a) => a.startsWith('--only='))?.slice('--only='.length);
const folder = path.dirname(fileURLToPath(import.meta.url));
const files = (await readdir(folder)).filter((f) => f.endsWith('.bench.ts')).sort();

const merged: Record<string, number | string> = {};
for (const file of files) {
  const { suite } = (await import(pathToFileURL(path.join(folder, file)).href)) as { suite: BenchSuite };
  if (only && suite.name !== only) continue;
  const figures = await suite.run({ log: json ? () => {} : (line) => console.log(line) });
  Object.assign(merged, figures);
  if (!json) console.table(figures);
}
if (json) process.stdout.write(`${JSON.stringify(merged)}\n`);
