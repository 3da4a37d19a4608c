import { defineConfig } from 'vitest/config';

// Unit, calculator, CLI and catalog tests run in parallel; the site and browser tests share one
// build made by test/site/globalSetup.ts and run after it (see the 'site' project).
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['test/core/**/*.test.ts', 'test/components/**/*.test.ts', 'test/calculators/**/*.test.ts', 'test/cli/**/*.test.ts', 'test/content/**/*.test.ts', 'test/records/**/*.test.ts', 'test/sheets/**/*.test.ts', 'test/architecture/**/*.test.ts', 'test/studies/**/*.test.ts', 'test/build/**/*.test.ts'],
          testTimeout: 30_000,
        },
      },
      {
        test: {
          name: 'site',
          include: ['test/site/**/*.test.ts', 'test/browser/**/*.test.ts'],
          globalSetup: ['test/site/globalSetup.ts'],
          testTimeout: 120_000,
          hookTimeout: 600_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
