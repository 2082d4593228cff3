import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    environment: 'node',
    testTimeout: 60_000,
    pool: 'forks',
    // The command line's set-up: the full design reader is there from the start (src/share/schema/reader.ts).
    setupFiles: ['test/setup.ts'],
  },
});
