// ESLint for the whole tree (`npm run lint`; DEVELOPERS.md, "Lint and format").
// Syntax-only rules: nothing here needs type information, so linting stays fast and the type check
// (`npm run typecheck`) remains the one place types are judged.
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

const root = import.meta.dirname;

/** One entry per folder in src/features, so a new feature is walled off without editing this file. */
const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/**
 * Everything in server/ but the routes and app.ts (which wires them), as paths: none of it may import a route. Read
 * from the folder, so a new domain module is covered without editing this file.
 */
const serverOutsideRoutes = readdirSync(new URL('./server', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.name !== 'routes' && entry.name !== 'app.ts')
  .map((entry) => `./server/${entry.name}`);

/**
 * The import boundaries DEVELOPERS.md states in prose ("Imports flow one way"). Paths are resolved
 * (the '@/…' alias included), so a relative path cannot slip past a rule.
 */
const boundaryZones = [
  {
    target: './shared',
    from: ['./src', './server', './workers', './tests', './sample-weather'],
    message: 'shared/ imports nothing of ours outside shared/ (DEVELOPERS.md, Layout).',
  },
  {
    target: './src',
    from: ['./server', './workers', './tests'],
    message: 'The client (src/) imports shared/ and its own modules, never server/ or workers/ (DEVELOPERS.md, Layout).',
  },
  {
    target: ['./server', './workers'],
    from: './src',
    message: 'server/ and workers/ never import the client (src/) (DEVELOPERS.md, Layout).',
  },
  {
    target: './server/routes',
    from: './server/routes',
    message: 'No route imports another route: move what both need into the domain module (server/<domain>/) and call it from each (DEVELOPERS.md, Layout).',
  },
  {
    target: [...serverOutsideRoutes, './workers'],
    from: './server/routes',
    message: 'Only server/app.ts imports the routes; domain modules, the demo and the pool call no route (DEVELOPERS.md, Layout).',
  },
  ...features.map((feature) => ({
    target: `./src/features/${feature}`,
    from: './src/features',
    except: [`./${feature}`],
    message: `Features never import each other: move what src/features/${feature} needs into src/components, src/lib or shared/, or compose the features in src/app (DEVELOPERS.md, Layout).`,
  })),
  {
    target: ['./src/components', './src/lib'],
    from: ['./src/features', './src/app'],
    message: 'src/components and src/lib are shared by every feature and import no feature and not src/app (DEVELOPERS.md, Layout).',
  },
  {
    target: './src/app/router.tsx',
    from: './src/features',
    message: 'The router wires pages one way: every page is a route module in src/app/routes, which composes the features (DEVELOPERS.md, Layout).',
  },
  {
    target: './src/features',
    from: './src/app',
    message: 'Features never import src/app; the app imports features (DEVELOPERS.md, Layout).',
  },
];

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'data/', 'test-results/', '.tmp/', 'drizzle/', '.stryker-tmp*/', 'reports/'] },
  js.configs.recommended,
  tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // As the type check's noUnusedParameters: a leading underscore marks a name kept on purpose.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' }],
    },
  },
  {
    // CommonJS files (a --require preload of the bench) load what they need with require().
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs' },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    files: ['src/**/*.{ts,tsx}', 'tests/component/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    ...reactHooks.configs.flat['recommended-latest'],
    rules: {
      ...reactHooks.configs.flat['recommended-latest'].rules,
      // These two only say where React Compiler would skip or de-optimise a component. The client is not built
      // with React Compiler (vite.config.ts), so there is nothing to skip; the Rules-of-React checks stay on.
      'react-hooks/incompatible-library': 'off',
      'react-hooks/preserve-manual-memoization': 'off',
    },
  },
  {
    // Routes parse, authorise, call and answer: queries live in the domain modules (DEVELOPERS.md, Layout).
    files: ['server/routes/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'drizzle-orm', message: 'Routes do not query the database: put the query in the domain module (server/<domain>/) and call it.' }],
        },
      ],
    },
  },
  {
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: `${root}/tsconfig.json` })],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { basePath: root, zones: boundaryZones }],
    },
  },
);
