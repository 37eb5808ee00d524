import { defineConfig } from 'vitest/config';

// Three projects, all run by `npm test`:
//  unit   — pure and in-memory suites, Node environment, fast;
//  server — integration against a real PostgreSQL cluster that tests/server/global-setup.ts starts on loopback;
//  e2e    — the exported web app in Debian's Chromium through playwright-core (tests/e2e/global-setup.ts).
const legacyDecorators = { decorator: { legacy: true, emitDecoratorMetadata: true } };

export default defineConfig({
  oxc: legacyDecorators,
  test: {
    // Three workers on two cores: most server and e2e time is spent waiting on PostgreSQL and Chromium,
    // so a third file in flight shortens the run without starving the CPU-bound fuzz files.
    maxWorkers: 3,
    projects: [
      {
        oxc: legacyDecorators,
        // The app's `@/…` imports (tsconfig paths), so hooks and components can be unit-tested as written.
        resolve: { alias: [{ find: /^@\//, replacement: `${new URL('./', import.meta.url).pathname}` }] },
        test: {
          name: 'unit',
          environment: 'node',
          include: [
            'shared/**/*.test.ts',
            'sync/**/*.test.ts',
            'components/**/*.test.{ts,tsx}',
            'hooks/**/*.test.{ts,tsx}',
            'constants/**/*.test.ts',
            'server/cli/**/*.test.ts',
            'tests/reference/**/*.test.ts',
            'tests/sync/**/*.test.ts',
          ],
        },
      },
      {
        oxc: legacyDecorators,
        test: {
          name: 'server',
          environment: 'node',
          include: ['tests/server/**/*.test.ts', 'server/src/**/*.test.ts'],
          globalSetup: ['tests/server/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        oxc: legacyDecorators,
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/e2e/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 180_000,
          hookTimeout: 300_000,
        },
      },
    ],
  },
});
