/**
 * The import boundaries of DEVELOPERS.md ("Imports flow one way") are enforced by eslint.config.js. Each case
 * lints one import line as if it were written in a file of the named folder, through ESLint's Node API with the
 * project's own configuration, and checks whether the boundary rule refuses it. The imported modules are real
 * files, so the rule resolves them as it does in `npm run lint` (the '@/…' alias included).
 */
import { fileURLToPath } from 'node:url';
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const eslint = new ESLint({ cwd: root });
const RULE = 'import-x/no-restricted-paths';

/** The boundary rule's messages for `code` written in `file` (a path from the project root; it need not exist). */
async function boundaryErrors(file: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(`${code}\nexport {};\n`, { filePath: `${root}/${file}` });
  return result.messages.filter((m) => m.ruleId === RULE).map((m) => m.message);
}

// ESLint loads typescript-eslint and the resolver on first use; allow a busy machine.
const slow = { timeout: 60_000 };

describe('import boundaries (DEVELOPERS.md, Layout)', () => {
  it.each([
    ['shared/ importing the client', 'shared/boundary-fixture.ts', "import { toDisplay } from '../src/lib/quantity';", /shared\/ imports nothing of ours/],
    [
      'shared/ importing the server',
      'shared/psychrometrics/boundary-fixture.ts',
      "import { createApp } from '../../server/app';",
      /shared\/ imports nothing of ours/,
    ],
    ['shared/ importing the pool', 'shared/boundary-fixture.ts', "import { createWorkerPool } from '../workers/pool';", /shared\/ imports nothing of ours/],
    ['the client importing the server', 'src/lib/boundary-fixture.ts', "import { createApp } from '../../server/app';", /never server\/ or workers\//],
    [
      'the client importing the pool',
      'src/features/runs/api/boundary-fixture.ts',
      "import { createWorkerPool } from '../../../../workers/pool';",
      /never server\/ or workers\//,
    ],
    [
      'a feature importing another through the alias',
      'src/features/runs/api/boundary-fixture.ts',
      "import { createSweep } from '@/features/sweeps/api/create-sweep';",
      /Features never import each other/,
    ],
    [
      'a feature importing another by a relative path',
      'src/features/runs/components/boundary-fixture.tsx',
      "import { createSweep } from '../../sweeps/api/create-sweep';",
      /Features never import each other/,
    ],
    [
      'a shared component importing a feature',
      'src/components/ui/boundary-fixture.tsx',
      "import { cancelRun } from '@/features/runs/api/cancel-run';",
      /import no feature and not src\/app/,
    ],
    [
      'a shared component importing the app',
      'src/components/ui/boundary-fixture.tsx',
      "import { AppShell } from '@/app/app-shell';",
      /import no feature and not src\/app/,
    ],
    [
      'a feature importing the app',
      'src/features/runs/components/boundary-fixture.tsx',
      "import { AppShell } from '@/app/app-shell';",
      /never import src\/app/,
    ],
    [
      'the router importing a page without its route module',
      'src/app/router.tsx',
      "import { RunPage } from '@/features/runs/components/run-page';",
      /every page is a route module in src\/app\/routes/,
    ],
    ['the server importing the client', 'server/routes/boundary-fixture.ts', "import { toDisplay } from '../../src/lib/quantity';", /never import the client/],
    ['a route importing another route', 'server/routes/boundary-fixture.ts', "import { siteRoutes } from './sites';", /No route imports another route/],
    [
      'a domain module importing a route',
      'server/sites/boundary-fixture.ts',
      "import { siteRoutes } from '../routes/sites';",
      /Only server\/app.ts imports the routes/,
    ],
    [
      'the demo importing a route',
      'server/demo/boundary-fixture.ts',
      "import { projectionRoutes } from '../routes/projections';",
      /Only server\/app.ts imports the routes/,
    ],
    [
      'the pool importing a route',
      'workers/boundary-fixture.ts',
      "import { runRoutes } from '../server/routes/runs';",
      /Only server\/app.ts imports the routes/,
    ],
  ])('refuses %s', slow, async (_case, file, code, message) => {
    const errors = await boundaryErrors(file, code);
    expect(errors).toHaveLength(1);
    expect(errors[0]).toMatch(message);
  });

  it('refuses a route querying the database itself', slow, async () => {
    const [result] = await eslint.lintText("import { eq } from 'drizzle-orm';\nexport const _probe = eq;\n", {
      filePath: `${root}/server/routes/boundary-fixture.ts`,
    });
    const messages = result.messages.filter((m) => m.ruleId === 'no-restricted-imports').map((m) => m.message);
    expect(messages).toHaveLength(1);
    expect(messages[0]).toMatch(/Routes do not query the database/);
    // A domain module may.
    const [domain] = await eslint.lintText("import { eq } from 'drizzle-orm';\nexport const _probe = eq;\n", {
      filePath: `${root}/server/sites/boundary-fixture.ts`,
    });
    expect(domain.messages).toEqual([]);
  });

  it.each([
    [
      'a feature importing its own modules, src/lib, src/components and shared/',
      'src/features/runs/components/boundary-fixture.tsx',
      "import { cancelRun } from '../api/cancel-run';\nimport { toDisplay } from '@/lib/quantity';\nimport { Panel } from '@/components/ui/panel';\nimport { withoutControlCharacters } from '../../../../shared/schemas/plain-text';",
    ],
    [
      'the app composing features',
      'src/app/boundary-fixture.tsx',
      "import { cancelRun } from '@/features/runs/api/cancel-run';\nimport { createSweep } from '@/features/sweeps/api/create-sweep';",
    ],
    [
      'the router importing route modules and the shell',
      'src/app/router.tsx',
      "import { RunRoute } from './routes/run';\nimport { AppShell } from './app-shell';",
    ],
    [
      'the app wiring the routes, and a route calling domain modules',
      'server/routes/boundary-fixture.ts',
      "import { findSite } from '../sites/store';\nimport { validScenario } from '../scenarios/store';",
    ],
    ['app.ts importing a route', 'server/app.ts', "import { siteRoutes } from './routes/sites';"],
    ['the server and a test importing shared/', 'server/boundary-fixture.ts', "import { withoutControlCharacters } from '../shared/schemas/plain-text';"],
    [
      'a test importing anything',
      'tests/unit/boundary-fixture.test.ts',
      "import { createApp } from '../../server/app';\nimport { toDisplay } from '../../src/lib/quantity';",
    ],
  ])('allows %s', slow, async (_case, file, code) => {
    expect(await boundaryErrors(file, code)).toEqual([]);
  });
});
