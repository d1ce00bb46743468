import path from 'node:path';
import { defineConfig } from 'vitest/config';

const root = import.meta.dirname;

export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${root}/` },
      // next's 'server-only' guard throws outside a React Server environment;
      // in tests the modules run on Node directly.
      { find: /^server-only$/, replacement: path.join(root, 'tests/support/empty.ts') },
    ],
  },
  test: {
    include: ['tests/**/*.test.ts', 'lib/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/support/global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: 'forks',
    maxWorkers: 2,
    fileParallelism: true,
  },
});
