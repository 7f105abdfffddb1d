import { graphql } from '@/gql';

export const ProjectsDocument = graphql(`
  query Projects {
    projects {
      id
      name
      description
      tectonicSetting
      myRole
      myPermissions
    }
  }
`);

export const ProjectOverviewDocument = graphql(`
  query ProjectOverview($id: ID!) {
    project(id: $id) {
      id
      name
      description
      tectonicSetting
      myRole
      myPermissions
      segments {
        id
        version
        name
        startKm
        endKm
        notes
        downDipWidthKm
      }
      sites {
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
        segment {
          id
          name
        }
        eventHorizons {
          id
        }
        samples {
          id
        }
      }
    }
  }
`);

export const CreateSegmentDocument = graphql(`
  mutation CreateSegment($input: CreateSegmentInput!) {
    createSegment(input: $input) {
      id
    }
  }
`);

export const UpdateSegmentDocument = graphql(`
  mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {
    updateSegment(id: $id, version: $version, input: $input) {
      id
      version
    }
  }
`);

export const DeleteSegmentDocument = graphql(`
  mutation DeleteSegment($id: ID!) {
    deleteSegment(id: $id)
  }
`);

export const CreateSiteDocument = graphql(`
  mutation CreateSite($input: CreateSiteInput!) {
    createSite(input: $input) {
      id
    }
  }
`);

export const UpdateSiteDocument = graphql(`
  mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {
    updateSite(id: $id, version: $version, input: $input) {
      id
      version
    }
  }
`);

export const DeleteSiteDocument = graphql(`
  mutation DeleteSite($id: ID!) {
    deleteSite(id: $id)
  }
`);
