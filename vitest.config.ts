import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: { alias: { '@': path.resolve(__dirname) } },
  test: {
    include: ['tests/**/*.test.ts'],
    // tests/instances/ needs two running instances (INSTANCE_A_URL, INSTANCE_B_URL): npm test and npm run
    // test:instances start them and run it as a step of its own.
    exclude: ['tests/e2e/**', 'node_modules/**', ...(process.env.INSTANCE_A_URL || process.env.INSTANCE_B_URL ? [] : ['tests/instances/**'])],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
