import { graphql } from '@/gql';

/** A core's units, horizons and logs, for drawing its beds' log readings on the ladder. */
export const LadderCoreLogsDocument = graphql(`
  query LadderCoreLogs($id: ID!) {
    site(id: $id) {
      id
      units {
        id
        position
        name
        topDepthM
        baseDepthM
        facies
      }
      eventHorizons {
        id
        unitAbove {
          id
        }
      }
      coreLogs {
        id
        name
        channels
        units
        traces(maxPoints: 400) {
          channel
          unit
          depthsM
          values
        }
      }
    }
  }
`);
