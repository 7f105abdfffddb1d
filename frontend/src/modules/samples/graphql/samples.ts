import { graphql } from '@/gql';

export const CreateSampleDocument = graphql(`
  mutation CreateSample($input: CreateSampleInput!) {
    createSample(input: $input) {
      id
    }
  }
`);

export const UpdateSampleDocument = graphql(`
  mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {
    updateSample(id: $id, version: $version, input: $input) {
      id
      version
    }
  }
`);

export const DeleteSampleDocument = graphql(`
  mutation DeleteSample($id: ID!) {
    deleteSample(id: $id)
  }
`);
