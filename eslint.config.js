// Flat ESLint config for the whole monorepo. Enforces the one-way dependency rule:
// the engine imports nothing app-level; web and server never import each other.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '.data/**', 'reports/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['packages/engine/src/**/*.ts'],
    ignores: ['packages/engine/src/cli.ts', 'packages/engine/src/**/*.test.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['@sheaf/server', '@sheaf/web', 'react', 'react-dom', 'express', 'typeorm', 'pg', 'ws'], message: 'The engine imports nothing app-level.' },
            { group: ['fs', 'node:*', 'path'], message: 'Only the engine CLI may touch Node.' },
          ],
        },
      ],
    },
  },
  {
    files: ['packages/server/src/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: [{ group: ['@sheaf/web', '@sheaf/web/*'], message: 'server never imports web' }] }] },
  },
  {
    files: ['packages/web/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': ['error', { patterns: [{ group: ['@sheaf/server', '@sheaf/server/*'], message: 'web never imports server' }] }],
    },
  },
);
