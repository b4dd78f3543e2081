import { defineConfig } from 'vitest/config';

/**
 * Browser journeys: the global setup starts the real product once (built client, demo data, local
 * fakes); each file drives its own headless Chromium against it. Files run one after another:
 * journeys share the demo yard, and two cores cannot host two browsers well anyway.
 */
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    fileParallelism: false,
    maxWorkers: 1,
    testTimeout: 120_000,
    hookTimeout: 180_000,
    // A journey is a story: later steps need the earlier ones, so it must not be retried half-way.
    retry: 0,
    globalSetup: ['tests/e2e/global-setup.ts'],
  },
});
