import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
          // the unit files share two cores with the API and browser projects: a workbook round trip
          // that takes 1 s alone has passed 5 s under that load
          testTimeout: 20_000,
        },
      },
      {
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/db-global.ts'],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        // React screens in a simulated browser, the network answered by msw (tests/client/setup.ts)
        test: {
          name: 'client',
          include: ['tests/client/**/*.test.tsx'],
          environment: 'happy-dom',
          setupFiles: ['tests/client/setup.ts'],
          testTimeout: 20_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/e2e-global.ts'],
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
