import { graphql } from '@/gql';

/** Proposed ties between two cores' turbidites, from their logs (nothing is tied by asking). */
export const TieSuggestionsDocument = graphql(`
  query TieSuggestions($input: TieSuggestionsInput!) {
    tieSuggestions(input: $input) {
      eventA {
        id
        name
      }
      eventB {
        id
        name
      }
      score
      tied
      channels
    }
  }
`);
