import type { CodegenConfig } from '@graphql-codegen/cli';

/**
 * Typed GraphQL documents from the API contract. Run `npm run codegen -w frontend` after editing
 * a document; the output in src/gql/ is committed so a build needs no code generation.
 */
const config: CodegenConfig = {
  schema: '../schema.graphql',
  documents: ['src/**/*.ts', 'src/**/*.tsx', '!src/gql/**/*'],
  ignoreNoDocuments: true,
  generates: {
    'src/gql/': {
      preset: 'client',
      presetConfig: { fragmentMasking: false },
      config: {
        // Plain strings on the wire: the fetch client needs no GraphQL runtime.
        documentMode: 'string',
        enumsAsTypes: true,
        useTypeImports: true,
        strictScalars: true,
        scalars: { DateTime: 'string', JSON: 'unknown', NumberList: 'number[]' },
      },
    },
  },
};

export default config;
