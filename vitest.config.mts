import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    projects: [
      { test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' } },
      { test: { name: 'server', include: ['tests/server/**/*.test.ts'], environment: 'node', testTimeout: 30000, hookTimeout: 60000 } },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          testTimeout: 180000,
          hookTimeout: 180000,
          fileParallelism: false,
        },
      },
    ],
  },
});
