import { graphql } from '@/gql';

/** The fields of a highest-density range, as every page that lists ranges shows them. */
export const HpdRangeFieldsFragment = graphql(`
  fragment HpdRangeFields on HpdRange {
    olderCalBp
    youngerCalBp
    probability
  }
`);
