// ESLint flat config (run as `eslint -c scripts/eslint.config.js .` from the project root, so paths are
// relative to the root). typescript-eslint, import cycles, and the client's feature boundaries.
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'drizzle/**', 'tests/.artifacts/**', 'coverage/**'] },
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX },
    rules: {
      'import-x/no-cycle': ['error', { maxDepth: 4, ignoreExternal: true }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/no-explicit-any': 'error',
    },
    settings: { 'import-x/resolver': { node: { extensions: ['.ts', '.tsx', '.js'] } } },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      // A feature does not import another feature's internals; shared pieces live in components/ or lib/.
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/server/**', '../../server/*'], message: 'The client must not import server code; use shared/.' },
          ],
        },
      ],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { paths: ['express', 'drizzle-orm', 'react', 'pg'], patterns: ['drizzle-orm/*'] }],
    },
  },
);
