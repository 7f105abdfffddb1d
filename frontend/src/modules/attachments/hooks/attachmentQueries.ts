import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { DeleteAttachmentDocument, SiteAttachmentsDocument } from '@/modules/attachments/graphql/attachments';
import { attachmentUploadUrl, awaitsThumbnail, type AttachmentOwner } from '@/modules/attachments/utils/attachmentFiles';
import { authorizedFetch } from '@/modules/exchange/utils/authorizedHttp';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { siteQueries } from '@/modules/sites/hooks/siteQueries';

/** Query keys and options for a site's files and its samples' files, under the site's key. */
export const attachmentQueries = {
  all: (projectId: string, siteId: string) => [...siteQueries.detail(projectId, siteId), 'attachments'] as const,
  site: (projectId: string, siteId: string) =>
    queryOptions({
      queryKey: attachmentQueries.all(projectId, siteId),
      queryFn: async () => (await graphqlRequest(SiteAttachmentsDocument, { id: siteId })).site,
      // A worker makes image thumbnails after the upload: look again until they are there.
      refetchInterval: (query) => {
        const site = query.state.data;
        if (!site) return false;
        return awaitsThumbnail([...site.attachments, ...site.samples.flatMap((sample) => sample.attachments)]) ? 2000 : false;
      },
    }),
};

export type UploadVariables = { owner: AttachmentOwner; file: File };

/**
 * Upload one file as the raw request body. Sent as octet-stream whatever the file's name says:
 * the server judges the type by content, and a JSON or form body would be refused.
 */
export function useAttachmentMutations(projectId: string, siteId: string) {
  const queryClient = useQueryClient();
  const invalidates = [attachmentQueries.all(projectId, siteId), [...projectQueries.detail(projectId), 'audit']] as const;
  const upload = useMutation({
    mutationFn: async ({ owner, file }: UploadVariables) => {
      const response = await authorizedFetch(attachmentUploadUrl(owner, file.name), {
        method: 'POST',
        headers: { 'Content-Type': 'application/octet-stream' },
        body: file,
      });
      return (await response.json()) as { id: string; fileName: string };
    },
    onSuccess: () => Promise.all(invalidates.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
  const remove = useGraphqlMutation(DeleteAttachmentDocument, { invalidates });
  return { upload, remove };
}
