import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importPlugin from 'eslint-plugin-import';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const noMathRandom = {
  'no-restricted-properties': ['error', { object: 'Math', property: 'random', message: 'Randomness is a parameter: pass a seeded generator.' }],
};

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.tsbuild/**', 'data/**', 'tests/e2e/screenshots/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { import: importPlugin },
    settings: { 'import/resolver': { node: { extensions: ['.ts', '.tsx', '.js'] } } },
    languageOptions: { globals: { ...globals.es2022 } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./src', './server', './workers', './tests'], message: 'shared/ is pure and imports nothing above it.' },
            { target: './workers', from: ['./src', './server'], message: 'workers/ may import shared/ only.' },
            { target: './server', from: ['./src', './workers/simulation.worker.ts', './workers/simulation-bridge.ts'], message: 'server/ may import shared/ only.' },
            { target: './src', from: ['./server'], message: 'The client talks to the server over HTTP only.' },
          ],
        },
      ],
    },
  },
  { files: ['shared/**/*.ts', 'workers/**/*.ts'], rules: noMathRandom },
  { files: ['src/**/*.{ts,tsx}'], plugins: { 'react-hooks': reactHooks }, languageOptions: { globals: globals.browser }, rules: reactHooks.configs.recommended.rules },
  { files: ['server/**/*.ts', 'tests/**/*.ts', 'workers/node/**/*.ts', '*.config.*', 'migrations/**/*.ts'], languageOptions: { globals: globals.node } },
);
