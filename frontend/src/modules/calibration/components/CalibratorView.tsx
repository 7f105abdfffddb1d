import { Callout, Card, Classes, Elevation, H2, Intent, NonIdealState } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { CalibrateInput } from '@/gql/graphql';
import { fieldErrorsOf, formErrorOf, isApiError } from '@/modules/api/utils/apiError';
import { calibrationQueries } from '@/modules/calibration/hooks/calibrationQueries';
import { ageOnCurveAxis } from '@/modules/calibration/utils/calibrationChart';
import {
  CALIBRATION_FORM_FIELDS,
  calibrateInputFromSearch,
  calibrationFormFromSearch,
  calibrationSearchFrom,
} from '@/modules/calibration/utils/calibrationForm';
import { seriesColour } from '@/modules/calibration/utils/calibrationPalette';
import { formatRadiocarbonAge } from '@/modules/ages/utils/formatAge';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { CalibrationFigure } from './CalibrationFigure';
import { CalibrationForm } from './CalibrationForm';
import { CalibrationRanges } from './CalibrationRanges';

/**
 * Calibrate one radiocarbon age. The age lives in the URL (?age=&error=&curve=...), so a
 * calibration can be bookmarked and sent to a colleague.
 */
export function CalibratorView() {
  const [search, setSearch] = useSearchParams();
  const { data: curves } = useSuspenseQuery(calibrationQueries.curves());
  const marineCurves = useMemo(() => new Set(curves.filter((curve) => curve.marine).map((curve) => curve.code as CalibrateInput['curve'])), [curves]);
  const input = useMemo(() => calibrateInputFromSearch(search, marineCurves), [search, marineCurves]);
  const calibration = useQuery({ ...calibrationQueries.calibrate(input ?? { c14Age: 0, c14Error: 1, curve: 'INTCAL20' }), enabled: input !== null });

  const handleCalibrate = (next: CalibrateInput) => setSearch(calibrationSearchFrom(next));
  const serverErrors = isApiError(calibration.error, 'BAD_USER_INPUT') ? fieldErrorsOf(calibration.error) : {};
  const otherError = calibration.error ? formErrorOf(calibration.error, CALIBRATION_FORM_FIELDS) : null;
  const label = input ? `${formatRadiocarbonAge(input.c14Age, input.c14Error)}` : '';
  const series = useMemo(
    () =>
      input && calibration.data
        ? [
            {
              id: 'age',
              label,
              colour: seriesColour(0),
              measured: ageOnCurveAxis(input),
              density: calibration.data.density,
              hpd68: calibration.data.hpd68,
              hpd95: calibration.data.hpd95,
              medianCalBp: calibration.data.medianCalBp,
            },
          ]
        : [],
    [input, calibration.data, label],
  );

  return (
    <div className="sc-page">
      <header className="sc-page-header">
        <div>
          <H2 className="sc-page-title">Calibrate a radiocarbon age</H2>
          <p className={`${Classes.TEXT_MUTED} sc-lead`}>
            Conventional 14C ages to calendar ages on the installed curves; marine ages with a local reservoir offset Delta-R.
          </p>
        </div>
      </header>
      <div className="sc-calibrator-layout">
        <Card elevation={Elevation.ZERO} className="sc-calibrator-form-card">
          <CalibrationForm
            key={search.toString()}
            initialValues={calibrationFormFromSearch(search)}
            curves={curves}
            serverErrors={serverErrors}
            submitting={calibration.isFetching}
            onCalibrate={handleCalibrate}
          />
        </Card>
        <div className="sc-calibrator-result">
          {!input && (
            <NonIdealState
              icon={IconNames.TIMELINE_AREA_CHART}
              title="No age yet"
              description="Enter a conventional radiocarbon age and its error, choose a curve and calibrate."
            />
          )}
          {input && calibration.isPending && calibration.fetchStatus !== 'idle' && <LoadingState label="Calibrating" />}
          {otherError && (
            <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="Cannot calibrate">
              {otherError}
            </Callout>
          )}
          {input && calibration.data && (
            <>
              <Card elevation={Elevation.ZERO} className="sc-chart-card">
                <CalibrationFigure
                  series={series}
                  curves={[input.curve]}
                  note={
                    input.deltaR != null
                      ? `The marine age is drawn less its Delta-R (${Math.round(input.deltaR)} ± ${Math.round(input.deltaRError ?? 0)}), so it reads against the curve as published.`
                      : undefined
                  }
                />
              </Card>
              <CalibrationRanges
                summaries={[
                  {
                    label: `${label} 14C yr BP`,
                    colour: seriesColour(0),
                    medianCalBp: calibration.data.medianCalBp,
                    meanCalBp: calibration.data.meanCalBp,
                    sdYears: calibration.data.sdYears,
                    hpd68: calibration.data.hpd68,
                    hpd95: calibration.data.hpd95,
                    warnings: calibration.data.warnings,
                  },
                ]}
              />
            </>
          )}
        </div>
      </div>
    </div>
  );
}
