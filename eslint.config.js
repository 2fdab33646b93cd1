import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importPlugin from 'eslint-plugin-import';
import jsxA11y from 'eslint-plugin-jsx-a11y';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const mathRandom = { object: 'Math', property: 'random', message: 'Randomness is a parameter: pass a seeded generator.' };
const noMathRandom = { 'no-restricted-properties': ['error', mathRandom] };

// What a run computes must be the same bits in every JavaScript engine (the server replays it):
// the language leaves these Math functions and ** approximate, so the engine and the physics it
// calls use shared/det-math. Math.sqrt, abs, floor, trunc, min and max are exact everywhere.
const approximateMath = [
  'exp',
  'log',
  'log10',
  'log2',
  'log1p',
  'expm1',
  'pow',
  'sin',
  'cos',
  'tan',
  'atan',
  'atan2',
  'asin',
  'acos',
  'sinh',
  'cosh',
  'tanh',
  'hypot',
  'cbrt',
];
const deterministicMath = {
  'no-restricted-properties': [
    'error',
    mathRandom,
    ...approximateMath.map((property) => ({
      object: 'Math',
      property,
      message: `Math.${property} differs between engines: use shared/det-math.`,
    })),
  ],
  'no-restricted-syntax': [
    'error',
    { selector: "BinaryExpression[operator='**']", message: '** differs between engines: multiply, or use pow from shared/det-math.' },
    { selector: "AssignmentExpression[operator='**=']", message: '**= differs between engines: use pow from shared/det-math.' },
  ],
};

// Route modules compose features; a feature that imported another would hide a dependency the routes should own.
const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);
const featureZones = features.map((name) => ({
  target: `./src/features/${name}`,
  from: './src/features',
  except: [`./${name}`],
  message: 'A feature never imports another feature: compose them in a route module (src/app/routes).',
}));

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.tsbuild/**', 'data/**', 'tests/e2e/screenshots/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { import: importPlugin },
    settings: {
      'import/resolver': {
        typescript: {
          noWarnOnMultipleProjects: true,
          project: [
            './src/tsconfig.json',
            './shared/tsconfig.json',
            './workers/tsconfig.json',
            './server/tsconfig.json',
            './tests/tsconfig.json',
          ],
        },
        node: true,
      },
      'import/internal-regex': '^@/',
    },
    languageOptions: { globals: { ...globals.es2022 } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import/no-cycle': ['error', { ignoreExternal: true }],
      'import/no-extraneous-dependencies': [
        'error',
        {
          devDependencies: [
            '**/*.test.ts',
            '**/*.test.tsx',
            '**/*.test-helper.ts',
            'tests/**',
            'vite.config.ts',
            'eslint.config.js',
            'workers/node/bench.ts',
            'workers/node/memory-figure.ts',
          ],
        },
      ],
      'import/extensions': ['error', 'never', { json: 'always', css: 'always' }],
      'import/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './shared',
              from: ['./src', './server', './workers', './tests'],
              message: 'shared/ is pure and imports nothing above it.',
            },
            { target: './workers', from: ['./src', './server'], message: 'workers/ may import shared/ only.' },
            {
              target: './server',
              from: ['./src', './workers/simulation.worker.ts'],
              message: 'server/ may import shared/ (and the pure engine) only.',
            },
            { target: './src', from: ['./server'], message: 'The client talks to the server over HTTP only.' },
            {
              target: ['./src/components', './src/lib', './src/hooks', './src/config'],
              from: ['./src/features', './src/app'],
              message: 'Shared client code never imports a feature or a route.',
            },
            { target: './src/features', from: './src/app', message: 'Features are composed by routes, never the other way round.' },
            ...featureZones,
          ],
        },
      ],
    },
  },
  { files: ['shared/**/*.ts', 'workers/**/*.ts'], rules: noMathRandom },
  {
    files: ['shared/physics/**/*.ts', 'shared/verdict/**/*.ts', 'shared/det-math/**/*.ts', 'workers/engine/**/*.ts'],
    ignores: ['**/*.test.ts', '**/*.test-helper.ts'],
    rules: deterministicMath,
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: globals.browser },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    files: ['src/**/*.tsx'],
    ...jsxA11y.flatConfigs.recommended,
    // A scrolling region must take focus so keyboard users can scroll it (WCAG 2.1.1).
    rules: {
      ...jsxA11y.flatConfigs.recommended.rules,
      'jsx-a11y/no-noninteractive-tabindex': ['error', { roles: ['tabpanel', 'region'] }],
    },
  },
  {
    files: ['server/**/*.ts', 'tests/**/*.ts', 'workers/node/**/*.ts', '*.config.*', 'migrations/**/*.ts'],
    languageOptions: { globals: globals.node },
  },
);
