import { graphql } from '@/gql';

export const SiteCoreLogsDocument = graphql(`
  query SiteCoreLogs($id: ID!) {
    site(id: $id) {
      id
      units {
        id
        topDepthM
        baseDepthM
        facies
      }
      coreLogs {
        id
        name
        channels
        units
        topDepthM
        baseDepthM
        rowCount
        traces(maxPoints: 300) {
          channel
          unit
          depthsM
          values
        }
      }
    }
  }
`);

export const UploadCoreLogDocument = graphql(`
  mutation UploadCoreLog($input: UploadCoreLogInput!) {
    uploadCoreLog(input: $input) {
      id
      channels
    }
  }
`);

export const DeleteCoreLogDocument = graphql(`
  mutation DeleteCoreLog($id: ID!) {
    deleteCoreLog(id: $id)
  }
`);
