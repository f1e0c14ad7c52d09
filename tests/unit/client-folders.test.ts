/**
 * The client's folder rules of DEVELOPERS.md ("Layout") that an import rule cannot see: plain modules live in lib/
 * folders (never utils/, never beside components), and every page is a route module in src/app/routes.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const src = fileURLToPath(new URL('../../src', import.meta.url));
const files = (readdirSync(src, { recursive: true }) as string[]).map((f) => f.split('\\').join('/'));

describe('client folders (DEVELOPERS.md, Layout)', () => {
  it('has no utils/ folder', () => {
    expect(files.filter((f) => f.split('/').includes('utils'))).toEqual([]);
  });

  it('keeps only components (.tsx) in components/ folders', () => {
    expect(files.filter((f) => f.split('/').includes('components') && f.endsWith('.ts'))).toEqual([]);
  });

  it('wires each lazily loaded page through a route module that exists', () => {
    const router = readFileSync(`${src}/app/router.tsx`, 'utf8');
    const lazyModules = [...router.matchAll(/import\('([^']+)'\)/g)].map((m) => m[1]);
    expect(lazyModules.length).toBeGreaterThan(20);
    for (const module of lazyModules) {
      expect(module).toMatch(/^\.\/routes\/[a-z-]+$/);
      expect(files).toContain(`app/${module.slice(2)}.tsx`);
    }
  });
});
