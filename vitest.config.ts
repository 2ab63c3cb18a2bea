import { defineConfig } from 'vitest/config';

// Unit and property tests (node, no browser). End-to-end tests live in e2e/ and run separately.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
  },
});
