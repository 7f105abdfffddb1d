import { graphql } from '@/gql';

export const SiteCoreLogsDocument = graphql(`
  query SiteCoreLogs($id: ID!) {
    site(id: $id) {
      id
      name
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
        unitAbove {
          id
        }
      }
      samples {
        id
        labCode
        depthM
        excluded
        calibration {
          medianCalBp
          hpd95 {
            olderCalBp
            youngerCalBp
          }
        }
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
