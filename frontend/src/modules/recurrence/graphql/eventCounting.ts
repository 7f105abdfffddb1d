import { graphql } from '@/gql';

/** A segment's event table as the recurrence screens show it (preview, stored with an analysis). */
export const SegmentEventTableFieldsFragment = graphql(`
  fragment SegmentEventTableFields on SegmentEventTable {
    segmentId
    segmentName
    segmentStartKm
    segmentEndKm
    hypothesisId
    hypothesisName
    hypothesisVersion
    rule {
      minimumSpanShare
      includeUntied
      qualityWeights
      confidenceWeights
    }
    rows {
      regionalEventId
      label
      members {
        eventHorizonId
        eventName
        siteId
        siteName
        alongStrikeKm
        segmentName
        quality
      }
      segmentNames
      spanShare
      throughGoing
      untied
      tieConfidences
      qualities
      medianCalBp
      counted
      inclusionProbability
      reason
    }
    countedEvents
    expectedEvents
    weighted
    note
  }
`);

/** The table a segment analysis would use under a hypothesis and a counting rule. */
export const SegmentEventTableDocument = graphql(`
  query SegmentEventTable($input: SegmentEventTableInput!) {
    segmentEventTable(input: $input) {
      ...SegmentEventTableFields
    }
  }
`);

/** The table a finished analysis stored, with the draws' record sizes and interval shares. */
export const AnalysisEventTableDocument = graphql(`
  query AnalysisEventTable($id: ID!) {
    recurrenceAnalysis(id: $id) {
      id
      recordEvents {
        median
        low95
        high95
      }
      intervals {
        index
        shareOfDraws
      }
      eventTable {
        ...SegmentEventTableFields
      }
    }
  }
`);

/** Two finished analyses side by side. */
export const RecurrenceComparisonDocument = graphql(`
  query RecurrenceComparison($analysisAId: ID!, $analysisBId: ID!) {
    recurrenceComparison(analysisAId: $analysisAId, analysisBId: $analysisBId) {
      analysisA {
        id
        hypothesis {
          id
          name
        }
        hypothesisVersion
      }
      analysisB {
        id
        hypothesis {
          id
          name
        }
        hypothesisVersion
      }
      settingDifferences
      events {
        regionalEventId
        label
        difference
        a {
          counted
          inclusionProbability
          spanShare
          throughGoing
          untied
          medianCalBp
          reason
        }
        b {
          counted
          inclusionProbability
          spanShare
          throughGoing
          untied
          medianCalBp
          reason
        }
      }
      statistics {
        quantity
        unit
        a {
          median
          low95
          high95
        }
        b {
          median
          low95
          high95
        }
        medianDifference
        rangesOverlap
      }
      probabilities {
        model
        windowYears
        a {
          median
          low95
          high95
        }
        b {
          median
          low95
          high95
        }
        medianDifference
        rangesOverlap
      }
      note
      caution
    }
  }
`);
