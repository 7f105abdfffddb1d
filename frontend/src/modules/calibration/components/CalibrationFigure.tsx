import { Callout, Classes, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQueries, useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import type { CurveCode } from '@/gql/graphql';
import { calibrationQueries } from '@/modules/calibration/hooks/calibrationQueries';
import { calendarWindow } from '@/modules/calibration/utils/calibrationChart';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { CalibrationChart, type CalibrationSeries, type CurveBand } from './CalibrationChart';

export type CalibrationFigureProps = {
  series: readonly CalibrationSeries[];
  /** The curves the series were calibrated on; each is drawn as a band. */
  curves: readonly CurveCode[];
  /** A sentence added to the caption (e.g. how marine ages are drawn). */
  note?: string;
};

/** Fetches the curve bands for the calendar range the densities need, then draws the chart. */
export function CalibrationFigure({ series, curves, note }: CalibrationFigureProps) {
  const window = useMemo(() => calendarWindow(series.map((item) => item.density)), [series]);
  const curveInfo = useQuery(calibrationQueries.curves());
  const uniqueCurves = useMemo(() => [...new Set(curves)], [curves]);
  const bandQueries = useQueries({
    queries: uniqueCurves.map((curve) => ({
      ...calibrationQueries.band(curve, window?.youngerCalBp ?? 0, window?.olderCalBp ?? 0),
      enabled: window !== null,
    })),
  });

  if (!window) return null;
  const failed = bandQueries.find((query) => query.error);
  if (failed) {
    return (
      <Callout intent={Intent.DANGER} icon={IconNames.ERROR} compact>
        The curve could not be loaded: {formErrorOf(failed.error, [])}
      </Callout>
    );
  }
  if (bandQueries.some((query) => query.isPending)) return <LoadingState label="Loading the curve" />;

  const bands: CurveBand[] = uniqueCurves.map((curve, index) => ({
    curve,
    name: curveInfo.data?.find((info) => info.code === curve)?.name ?? curve,
    points: bandQueries[index]?.data ?? [],
  }));
  return (
    <>
      <CalibrationChart series={series} bands={bands} window={window} />
      <p className={`${Classes.TEXT_MUTED} sc-chart-caption`}>
        Each row is a sample's calendar age: the whole density outlined, the part inside its 95.4 % ranges shaded, the part
        inside its 68.3 % ranges shaded darker, the median marked beneath. The panel below is the curve on the same calendar
        axis, with each measured age as a dashed level band; point anywhere to read both at one age.
        {note && ` ${note}`}
      </p>
    </>
  );
}
