import { defineConfig } from 'vitest/config';

// Two projects: `unit` (core, quantity, sheet, properties, ngspice cross-checks)
// runs in Node; `e2e` drives the built site (dist/) in the system Chromium.
// In CI a JSON report is written so .ci/run can fail on any skipped test.
const ci = process.env.CI === 'true' || process.env.CI === '1';

export default defineConfig({
  test: {
    reporters: ci ? ['default', ['json', { outputFile: 'test-results/vitest.json' }]] : ['default'],
    projects: [
      {
        test: {
          name: 'unit',
          include: ['test/{core,quantity,kit,sheet,properties,spice}/**/*.test.ts'],
          environment: 'node',
          benchmark: { include: ['test/bench/**/*.bench.ts'] },
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['test/e2e/**/*.test.ts'],
          benchmark: { include: [] },
          environment: 'node',
          testTimeout: 60_000,
          hookTimeout: 120_000,
          // One browser per file is heavy on 2 cores: run e2e files one at a time.
          fileParallelism: false,
        },
      },
    ],
  },
});
