import swc from 'unplugin-swc';
import { createRequire } from 'node:module';
import { defineConfig } from 'vitest/config';

// One copy of graphql for the code under test and its libraries (Apollo, graphql-query-complexity),
// which load graphql's CommonJS build: resolving our own imports to its ESM build would make a
// second realm, whose schema objects the other refuses.
const graphqlCommonJs = createRequire(__filename).resolve('graphql');

// Integration and reference checks against the real PostgreSQL that `npm test` starts
// (DATABASE_URL). Files run one after another: they share that database.
export default defineConfig({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  resolve: { alias: [{ find: /^graphql$/, replacement: graphqlCommonJs }] },
  test: {
    root: __dirname,
    include: ['integration/**/*.spec.ts', 'reference/**/*.spec.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
