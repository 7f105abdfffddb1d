import { graphql } from '@/gql';

export const ProjectReleasesDocument = graphql(`
  query ProjectReleases($id: ID!) {
    project(id: $id) {
      id
      myRole
      myPermissions
      releases {
        id
        number
        note
        createdAt
        createdBy {
          id
          displayName
          email
        }
      }
    }
  }
`);

export const ReleaseDocument = graphql(`
  query Release($id: ID!) {
    release(id: $id) {
      id
      number
      note
      createdAt
      createdBy {
        id
        displayName
      }
      segments {
        id
        name
        startKm
        endKm
      }
      sites {
        id
        name
        kind
        latitude
        longitude
        alongStrikeKm
        segment {
          id
          name
        }
        units {
          id
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

export const ReleaseDiffDocument = graphql(`
  query ReleaseDiff($fromId: ID!, $toId: ID!) {
    releaseDiff(fromId: $fromId, toId: $toId) {
      from {
        id
        number
      }
      to {
        id
        number
      }
      changes {
        objectType
        objectId
        label
        change
      }
    }
  }
`);

export const CreateReleaseDocument = graphql(`
  mutation CreateRelease($input: CreateReleaseInput!) {
    createRelease(input: $input) {
      id
      number
    }
  }
`);
