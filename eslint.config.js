// Drift checks that run in `npm run lint` (and so in `npm test`): import boundaries and cycles.
// The boundaries are written down in DEVELOPERS.md ("Where code lives"); change both together.
import { readdirSync, statSync } from 'node:fs';
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import { importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const dirsOf = (path) => readdirSync(path).filter((name) => statSync(`${path}/${name}`).isDirectory());

// Server folders that are not domains: the app shell and the parts every domain may use.
const SERVER_PLATFORM = ['auth', 'bench', 'cli', 'core', 'db', 'http', 'jobs'];
const SERVER_DOMAINS = dirsOf('server').filter((d) => !SERVER_PLATFORM.includes(d));
const FEATURES = dirsOf('src/features');

/** A domain is entered from another domain only through its index.ts. */
const domainZones = SERVER_DOMAINS.flatMap((from) =>
  SERVER_DOMAINS.filter((d) => d !== from).map((target) => ({
    target: `./server/${target}`,
    from: `./server/${from}`,
    except: ['./index.ts'],
    message: `Use what server/${from}/index.ts offers; the rest of a domain is private to it.`,
  })),
);

/** Outside the domains (app shell, seed, routes table, CLI), nobody reads a repository directly. */
const repositoryZones = [
  {
    target: ['./server/*.ts', ...SERVER_PLATFORM.map((d) => `./server/${d}/**`)],
    from: './server/*/*.repository.ts',
    message: "Repositories are private to their domain: call the domain's index.ts.",
  },
  {
    target: './server/*/*.routes.ts',
    from: './server/*/*.repository.ts',
    message: 'Routes call services; only services call repositories.',
  },
];

/** Client features stay independent of each other and of the app shell. */
const featureZones = FEATURES.map((feature) => ({
  target: `./src/features/${feature}`,
  from: './src/features',
  except: [`./${feature}`],
  message: 'Features never import each other: lift shared code to src/lib or src/components.',
}));

export default tseslint.config(
  // The cycle fixture is a deliberate violation, linted on purpose by tests/lint/boundary-rules.test.ts.
  { ignores: ['dist/**', 'node_modules/**', 'test-results/**', 'coverage/**', 'types/**', 'tests/lint/fixtures/**'] },
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    extends: [js.configs.recommended, ...tseslint.configs.recommended],
    plugins: { 'import-x': importX },
    languageOptions: { ecmaVersion: 2023, sourceType: 'module', globals: { ...globals.node, ...globals.browser } },
    settings: {
      // Without these, import-x reads only .js files when it follows imports, and no-cycle sees nothing.
      'import-x/extensions': ['.ts', '.tsx', '.js', '.mjs'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-duplicates': 'error',
      'import-x/no-self-import': 'error',
      'import-x/no-useless-path-segments': 'error',
      '@typescript-eslint/no-namespace': ['error', { allowDeclarations: true }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./src', './server', './workers', './migrations', './cli', './bench', './tests'], message: 'shared/ stands alone: client, server, workers and CLI import it, never the other way.' },
            { target: './src', from: ['./server', './migrations', './cli', './bench'], message: 'The client talks to the server over HTTP only.' },
            { target: './src/features', from: './src/app', message: 'Features never import the app shell; routes compose features.' },
            { target: './workers', from: ['./src', './server', './migrations', './cli', './bench'], message: 'Workers run only shared/ code.' },
            { target: './server', from: ['./src', './workers'], message: 'The server never imports client code.' },
            ...featureZones,
            ...domainZones,
            ...repositoryZones,
          ],
        },
      ],
    },
  },
  {
    // Migrations are frozen history: they import only kysely, never today's code, and take
    // `Kysely<any>` as Kysely's migration guide does (the schema they see is the one they build).
    files: ['migrations/**/*.ts', 'server/db/migrator.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['migrations/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: [{ regex: '^(?!kysely$)', message: 'Migrations import only kysely.' }] }] },
  },
  {
    // shared/ runs in the browser, in workers and in Node alike.
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: [{ regex: '^node:', message: 'shared/ runs in browsers too: no Node built-ins.' }] }] },
  },
);
