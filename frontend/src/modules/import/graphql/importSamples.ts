import { graphql } from '@/gql';

export const ImportSamplesDocument = graphql(`
  mutation ImportSamples($input: ImportSamplesInput!) {
    importSamples(input: $input) {
      rowCount
      committed
      errors {
        row
        scope
        field
        message
      }
      columns {
        header
        field
        source
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
