import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { SiteCalibrationsDocument } from '@/modules/calibration/graphql/calibration';
import { withCalibrationPoints } from '@/modules/calibration/utils/calibrationPoints';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { SiteDocument } from '@/modules/sites/graphql/site';

/** Query keys and options for one site; all under its project's key prefix. */
export const siteQueries = {
  detail: (projectId: string, siteId: string) => [...projectQueries.detail(projectId), 'sites', siteId] as const,
  /** The site with its column, samples and their calibration summaries. */
  column: (projectId: string, siteId: string) =>
    queryOptions({
      queryKey: [...siteQueries.detail(projectId, siteId), 'column'] as const,
      queryFn: async () => (await graphqlRequest(SiteDocument, { id: siteId })).site,
    }),
  /** Every sample's calibrated density, for the calibration tab (heavier, fetched on demand). */
  calibrations: (projectId: string, siteId: string) =>
    queryOptions({
      queryKey: [...siteQueries.detail(projectId, siteId), 'calibrations'] as const,
      queryFn: async () => {
        const { site } = await graphqlRequest(SiteCalibrationsDocument, { id: siteId });
        return { ...site, samples: site.samples.map(withCalibrationPoints) };
      },
    }),
};
