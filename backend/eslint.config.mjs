// Lint for the API (src/, test/) and the engine package (engine/src/). Formatting is Prettier's job.
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/**', 'engine/dist/**', 'coverage/**', 'openapi.json'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.ts', '**/*.js', '**/*.mjs'],
    languageOptions: { globals: { ...globals.node } },
    plugins: { 'import-x': importX },
    settings: { 'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.js', '.json'] })] },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': [
        'error',
        { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false },
      ],
      '@typescript-eslint/no-require-imports': ['error', { allowAsImport: true }],
      'import-x/no-cycle': 'error',
      // The engine is a library: nothing of the API may leak into it.
      'import-x/no-restricted-paths': ['error', { zones: [{ target: './engine/src', from: ['./src', './test'] }] }],
    },
  },
  {
    // Nest's dependency injection reads constructor parameter types at run time: they must stay
    // value imports, so type-only import style is not enforced where decorators are used.
    files: ['src/**/*.ts', 'test/**/*.ts'],
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    // The physics stays pure: no framework, no database, no environment, no clock, no files.
    files: ['engine/src/**/*.ts'],
    ignores: ['engine/src/**/*.spec.ts', 'engine/src/testing/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@nestjs/*', 'sequelize', 'sequelize-*', 'class-validator', 'class-transformer'],
              message: 'The engine imports no framework.',
            },
            {
              group: ['node:*', 'fs', 'path', 'os', 'child_process', 'http', 'https'],
              message: 'The engine reads no files and opens no sockets: data arrives as arguments.',
            },
          ],
        },
      ],
      'no-restricted-properties': [
        'error',
        { object: 'process', property: 'env', message: 'The engine reads no environment: pass settings in.' },
        { object: 'Date', property: 'now', message: 'The engine reads no clock: pass the date in.' },
      ],
      'no-restricted-syntax': [
        'error',
        {
          selector: "NewExpression[callee.name='Date'][arguments.length=0]",
          message: 'The engine reads no clock: pass the date in.',
        },
      ],
    },
  },
  {
    files: ['**/*.spec.ts', 'test/**/*.ts'],
    rules: { '@typescript-eslint/no-non-null-assertion': 'off', '@typescript-eslint/no-explicit-any': 'off' },
  },
  prettier,
);
