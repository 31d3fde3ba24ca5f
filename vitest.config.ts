import { defineConfig } from 'vitest/config';
import path from 'node:path';

// Unit tests sit beside the code; integration tests (real MariaDB, started by scripts/test.mjs)
// live in tests/integration. End-to-end tests run separately through scripts/test.mjs.
export default defineConfig({
  resolve: {
    alias: {
      '@': path.resolve(import.meta.dirname),
      'server-only': path.resolve(import.meta.dirname, 'tests/support/server-only.ts'),
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          setupFiles: ['tests/support/unit-env.ts'],
          // Property-based tests run thousands of cases; a busy two-core machine needs the headroom.
          testTimeout: 60_000,
          include: ['lib/**/*.test.ts', 'services/**/*.test.ts', 'components/**/*.test.ts', 'db/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          // next-auth imports "next/server" without an extension; letting Vite resolve it works like Next does.
          server: { deps: { inline: ['next-auth', '@auth/core'] } },
          environment: 'node',
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          // Sixty seconds at a fixed request rate against the built app: `npm run test:load`, not part of `npm test`.
          name: 'load',
          include: ['tests/load/**/*.test.ts'],
          server: { deps: { inline: ['next-auth', '@auth/core'] } },
          environment: 'node',
          fileParallelism: false,
          testTimeout: 300_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
