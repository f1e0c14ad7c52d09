// @ts-nocheck
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { build } from 'vite';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The production build the browser tests serve, made once per run in its own folder. */
    clientDist: string;
  }
}

/**
 * Browser tests run against the production build, as `npm start` serves it. It goes to a folder of
 * its own, so a test run never clobbers `dist/` under a running server or another test run.
 */
export default async function setup(project: TestProject): Promise<() => void> {
  const outDir = mkdtempSync(path.join(tmpdir(), 'tramontane-e2e-dist-'));
  // vitest sets NODE_ENV=test, which would make Vite bundle React's development build.
  const previous = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ mode: 'production', logLevel: 'warn', build: { outDir, emptyOutDir: true } });
  } finally {
    process.env.NODE_ENV = previous;
  }
  project.provide('clientDist', outDir);
  return () => rmSync(outDir, { recursive: true, force: true });
}
