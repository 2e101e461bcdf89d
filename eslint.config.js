// One lint configuration for the whole tree (`npm run lint`, part of `npm test`): typescript-eslint's
// recommended rules, React's hook rules for the front end, and the project's import walls.
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';
import importBoundaries from './scripts/lint/import-boundaries.mjs';

export default tseslint.config(
  { ignores: ['**/node_modules/**', '**/dist/**', 'test-artifacts/**', 'coverage/**', 'drizzle/**', 'data/**', '.data/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { linkloom: { rules: { 'import-boundaries': importBoundaries } } },
    rules: {
      'linkloom/import-boundaries': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    files: ['frontend/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    files: ['**/*.{js,mjs,cjs}'],
    languageOptions: {
      globals: {
        process: 'readonly',
        console: 'readonly',
        URL: 'readonly',
        setTimeout: 'readonly',
        clearTimeout: 'readonly',
        Buffer: 'readonly',
        fetch: 'readonly',
        document: 'readonly',
        window: 'readonly',
      },
    },
  },
);
