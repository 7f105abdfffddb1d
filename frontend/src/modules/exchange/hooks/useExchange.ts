import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '@/modules/api/utils/apiError';
import { authorizedFetch, downloadExport } from '@/modules/exchange/utils/authorizedHttp';
import { exchangeRoutes } from '@/modules/exchange/utils/exchangeRoutes';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

export type ExportRequest = { url: string; fallbackFileName: string };

/** Download one export (bundle, a CSV table, the GeoJSON of sites) with the bearer token. */
export function useDownloadExport() {
  return useMutation({ mutationFn: ({ url, fallbackFileName }: ExportRequest) => downloadExport(url, fallbackFileName) });
}

/**
 * Import a bundle file as a new project. The file is parsed here first so a file that is not
 * JSON at all gets a plain answer; the server checks everything else and writes all or nothing.
 */
export function useImportBundle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (file: File): Promise<{ id: string; name: string }> => {
      const text = await file.text();
      try {
        JSON.parse(text);
      } catch {
        throw new ApiError([{ code: 'BAD_USER_INPUT', field: 'file', message: `${file.name} is not a JSON document` }]);
      }
      const response = await authorizedFetch(exchangeRoutes.importBundle(), {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: text,
      });
      return (await response.json()) as { id: string; name: string };
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectQueries.all() }),
  });
}
