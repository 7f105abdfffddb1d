import { graphql } from '@/gql';

export const ImportSamplesDocument = graphql(`
  mutation ImportSamples($input: ImportSamplesInput!) {
    importSamples(input: $input) {
      rowCount
      committed
      errors {
        row
        field
        message
      }
      preview {
        row
        labCode
        unitName
        medianCalBp
        hpd95 {
          ...HpdRangeFields
        }
        warnings
      }
    }
  }
`);
