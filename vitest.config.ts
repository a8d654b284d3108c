import { defineConfig } from 'vitest/config';

// One project per workspace; scripts/test.mjs runs them in phases (unit → api → e2e).
export default defineConfig({
  test: {
    projects: [
      { test: { name: 'calc', root: 'packages/calc', include: ['src/**/*.test.ts'] } },
      { test: { name: 'shared', root: 'packages/shared', include: ['src/**/*.test.ts'] } },
      {
        test: {
          name: 'fakes',
          root: 'apps',
          include: ['fake-*/src/**/*.test.ts'],
          fileParallelism: false,
        },
      },
      {
        test: {
          name: 'api',
          root: 'apps/api',
          include: ['src/**/*.test.ts'],
          fileParallelism: false,
          globalSetup: ['src/testing/global-setup.ts'],
          testTimeout: 20000,
          hookTimeout: 30000,
        },
      },
      {
        extends: './vite.config.ts',
        test: {
          name: 'web',
          root: 'apps/web',
          include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
          environment: 'jsdom',
          setupFiles: ['src/testing/setup.ts'],
        },
      },
      {
        test: {
          name: 'lint',
          root: 'tests',
          include: ['lint/**/*.test.ts'],
          testTimeout: 120000,
        },
      },
      {
        test: {
          name: 'drills',
          root: 'tests',
          include: ['drills/**/*.test.ts'],
          fileParallelism: false,
          testTimeout: 90000,
          hookTimeout: 120000,
        },
      },
      {
        test: {
          name: 'e2e',
          root: 'tests',
          include: ['e2e/**/*.test.ts'],
          globalSetup: ['e2e/global-setup.ts'],
          setupFiles: ['e2e/setup.ts'],
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 120000,
        },
      },
    ],
  },
});
