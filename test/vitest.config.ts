import swc from 'unplugin-swc';
import { defineConfig } from 'vitest/config';

// Integration and reference checks against the real PostgreSQL that `npm test` starts
// (DATABASE_URL). Files run one after another: they share that database.
export default defineConfig({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  test: {
    root: __dirname,
    include: ['integration/**/*.spec.ts', 'reference/**/*.spec.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
