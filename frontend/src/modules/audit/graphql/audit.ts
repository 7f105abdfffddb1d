import { graphql } from '@/gql';

export const AuditTrailDocument = graphql(`
  query AuditTrail($input: AuditTrailInput!) {
    auditTrail(input: $input) {
      edges {
        cursor
        node {
          id
          at
          actor {
            id
            email
            displayName
          }
          action
          objectType
          objectId
          objectName
          referencedNames {
            id
            name
          }
          before
          after
        }
      }
      pageInfo {
        endCursor
        hasNextPage
      }
    }
  }
`);
