// One lint config for the workspace. The web client's feature boundaries
// follow style-examples: features do not import each other or the app layer,
// and shared folders import no feature.
import { existsSync, readdirSync } from 'node:fs';

import js from '@eslint/js';
import importX from 'eslint-plugin-import-x';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// Every feature folder gets a zone, so a new feature is fenced in without editing this file.
const featuresDir = new URL('./apps/web/src/features', import.meta.url);
const features = existsSync(featuresDir) ? readdirSync(featuresDir) : [];
const webShared = ['components', 'hooks', 'lib', 'config', 'types', 'utils', 'testing'].map((d) => `./apps/web/src/${d}`);

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/.data/**', 'tests/artifacts/**', '.test-results/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-non-null-assertion': 'off',
      'import-x/no-duplicates': 'error',
    },
  },
  {
    files: ['apps/web/src/**/*.{ts,tsx}'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          basePath: import.meta.dirname,
          zones: [
            { target: './apps/web/src/features', from: './apps/web/src/app' },
            ...webShared.map((target) => ({ target, from: ['./apps/web/src/features', './apps/web/src/app'] })),
            ...features.map((f) => ({
              target: `./apps/web/src/features/${f}`,
              from: './apps/web/src/features',
              except: [`./${f}`],
            })),
          ],
        },
      ],
    },
  },
);
