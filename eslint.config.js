// ESLint: TypeScript and React hooks rules, and the one architectural rule of the codebase — a feature folder
// (server/features/<name>, src/features/<name>) never imports another feature; what two need goes to a base
// (server/http, db, core, chem, auth; src/components, src/lib; shared/).
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import importX from 'eslint-plugin-import-x';
import prettier from 'eslint-config-prettier';
import globals from 'globals';

const featureZones = (root) =>
  readdirSync(root, { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .map(({ name }) => ({
      target: `./${root}/${name}`,
      from: `./${root}`,
      except: [`./${name}`],
      message: `A feature never imports another feature: move what both need into a shared base.`,
    }));

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.cache/**', '.data/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    settings: { 'import-x/resolver': { node: { extensions: ['.ts', '.tsx', '.mjs', '.js'] } } },
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        { zones: [...featureZones('server/features'), ...featureZones('src/features')] },
      ],
      'import-x/no-cycle': ['error', { maxDepth: 2, ignoreExternal: true }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}', 'tests/client/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'error' },
  },
  prettier,
);
