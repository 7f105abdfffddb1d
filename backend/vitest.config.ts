import swc from 'unplugin-swc';
import { createRequire } from 'node:module';
import { defineConfig } from 'vitest/config';

// One copy of graphql for the code under test and its libraries (Apollo, graphql-query-complexity),
// which load graphql's CommonJS build: resolving our own imports to its ESM build would make a
// second realm, whose schema objects the other refuses.
const graphqlCommonJs = createRequire(__filename).resolve('graphql');

// SWC keeps decorator metadata, which NestJS dependency injection needs; esbuild drops it.
export default defineConfig({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  resolve: { alias: [{ find: /^graphql$/, replacement: graphqlCommonJs }] },
  test: {
    include: ['src/**/*.spec.ts'],
    globals: false,
    environment: 'node',
    testTimeout: 60_000,
  },
});
