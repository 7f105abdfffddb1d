import { graphql } from '@/gql';

export const SiteDocument = graphql(`
  query Site($id: ID!) {
    site(id: $id) {
      id
      version
      name
      kind
      latitude
      longitude
      alongStrikeKm
      elevationM
      waterDepthM
      notes
      project {
        id
        name
        myRole
        myPermissions
      }
      segment {
        id
        name
      }
      units {
        id
        version
        position
        name
        topDepthM
        baseDepthM
        facies
        basalErosionM
        notes
      }
      eventHorizons {
        id
        version
        name
        quality
        evidence
        notes
        subsidenceM
        subsidenceErrorM
        displacementM
        displacementErrorM
        bedThicknessM
        unitBelow {
          id
        }
        unitAbove {
          id
        }
      }
      samples {
        id
        version
        labCode
        method
        material
        depthM
        ageRelation
        c14Age
        c14Error
        delta13C
        curve
        deltaR
        deltaRError
        deltaRSource
        inheritanceScaleYears
        inheritanceScaleDefaultYears
        calendarAgeBp
        calendarErrorYears
        measurementYear
        excluded
        exclusionReason
        notes
        unit {
          id
        }
        calibrationError
        calibration {
          curve
          medianCalBp
          meanCalBp
          sdYears
          hpd68 {
            ...HpdRangeFields
          }
          hpd95 {
            ...HpdRangeFields
          }
          warnings
        }
      }
    }
  }
`);

export const CreateUnitDocument = graphql(`
  mutation CreateUnit($input: CreateUnitInput!) {
    createUnit(input: $input) {
      id
    }
  }
`);

export const UpdateUnitDocument = graphql(`
  mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {
    updateUnit(id: $id, version: $version, input: $input) {
      id
      version
    }
  }
`);

export const DeleteUnitDocument = graphql(`
  mutation DeleteUnit($id: ID!) {
    deleteUnit(id: $id)
  }
`);

export const CreateEventHorizonDocument = graphql(`
  mutation CreateEventHorizon($input: CreateEventHorizonInput!) {
    createEventHorizon(input: $input) {
      id
    }
  }
`);

export const UpdateEventHorizonDocument = graphql(`
  mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {
    updateEventHorizon(id: $id, version: $version, input: $input) {
      id
      version
    }
  }
`);

export const DeleteEventHorizonDocument = graphql(`
  mutation DeleteEventHorizon($id: ID!) {
    deleteEventHorizon(id: $id)
  }
`);
