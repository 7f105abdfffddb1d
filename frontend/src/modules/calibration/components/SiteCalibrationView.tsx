import { Button, Callout, Checkbox, Classes, Intent, NonIdealState, Section, SectionCard } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import type { CurveCode, SiteCalibrationsQuery } from '@/gql/graphql';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { ageOnCurveAxis } from '@/modules/calibration/utils/calibrationChart';
import { SERIES_COLOURS, seriesColour } from '@/modules/calibration/utils/calibrationPalette';
import type { WithCalibrationPoints } from '@/modules/calibration/utils/calibrationPoints';
import { siteQueries } from '@/modules/sites/hooks/siteQueries';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import type { CalibrationSeries } from './CalibrationChart';
import { CalibrationFigure } from './CalibrationFigure';
import { CalibrationRanges } from './CalibrationRanges';

type SiteSample = WithCalibrationPoints<SiteCalibrationsQuery['site']['samples'][number]>;
type CalibratedSample = SiteSample & {
  calibration: NonNullable<SiteSample['calibration']>;
  c14Age: number;
  c14Error: number;
  curve: CurveCode;
};

/** How many samples are overlaid before the reader picks their own. */
const DEFAULT_OVERLAY = 6;

export type SiteCalibrationViewProps = { projectId: string; siteId: string };

/** A site's radiocarbon samples overlaid on the curve; the reader picks which to show. */
export function SiteCalibrationView({ projectId, siteId }: SiteCalibrationViewProps) {
  const { data: site, error, isPending } = useQuery(siteQueries.calibrations(projectId, siteId));
  const [picked, setPicked] = useState<ReadonlySet<string> | null>(null);

  const candidates = useMemo<CalibratedSample[]>(
    () =>
      (site?.samples ?? [])
        .filter(
          (sample): sample is CalibratedSample =>
            sample.method === 'RADIOCARBON' && sample.calibration != null && sample.c14Age != null && sample.c14Error != null && sample.curve != null,
        )
        .sort((a, b) => b.unit.position - a.unit.position || a.calibration.medianCalBp - b.calibration.medianCalBp),
    [site],
  );
  const selectedIds = useMemo(
    () => picked ?? new Set(candidates.filter((sample) => !sample.excluded).slice(0, DEFAULT_OVERLAY).map((sample) => sample.id)),
    [picked, candidates],
  );
  // Colours go to the samples shown, in order, and at most as many are shown as there are
  // colours: no two overlaid samples share one (each row is also labelled by its lab code).
  const selected = useMemo(() => candidates.filter((sample) => selectedIds.has(sample.id)).slice(0, SERIES_COLOURS.length), [candidates, selectedIds]);
  const colours = useMemo(() => new Map(selected.map((sample, index) => [sample.id, seriesColour(index)])), [selected]);
  const full = selected.length >= SERIES_COLOURS.length;
  const series = useMemo<CalibrationSeries[]>(
    () =>
      selected.map((sample) => ({
        id: sample.id,
        label: sample.labCode,
        colour: colours.get(sample.id)!,
        measured: ageOnCurveAxis(sample),
        density: sample.calibration.density,
        hpd68: sample.calibration.hpd68,
        hpd95: sample.calibration.hpd95,
        medianCalBp: sample.calibration.medianCalBp,
      })),
    [selected, colours],
  );

  if (isPending) return <LoadingState label="Loading calibrations" />;
  if (error) {
    return (
      <Callout intent={Intent.DANGER} icon={IconNames.ERROR}>
        {formErrorOf(error, [])}
      </Callout>
    );
  }
  if (candidates.length === 0) {
    return <NonIdealState icon={IconNames.TIMELINE_AREA_CHART} title="No calibrated radiocarbon samples" description="Radiocarbon samples appear here once they are entered." />;
  }

  const handleToggle = (sampleId: string) => {
    const next = new Set(selected.map((sample) => sample.id));
    if (next.has(sampleId)) next.delete(sampleId);
    else next.add(sampleId);
    setPicked(next);
  };
  const hasMarine = selected.some((sample) => sample.deltaR != null);

  return (
    <div className="sc-site-calibration">
      <Section title="Samples" compact className="sc-sample-picker">
        <SectionCard>
          <div className="sc-picker-actions">
            <Button
              size="small"
              variant="minimal"
              text={candidates.length > SERIES_COLOURS.length ? `First ${SERIES_COLOURS.length}` : 'All'}
              onClick={() => setPicked(new Set(candidates.slice(0, SERIES_COLOURS.length).map((sample) => sample.id)))}
            />
            <Button size="small" variant="minimal" text="None" onClick={() => setPicked(new Set())} />
          </div>
          {full && (
            <p className={`${Classes.TEXT_MUTED} sc-form-note`}>
              {SERIES_COLOURS.length} at once, each in its own colour: clear one to show another.
            </p>
          )}
          {candidates.map((sample) => (
            <Checkbox
              key={sample.id}
              checked={colours.has(sample.id)}
              disabled={full && !colours.has(sample.id)}
              onChange={() => handleToggle(sample.id)}
              className="sc-picker-item"
              labelElement={
                <span>
                  <span className="sc-swatch" style={{ background: colours.get(sample.id) ?? 'transparent' }} />
                  <span className="num">{sample.labCode}</span>{' '}
                  <span className={Classes.TEXT_MUTED}>
                    {sample.unit.name}
                    {sample.excluded ? ' · excluded' : ''}
                  </span>
                </span>
              }
            />
          ))}
        </SectionCard>
      </Section>
      <div className="sc-site-calibration-main">
        {series.length === 0 ? (
          <NonIdealState icon={IconNames.SELECT} title="Pick samples to overlay" />
        ) : (
          <>
            <Section compact title="On the curve">
              <SectionCard>
                <CalibrationFigure
                  series={series}
                  curves={selected.map((sample) => sample.curve)}
                  note={hasMarine ? 'Marine ages are drawn less their Delta-R, so they read against the curve as published.' : undefined}
                />
              </SectionCard>
            </Section>
            <CalibrationRanges
              summaries={selected.map((sample) => ({
                label: sample.labCode,
                colour: colours.get(sample.id)!,
                medianCalBp: sample.calibration.medianCalBp,
                meanCalBp: sample.calibration.meanCalBp,
                sdYears: sample.calibration.sdYears,
                hpd68: sample.calibration.hpd68,
                hpd95: sample.calibration.hpd95,
                warnings: sample.calibration.warnings,
              }))}
            />
          </>
        )}
      </div>
    </div>
  );
}
