import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  {
    ignores: [
      '**/dist/**',
      '**/coverage/**',
      '.data/**',
      'artifacts/**',
      '**/*.config.js',
      '**/*.config.cjs',
      'scripts/bootstrap.mjs',
      'eslint.config.mjs',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.node },
    },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/switch-exhaustiveness-check': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['**/*.spec.ts', '**/*.e2e-spec.ts', '**/*.test.ts', '**/*.test.tsx', '**/test/**', 'client/e2e/**'],
    rules: {
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      '@typescript-eslint/unbound-method': 'off',
    },
  },
  {
    files: ['client/src/**'],
    languageOptions: { globals: { ...globals.browser } },
  },
  // Dependencies point one way: shared imports nothing of ours; client and server never import each other.
  {
    files: ['shared/src/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: ['**/server/**', '**/client/**', '@keenroute/server', '@keenroute/client'] },
      ],
    },
  },
  {
    files: ['client/src/**'],
    rules: { 'no-restricted-imports': ['error', { patterns: ['**/server/**', '@keenroute/server'] }] },
  },
  {
    files: ['server/src/**'],
    rules: { 'no-restricted-imports': ['error', { patterns: ['**/client/**', '@keenroute/client'] }] },
  },
);
