// The boundaries between the packages and inside them, checked rather than hoped for; `npm run lint`, and `npm test`
// runs it first.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import { defineConfig } from 'eslint/config';
import { importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const root = import.meta.dirname;
const foldersIn = (dir) =>
  readdirSync(join(root, dir), { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .map((entry) => entry.name);

// Read from the tree at each run, so that a feature added or renamed is fenced without editing this file.
const webFeatures = foldersIn('web/src/features');

const boundaries = [
  { target: 'core', from: ['api', 'web', 'e2e'], message: 'core is shared by both sides and imports neither.' },
  { target: 'api', from: 'web', message: 'The API and the app talk over HTTP only; what both need belongs in core.' },
  { target: 'web', from: 'api', message: 'The app and the API talk over HTTP only; what both need belongs in core.' },
  {
    target: ['api', 'web'],
    from: 'core/src',
    message: "Import core as @wiretrail/core (its built dist), as every other file does, not from its sources.",
  },
  {
    target: 'api/src/common',
    from: 'api/src',
    // The database's column types and SQL helpers and the typed config sit below common; every other folder is a
    // feature (or a module of its own) and may import common, not the other way round.
    except: ['./common', './config', './database'],
    message: 'api/src/common is cross-cutting and imports no feature: move what both need into common, or into a module of its own.',
  },
  {
    target: ['web/src/lib', 'web/src/components', 'web/src/config'],
    from: ['web/src/features', 'web/src/app'],
    message: 'Shared code imports no feature and no route: imports flow shared → features → app.',
  },
  {
    target: 'web/src/features',
    from: 'web/src/app',
    message: 'A feature imports no route or app wiring: imports flow shared → features → app.',
  },
  ...webFeatures.map((feature) => ({
    target: `web/src/features/${feature}`,
    from: 'web/src/features',
    except: [`./${feature}`],
    message: 'A feature never imports another feature: compose them in web/src/app, or move what both need into lib or components.',
  })),
];

export default defineConfig(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      'data/**',
      'coverage/**',
      'web/dev-dist/**',
      'e2e/test-results/**',
      '**/playwright-report/**',
    ],
  },
  {
    files: ['**/*.{js,mjs,cjs,ts,mts,cts,tsx}'],
    extends: [js.configs.recommended, tseslint.configs.recommended],
    plugins: { 'import-x': importX },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    settings: {
      'import-x/resolver-next': [
        createTypeScriptImportResolver({
          project: ['core/tsconfig.json', 'api/tsconfig.json', 'web/tsconfig.json', 'e2e/tsconfig.json'],
          noWarnOnMultipleProjects: true,
        }),
      ],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { basePath: root, zones: boundaries }],
      // A leading underscore names what is left out on purpose (a rest copy without the id, an unused argument).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', ignoreRestSiblings: true }],
    },
  },
  {
    files: ['scripts/**', 'api/**', 'e2e/**', 'core/**', '*.js', 'web/*.ts'],
    languageOptions: { globals: globals.node },
  },
  {
    files: ['web/src/**'],
    languageOptions: { globals: globals.browser },
  },
  {
    // The calculation core is pure: its sources import only each other (no Node, no framework, no package), so
    // both sides run the same rule on the same figures. Tests may use their runner and fast-check. Two packages are
    // let in, pure functions over data with no dependencies of their own: the UK postcode and phone number checks,
    // which the office's forms and the API must apply alike.
    files: ['core/src/**/*.ts'],
    ignores: ['core/src/**/*.test.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(?!\\.{1,2}/|postcode$|libphonenumber-js/min$)',
              message: 'core is pure: it imports only its own files, never Node, a framework or a package.',
            },
          ],
        },
      ],
    },
  },
);
