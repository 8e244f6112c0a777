// Lint for the app (src/) and its browser tests (e2e/). Formatting is Prettier's job.
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import pluginQuery from '@tanstack/eslint-plugin-query';
import prettier from 'eslint-config-prettier';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

// Pages in app/routes are the only place features meet; shared layers know no feature.
const boundaryZones = [
  ...features.map((feature) => ({
    target: `./src/features/${feature}`,
    from: './src/features',
    except: [`./${feature}`],
    message: 'Features never import each other: compose them in app/routes.',
  })),
  { target: './src/features', from: './src/app', message: 'Features never import the app.' },
  {
    target: ['./src/api', './src/lib', './src/components', './src/config', './src/theme'],
    from: ['./src/features', './src/app'],
    message: 'Shared layers import no feature and not the app.',
  },
];

export default tseslint.config(
  { ignores: ['dist/**', 'src/api/schema.d.ts', 'e2e/artifacts/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...pluginQuery.configs['flat/recommended'],
  {
    files: ['**/*.{ts,tsx,mjs}'],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    plugins: { 'import-x': importX, 'react-hooks': reactHooks },
    settings: { 'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.json'] })] },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/no-cycle': 'error',
      // Query keys come from the one registry (src/api/query-keys.ts), never literals that can drift.
      'no-restricted-syntax': [
        'error',
        {
          selector: "Property[key.name='queryKey'] > ArrayExpression",
          message: 'Name query keys from src/api/query-keys.ts, not an array literal.',
        },
        {
          selector: "Property[key.name='queryKey'] > TSAsExpression > ArrayExpression",
          message: 'Name query keys from src/api/query-keys.ts, not an array literal.',
        },
      ],
      'import-x/no-restricted-paths': ['error', { zones: boundaryZones }],
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/backend/**'], message: 'Import the shared vocabulary as @thermbay/engine/vocabulary.' },
          ],
        },
      ],
    },
  },
  {
    // The one HTTP client knows no UI.
    files: ['src/api/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['react', 'react-dom', '@mui/*', '@emotion/*', 'react-router*'],
              message: 'The HTTP client imports no UI.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['src/api/query-keys.ts', '**/*.test.{ts,tsx}'],
    rules: { 'no-restricted-syntax': 'off' },
  },
  prettier,
);
