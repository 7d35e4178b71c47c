// ESLint for Tallyforge: TypeScript's and React's rules, and the folder table of DEVELOPERS.md as import
// boundaries, so a change that crosses a seam fails `npm test` instead of waiting for a review.
import nextPlugin from '@next/eslint-plugin-next';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';
import clientBoundary from './scripts/lint/client-boundary.mjs';

// Who may not import whom: [files, the folders they must not reach, why].
const BOUNDARIES = [
  ['lib/**', ['app', 'server', 'models', 'labels'], 'lib/ is pure code for browser and server: it imports nothing of the app'],
  ['models/**', ['app', 'server', 'labels'], 'models/ may use lib/ only'],
  ['labels/**', ['app', 'server', 'models'], 'labels/ may use lib/ and fonts/ only'],
  ['server/**', ['app'], 'server/ never imports pages or routes'],
];

// An import of one of these top-level folders, by alias or by climbing out of the file's own folder.
const folderRegex = (folders) => `^(@/|(\\.\\./)+)(${folders.join('|')})(/|$)`;

const boundary = ([files, folders, why]) => ({
  files: [files],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: [
          { regex: folderRegex(folders), message: why },
          ...(files === 'lib/**' ? [{ group: ['sequelize', 'server-only', 'next', 'next/*'], message: why }] : []),
        ],
      },
    ],
  },
});

export default tseslint.config(
  { ignores: ['.next/**', 'node_modules/**', '.data/**', 'test-results/**', 'bench-results/**', '.scratch/**', 'next-env.d.ts'] },
  ...tseslint.configs.recommended,
  {
    plugins: { 'react-hooks': reactHooks, '@next/next': nextPlugin, tallyforge: { rules: { 'client-boundary': clientBoundary } } },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...nextPlugin.configs.recommended.rules,
      'tallyforge/client-boundary': 'error',
      // Off by choice: the bench restores its count from browser storage after hydration (the server
      // render cannot read it) and drops a waiting press when the step changes, both by setting state in
      // an effect. The rule is about extra renders, not correctness; the other compiler rules stay on.
      'react-hooks/set-state-in-effect': 'off',
      // Unused names are errors, but a leading underscore says "unused on purpose" (an ignored argument).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  ...BOUNDARIES.map(boundary),
  {
    // A migration keeps what it shipped with: it imports sequelize and nothing of the app.
    files: ['models/migrations/**'],
    ignores: ['models/migrations/index.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ regex: '^(@/|\\.\\./)', message: 'a migration writes out its own values; it never imports the vocabulary or the models' }] },
      ],
    },
  },
);
