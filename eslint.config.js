// Lint rules, including the layer rules of DEVELOPERS.md: each folder may import only what its layer allows.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

const nodeBuiltins = [
  'node:*',
  'fs',
  'fs/*',
  'path',
  'os',
  'child_process',
  'worker_threads',
  'http',
  'https',
  'net',
  'crypto',
  'url',
  'stream',
  'util',
  'events',
  'module',
  'process',
  'buffer',
  'zlib',
];

const forbid = (groups, message) => ['error', { patterns: groups.map((group) => ({ group: [group], message })) }];

export default tseslint.config(
  {
    ignores: [
      'node_modules/**',
      'dist/**',
      'dist-electron/**',
      'release/**',
      '.tsbuild/**',
      'test-output/**',
      '.native/**',
      'test/fixtures/**',
      '.cache/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      'no-empty': ['error', { allowEmptyCatch: false }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['scripts/**/*.mjs', 'bin/**/*.mjs', 'eslint.config.js'],
    languageOptions: { globals: { process: 'readonly', console: 'readonly', URL: 'readonly' } },
  },
  {
    files: ['shared-model/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: nodeBuiltins,
              message: 'shared-model is pure: no Node built-ins (see DEVELOPERS.md, layer rules).',
            },
            { group: ['electron', 'electron/*'], message: 'shared-model must not import electron.' },
            {
              group: ['better-sqlite3', '**/db/**', '../db', '../../db'],
              message: 'shared-model must not import the store.',
            },
            { group: ['react', 'react-dom', '**/renderer/**'], message: 'shared-model must not import UI code.' },
          ],
        },
      ],
      'no-restricted-globals': ['error', 'process', 'window', 'document', 'require', '__dirname'],
    },
  },
  {
    files: ['db/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['electron', 'electron/*'], message: 'db must not import electron.' },
            { group: ['**/renderer/**', 'react', 'react-dom'], message: 'db must not import UI code.' },
            { group: ['**/electron/**'], message: 'db must not import from the electron/ layer.' },
          ],
        },
      ],
    },
  },
  {
    files: ['electron/**/*.ts', 'electron/**/*.cts'],
    ignores: ['electron/desktop/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        forbid(
          ['electron', 'electron/*'],
          "Only electron/desktop/ imports 'electron' (see DEVELOPERS.md, layer rules).",
        )[1],
      ],
    },
  },
  {
    files: ['electron/cli/**/*.ts', 'electron/host/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['electron', 'electron/*'], message: "The CLI and the browser host never import 'electron'." },
            {
              group: ['**/db/**', 'better-sqlite3'],
              message:
                'The CLI and the browser host reach the store through services (electron/services/workspace.ts and dispatch), never db/ directly.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['electron/**/*.ts', 'electron/**/*.cts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        { selector: 'ImportDeclaration[source.value=/renderer/]', message: 'electron/ must not import renderer code.' },
      ],
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    ignores: ['test/fixtures/**', '.cache/**'],
    languageOptions: {
      parserOptions: {
        projectService: { allowDefaultProject: ['vitest.config.ts', 'renderer/vite.config.ts', 'scripts/dev/*.ts'] },
        tsconfigRootDir: import.meta.dirname,
      },
    },
    rules: { '@typescript-eslint/no-floating-promises': 'error' },
  },
  {
    files: ['renderer/**/*.ts', 'renderer/**/*.tsx'],
    ignores: ['renderer/vite.config.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: nodeBuiltins, message: 'renderer runs in the browser: no Node built-ins.' },
            {
              group: ['electron', 'electron/*', '**/electron/**'],
              message: 'renderer reaches data only through the api client.',
            },
            { group: ['better-sqlite3', '**/db/**'], message: 'renderer reaches data only through the api client.' },
          ],
        },
      ],
    },
  },
);
