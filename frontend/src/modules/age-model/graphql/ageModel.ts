import { graphql } from '@/gql';

/** Everything of one run the age model view draws: status, diagnostics and posteriors. */
export const AgeModelRunDocument = graphql(`
  query AgeModelRun($id: ID!) {
    ageModelRun(id: $id) {
      id
      status
      progress
      message
      seed
      settings
      stale
      staleReasons {
        message
      }
      createdAt
      finishedAt
      diagnostics {
        converged
        maxRhat
        minEss
        message
      }
      events {
        medianCalBp
        meanCalBp
        rhat
        ess
        eventHorizon {
          id
          name
        }
        hpd68 {
          ...HpdRangeFields
        }
        hpd95 {
          ...HpdRangeFields
        }
        density {
          calBp
          probability
        }
      }
      depthModel
      ageDepth {
        depthM
        eventFreeDepthM
        medianCalBp
        low95CalBp
        high95CalBp
      }
      samples {
        outlierProbability
        medianCalBp
        sample {
          id
          labCode
        }
        hpd95 {
          ...HpdRangeFields
        }
        offset {
          scaleYears
          medianYears
          low95Years
          high95Years
        }
      }
      reservoirOffsets {
        source
        named
        priorMeanYears
        priorSdYears
        medianYears
        low95Years
        high95Years
        samples {
          id
          labCode
        }
      }
    }
  }
`);

/**
 * The site's column with every sample's calibrated likelihood, its latest run, its run history
 * (newest 50) and which run feeds the ladder, regional events and recurrence (chosen or newest).
 */
export const AgeModelSiteDocument = graphql(`
  query AgeModelSite($id: ID!) {
    site(id: $id) {
      id
      name
      kind
      project {
        id
        name
        myRole
        myPermissions
      }
      units {
        id
        position
        name
        topDepthM
        baseDepthM
        facies
        basalErosionM
      }
      eventHorizons {
        id
        name
        quality
        unitBelow {
          id
          position
        }
        unitAbove {
          id
          position
        }
      }
      samples {
        id
        labCode
        method
        material
        ageRelation
        excluded
        unit {
          id
          position
        }
        depthM
        calibrationError
        calibration {
          medianCalBp
          hpd95 {
            ...HpdRangeFields
          }
          densityGrid {
            startCalBp
            stepYears
            values
          }
        }
      }
      latestAgeModelRun {
        id
        status
        stale
      }
      downstreamRun {
        id
      }
      downstreamRunChoice {
        run {
          id
        }
        chosenAt
        chosenBy {
          displayName
        }
      }
      ageModelRuns {
        id
        status
        progress
        seed
        settings
        depthModel
        stale
        createdAt
        finishedAt
        diagnostics {
          converged
          maxRhat
          minEss
        }
      }
    }
  }
`);

export const StartAgeModelRunDocument = graphql(`
  mutation StartAgeModelRun($input: StartAgeModelRunInput!) {
    startAgeModelRun(input: $input) {
      id
      status
    }
  }
`);

export const CancelAgeModelRunDocument = graphql(`
  mutation CancelAgeModelRun($id: ID!) {
    cancelAgeModelRun(id: $id) {
      id
      status
    }
  }
`);

/** Choose the run the site uses downstream, or (runId null) follow its newest successful run again. */
export const ChooseDownstreamRunDocument = graphql(`
  mutation ChooseDownstreamRun($input: ChooseDownstreamRunInput!) {
    chooseDownstreamRun(input: $input) {
      id
      downstreamRun {
        id
      }
    }
  }
`);
