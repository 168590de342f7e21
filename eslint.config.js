import js from '@eslint/js';
import pluginQuery from '@tanstack/eslint-plugin-query';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import { clientBoundaries } from './eslint/client-boundaries.js';

const processEnv = {
  selector: "MemberExpression[object.name='process'][property.name='env']",
  message: 'Read configuration through server/config/env.ts (loadConfig), not process.env.',
};

export default tseslint.config(
  { ignores: ['dist/**', 'dist-server/**', 'data/**', 'node_modules/**', 'playwright-report/**', 'test-results/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    languageOptions: { globals: globals.browser },
    plugins: { 'react-hooks': reactHooks, '@tanstack/query': pluginQuery, boothwright: clientBoundaries },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...pluginQuery.configs.recommended.rules,
      'boothwright/feature-imports': 'error',
      'boothwright/no-api-paths-in-features': 'error',
      // We do not run the React Compiler; TanStack Table's hook is fine without memoisation.
      'react-hooks/incompatible-library': 'off',
      'no-restricted-imports': ['error', { patterns: [{ group: ['**/server/**', 'typeorm', 'express'], message: 'The client never imports server code.' }] }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/server/**', '**/src/**', 'typeorm', 'express', 'react'], message: 'shared/ is used by both sides and imports neither.' }] },
      ],
    },
  },
  {
    files: ['server/**/*.ts'],
    languageOptions: { globals: globals.node },
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['**/src/**'], message: 'The server never imports client code.' }] }],
      'no-restricted-syntax': ['error', processEnv],
    },
  },
  {
    files: ['server/config/env.ts'],
    rules: { 'no-restricted-syntax': 'off' },
  },
  {
    // Services reach the database only through SiteData, so no query can forget the user's site.
    files: ['server/services/**/*.ts'],
    ignores: ['server/services/pg-event-bus.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'typeorm', importNames: ['DataSource', 'EntityManager', 'Repository'], message: 'Services take a SiteData (server/data/site-data.ts), never the DataSource or a raw EntityManager.' }],
          patterns: [
            { group: ['**/db/entities/*'], allowTypeImports: true, message: 'Read and write rows through SiteData (data.booths, data.coats, …), which applies the site scope; import entities as types only.' },
            { group: ['**/db/transaction', '**/db/data-source'], message: 'Use data.transaction(…) from SiteData.' },
          ],
        },
      ],
    },
  },
  {
    files: ['server/routes/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { patterns: [{ group: ['typeorm', '**/db/**', '**/data/**'], message: 'Routes never touch the database: declare the route in the registry and call a service.' }] },
      ],
    },
  },
  {
    files: ['tests/**/*.{ts,tsx,mjs}', 'bench/**/*.{ts,mjs}', '*.config.{ts,js}', 'eslint/**/*.js', 'scripts/**/*.{ts,mjs}'],
    languageOptions: { globals: globals.node },
  },
  {
    files: ['tests/e2e/**/*.ts'],
    ignores: ['tests/e2e/fixtures.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          paths: [
            {
              name: '@playwright/test',
              importNames: ['test', 'expect'],
              allowTypeImports: true,
              message: 'Import test and expect from tests/e2e/fixtures.ts: it fails a test on any console error, page error or 5xx answer.',
            },
          ],
        },
      ],
    },
  },
);
