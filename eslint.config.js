import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

// Core layers must not reach up into the app glue or the page; see DEVELOPERS.md.
const coreDirs = ['src/science/**', 'src/signal/**', 'src/sensor/protocols/**', 'src/run/**'];
const upperLayers = ['**/ui/**', '**/store/**', '**/alerts/**', '**/sync/**', '**/server/**', '**/cli/**'];

export default tseslint.config(
  { ignores: ['dist/**', 'dev-dist/**', 'node_modules/**', 'coverage/**', '.bench/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'eqeqeq': ['error', 'always', { null: 'ignore' }],
      'no-console': 'off',
    },
  },
  {
    files: coreDirs,
    rules: {
      'no-restricted-imports': ['error', { patterns: upperLayers.map((group) => ({ group: [group], message: 'core code imports only core code' })) }],
      'no-restricted-globals': ['error', 'window', 'document', 'navigator', 'localStorage', 'indexedDB', 'performance'],
      'no-restricted-properties': ['error', { object: 'Date', property: 'now', message: 'core code takes time as data' }],
    },
  },
);
