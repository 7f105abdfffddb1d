import { queryOptions } from '@tanstack/react-query';
import type { CalibrateInput, CurveCode } from '@/gql/graphql';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { CalibrateDocument, CalibrationCurveBandDocument, CalibrationCurvesDocument } from '@/modules/calibration/graphql/calibration';
import { withDensityPoints } from '@/modules/calibration/utils/calibrationPoints';

/**
 * Query keys and options for calibration. Results depend only on their inputs and the curves,
 * which change only when an administrator installs one (that invalidates `all()`).
 */
export const calibrationQueries = {
  all: () => ['calibration'] as const,
  curves: () =>
    queryOptions({
      queryKey: [...calibrationQueries.all(), 'curves'] as const,
      queryFn: async () => (await graphqlRequest(CalibrationCurvesDocument, {})).calibrationCurves,
      staleTime: Infinity,
    }),
  calibrate: (input: CalibrateInput) =>
    queryOptions({
      queryKey: [...calibrationQueries.all(), 'calibrate', input] as const,
      // The compact grid (at most 2,000 values) expanded to points for drawing: the widest
      // errors' 1-year points would be a 2.9 MB answer.
      queryFn: async () => withDensityPoints((await graphqlRequest(CalibrateDocument, { input })).calibrate),
      staleTime: Infinity,
    }),
  band: (curve: CurveCode, youngerCalBp: number, olderCalBp: number) =>
    queryOptions({
      queryKey: [...calibrationQueries.all(), 'band', curve, youngerCalBp, olderCalBp] as const,
      queryFn: async () => (await graphqlRequest(CalibrationCurveBandDocument, { curve, youngerCalBp, olderCalBp })).calibrationCurveBand,
      staleTime: Infinity,
    }),
};
