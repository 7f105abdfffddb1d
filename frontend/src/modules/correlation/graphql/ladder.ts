import { graphql } from '@/gql';

/** Every site of a project with its events' densities, and the project's hypotheses to choose from. */
export const EventLadderDocument = graphql(`
  query EventLadder($projectId: ID!) {
    eventLadder(projectId: $projectId) {
      columns {
        site {
          id
          name
          kind
          alongStrikeKm
          segment {
            id
            name
          }
        }
        latestAgeModelRun {
          id
          stale
        }
        events {
          medianCalBp
          eventHorizon {
            id
            name
            quality
          }
          hpd95 {
            olderCalBp
            youngerCalBp
            probability
          }
          densityGrid {
            startCalBp
            stepYears
            values
          }
        }
      }
    }
    project(id: $projectId) {
      id
      name
      myRole
      myPermissions
      tectonicSetting
      segments {
        id
        name
        startKm
        endKm
      }
      hypotheses {
        id
        name
        preferred
        version
      }
    }
  }
`);

/** One hypothesis: its ties, the regional events they make, and order conflicts. */
export const HypothesisDocument = graphql(`
  query Hypothesis($id: ID!) {
    hypothesis(id: $id) {
      id
      name
      description
      preferred
      version
      author {
        id
        displayName
      }
      copiedFrom {
        id
        name
      }
      ties {
        id
        confidence
        evidence
        note
        eventA {
          id
          name
        }
        eventB {
          id
          name
        }
      }
      latestJointRun {
        id
        status
      }
      regionalEvents {
        id
        combinedMedianCalBp
        jointMedianCalBp
        jointHpd95 {
          olderCalBp
          youngerCalBp
          probability
        }
        ageShown
        concordance
        concordanceThreshold
        concordanceLow
        warnings
        ruptureLengthKm
        members {
          id
          name
        }
        combinedHpd95 {
          olderCalBp
          youngerCalBp
          probability
        }
        chiSquare {
          t
          df
          critical5
          passes
        }
        magnitude {
          mw
          sigma
          relation
        }
        magnitudeFromArea {
          mw
          sigma
          relation
        }
        magnitudeFromDisplacement {
          mw
          sigma
          relation
        }
        ageModelRuns {
          id
          seed
          stale
          site {
            id
            name
          }
        }
      }
      orderConflicts {
        message
        tieA {
          id
        }
        tieB {
          id
        }
        ties {
          id
          eventA {
            id
          }
          eventB {
            id
          }
        }
        steps {
          site {
            id
          }
          older {
            id
          }
          younger {
            id
          }
        }
        regionalEventIds
      }
    }
  }
`);

export const AddTieDocument = graphql(`
  mutation AddTie($input: AddTieInput!) {
    addTie(input: $input) {
      id
    }
  }
`);

export const RemoveTieDocument = graphql(`
  mutation RemoveTie($id: ID!) {
    removeTie(id: $id)
  }
`);

export const CreateHypothesisDocument = graphql(`
  mutation CreateHypothesis($input: CreateHypothesisInput!) {
    createHypothesis(input: $input) {
      id
      name
    }
  }
`);

export const SetPreferredHypothesisDocument = graphql(`
  mutation SetPreferredHypothesis($id: ID!) {
    setPreferredHypothesis(id: $id) {
      id
      preferred
    }
  }
`);

/** Each regional event's measured size at its member sites, for the along-strike size profile. */
export const HypothesisSizeProfilesDocument = graphql(`
  query HypothesisSizeProfiles($id: ID!) {
    hypothesis(id: $id) {
      id
      regionalEvents {
        id
        combinedMedianCalBp
        members {
          id
          name
        }
        sizeProfile {
          eventHorizon {
            id
            name
          }
          site {
            id
            name
          }
          alongStrikeKm
          subsidenceM
          subsidenceErrorM
          displacementM
          displacementErrorM
          bedThicknessM
        }
      }
    }
  }
`);
