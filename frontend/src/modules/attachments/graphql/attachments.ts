import { graphql } from '@/gql';

export const SiteAttachmentsDocument = graphql(`
  query SiteAttachments($id: ID!) {
    site(id: $id) {
      id
      project {
        id
        myRole
        myPermissions
      }
      attachments {
        id
        fileName
        contentType
        sizeBytes
        createdAt
        url
        thumbnailUrl
      }
      samples {
        id
        labCode
        attachments {
          id
          fileName
          contentType
          sizeBytes
          createdAt
          url
          thumbnailUrl
        }
      }
    }
  }
`);

export const DeleteAttachmentDocument = graphql(`
  mutation DeleteAttachment($id: ID!) {
    deleteAttachment(id: $id)
  }
`);
