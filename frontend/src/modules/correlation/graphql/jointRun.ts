import { graphql } from '@/gql';

/** A joint age model run: its chains' progress, diagnostics, staleness and regional events' joint ages. */
export const JointRunDocument = graphql(`
  query JointRun($id: ID!) {
    jointAgeModelRun(id: $id) {
      id
      status
      progress
      message
      seed
      hypothesisVersion
      createdAt
      finishedAt
      stale
      staleReasons {
        message
      }
      chains {
        index
        status
        progress
        message
      }
      depthModels {
        siteId
        siteName
        depthModel
      }
      diagnostics {
        converged
        maxRhat
        minEss
        message
      }
      regionalEvents {
        id
        medianCalBp
        rhat
        ess
        members {
          id
          name
        }
        hpd95 {
          olderCalBp
          youngerCalBp
          probability
        }
      }
    }
  }
`);

export const StartJointAgeModelRunDocument = graphql(`
  mutation StartJointAgeModelRun($input: StartJointAgeModelRunInput!) {
    startJointAgeModelRun(input: $input) {
      id
      status
    }
  }
`);

export const CancelJointAgeModelRunDocument = graphql(`
  mutation CancelJointAgeModelRun($id: ID!) {
    cancelJointAgeModelRun(id: $id) {
      id
      status
    }
  }
`);
