import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser journeys against a running Keenroute: one file at a time, one test at a time, generous timeouts.
export default defineConfig({
  root: fileURLToPath(new URL('.', import.meta.url)),
  test: {
    environment: 'node',
    include: ['**/*.e2e.test.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    maxWorkers: 1,
    sequence: { concurrent: false },
    // Vitest sets process.env.BASE_URL to Vite's base path inside tests, so the address is handed over by another name.
    env: { KEENROUTE_E2E_BASE_URL: process.env.BASE_URL ?? 'http://127.0.0.1:3000' },
  },
});
