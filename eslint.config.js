import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist', 'dist-cli', 'node_modules', 'test-results', 'bench/out'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-eval': 'error',
      'no-implied-eval': 'error',
    },
  },
  {
    // the command's launcher and bundle builder are CommonJS on purpose (the fastest start-up)
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs' },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    files: ['src/core/**/*.ts'],
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['react', 'react-dom', 'react/*', 'zustand', 'zustand/*', 'd3', 'd3-*'],
              message: 'src/core is pure: no UI or store imports.',
            },
            {
              group: ['node:*', 'fs', 'path', 'child_process', 'os'],
              message: 'src/core is pure: no Node imports.',
            },
            {
              group: ['**/store/**', '**/views/**', '**/cli/**', '**/share/**'],
              message: 'src/core imports nothing from other layers.',
            },
          ],
        },
      ],
    },
  },
);
