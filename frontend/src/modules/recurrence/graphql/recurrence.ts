import { graphql } from '@/gql';

/** What a recurrence analysis can be run on, and the analyses already run in the project. */
export const RecurrenceSetupDocument = graphql(`
  query RecurrenceSetup($projectId: ID!) {
    project(id: $projectId) {
      id
      name
      myRole
      myPermissions
      segments {
        id
        name
      }
      sites {
        id
        name
        kind
      }
      hypotheses {
        id
        name
        preferred
      }
      preferredHypothesis {
        id
      }
      recurrenceAnalyses {
        id
        status
        createdAt
        forecastStartYear
        draws
        segment {
          id
          name
        }
        site {
          id
          name
        }
        hypothesis {
          id
          name
        }
      }
    }
  }
`);

/** One analysis with every figure the recurrence view shows. */
export const RecurrenceAnalysisDocument = graphql(`
  query RecurrenceAnalysis($id: ID!) {
    recurrenceAnalysis(id: $id) {
      id
      status
      progress
      message
      seed
      forecastStartYear
      windowsYears
      draws
      createdAt
      finishedAt
      hypothesisVersion
      stale
      staleReasons {
        message
        via
      }
      inputs {
        ageModelRuns {
          id
          site {
            id
            name
          }
        }
        hypothesisVersion
      }
      segment {
        id
        name
      }
      site {
        id
        name
      }
      hypothesis {
        id
        name
      }
      eventCount
      lastEventMedianCalBp
      openInterval {
        median
        low95
        high95
      }
      intervals {
        index
        medianYears
        low95
        high95
        youngerEvent
        olderEvent
      }
      meanRecurrence {
        median
        low95
        high95
      }
      medianRecurrence {
        median
        low95
        high95
      }
      sdRecurrence {
        median
        low95
        high95
      }
      aperiodicity {
        median
        low95
        high95
      }
      poisson {
        windowYears
        median
        low95
        high95
      }
      models {
        model
        aic
        deltaAic
        aicc
        deltaAicc
        akaikeWeight
        meanRecurrenceYears
        aperiodicity
        logLikelihood
        meanRecurrenceRange {
          median
          low95
          high95
          datingOnlyLow95
          datingOnlyHigh95
        }
        aperiodicityRange {
          median
          low95
          high95
          datingOnlyLow95
          datingOnlyHigh95
        }
        probabilities {
          windowYears
          median
          low95
          high95
          datingOnlyLow95
          datingOnlyHigh95
        }
      }
      modelAveraged {
        windowYears
        median
        low95
        high95
        datingOnlyLow95
        datingOnlyHigh95
      }
      parameterNote
      modelComparisonNote
      curves {
        model
        density {
          years
          value
        }
        hazard {
          years
          value
        }
        survival {
          years
          value
        }
      }
      histogram {
        fromYears
        toYears
        count
      }
      caution
    }
  }
`);

export const StartRecurrenceAnalysisDocument = graphql(`
  mutation StartRecurrenceAnalysis($input: StartRecurrenceAnalysisInput!) {
    startRecurrenceAnalysis(input: $input) {
      id
      status
    }
  }
`);

export const CancelRecurrenceAnalysisDocument = graphql(`
  mutation CancelRecurrenceAnalysis($id: ID!) {
    cancelRecurrenceAnalysis(id: $id) {
      id
      status
    }
  }
`);

export const RefreshStaleResultsDocument = graphql(`
  mutation RefreshStaleResults($projectId: ID!) {
    refreshStaleResults(projectId: $projectId) {
      id
    }
  }
`);

export const LatestRefreshDocument = graphql(`
  query LatestRefresh($projectId: ID!) {
    project(id: $projectId) {
      id
      refreshSettings {
        automatic
        debounceSeconds
      }
      downstreamRunChoices {
        site {
          id
          name
        }
        run {
          id
          createdAt
        }
        newestRun {
          id
          createdAt
        }
        newerRunExists
      }
      refreshPlans {
        id
        status
        automatic
        createdAt
        steps {
          id
          stage
          kind
          label
          status
          message
          freshId
          waitingFor
        }
        ageModelRuns {
          id
          site {
            id
          }
        }
        skipped {
          id
          kind
          label
          reason
        }
        progress {
          total
          waiting
          running
          succeeded
          failed
          blocked
          skipped
          fraction
        }
      }
    }
  }
`);

export const SetRefreshSettingsDocument = graphql(`
  mutation SetRefreshSettings($input: SetRefreshSettingsInput!) {
    setRefreshSettings(input: $input) {
      automatic
      debounceSeconds
    }
  }
`);