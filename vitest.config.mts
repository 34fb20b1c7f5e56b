import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    setupFiles: ['tests/setup/fastCheckSeed.ts'],
    reporters: ['default'],
    testTimeout: 60_000,
  },
});
