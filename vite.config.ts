/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

const apiTarget = `http://localhost:${process.env.PORT ?? '3000'}`;

export default defineConfig({
  root: 'src',
  publicDir: false,
  plugins: [react(), tailwindcss()],
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  build: { outDir: '../dist', emptyOutDir: true, sourcemap: true },
  worker: { format: 'es' },
  optimizeDeps: { include: ['seedrandom', 'comlink'] },
  server: { port: 5173, proxy: { '/api': apiTarget } },
  test: {
    root: '.',
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: [
            'shared/**/*.test.ts',
            'workers/**/*.test.ts',
            'server/**/*.test.ts',
            'src/**/*.test.{ts,tsx}',
            'tests/helpers/**/*.test.ts',
          ],
          exclude: ['**/*.property.test.ts', '**/*.component.test.tsx', '**/node_modules/**'],
          environment: 'node',
          // Engine checks against analytic solutions run whole small scenarios (seconds each on two cores).
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'component',
          include: ['src/**/*.component.test.tsx'],
          environment: 'jsdom',
          setupFiles: ['tests/helpers/component-setup.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'property',
          include: ['**/*.property.test.ts'],
          exclude: ['**/node_modules/**'],
          environment: 'node',
          testTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: { name: 'api', include: ['tests/integration/**/*.test.ts'], environment: 'node', testTimeout: 30_000, hookTimeout: 60_000 },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
