/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// One file for the web build and for every test project, so there is one
// place that says which tests run where.
export default defineConfig({
  root: 'web',
  base: '/',
  plugins: [react(), tailwindcss()],
  build: {
    outDir: '../dist/web',
    emptyOutDir: true,
  },
  server: {
    proxy: { '/api': 'http://127.0.0.1:8080' },
  },
  test: {
    root: '.',
    // Charts drawn by the tests cache their font subsets here rather than in the user's own cache folder.
    env: { FOURFOLD_CACHE_DIR: join(tmpdir(), 'fourfold-test-cache') },
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          root: '.',
          environment: 'node',
          include: ['tests/**/*.test.ts'],
          exclude: ['tests/server/**', 'tests/e2e/**', 'tests/web/**', 'node_modules/**'],
        },
      },
      {
        extends: true,
        test: {
          name: 'web',
          root: '.',
          environment: 'jsdom',
          include: ['tests/web/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/web/setup.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'db',
          root: '.',
          environment: 'node',
          include: ['tests/server/**/*.test.ts', 'tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/setup/mariadb.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
