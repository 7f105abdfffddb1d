import { Button, Callout, Classes, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState } from 'react';
import { Link } from 'react-router';
import { paths } from '@/app/paths';
import { useSession } from '@/modules/auth/hooks/useSession';
import { downloadWithToken } from '@/modules/correlation/utils/figureDownload';
import type { LadderHypothesis } from '@/modules/correlation/components/EventLadderChart';
import { RegionalEventAges } from '@/modules/correlation/components/RegionalEventAges';
import { shownMedian } from '@/modules/correlation/utils/jointRun';
import { loopRegionalEventIds, regionalEventFailures } from '@/modules/correlation/utils/ladderData';
import { sameAgeVerdict } from '@/modules/correlation/utils/sameAge';

export type RegionalEventsPanelProps = {
  projectId: string;
  hypothesis: LadderHypothesis;
  /** "E3 at Core A" by event id, so members read with their sites. */
  eventLabels: ReadonlyMap<string, string>;
};

type Magnitude = { mw: number; sigma: number; relation: string } | null | undefined;

/** An Mw with its relation's sigma and name; a lower bound says so, as its length is a minimum. */
function MagnitudeValue({ magnitude, lowerBound = false, empty = '–' }: { magnitude: Magnitude; lowerBound?: boolean; empty?: string }) {
  if (!magnitude) return <span className="sc-chart-legend">{empty}</span>;
  return (
    <>
      <span className="num">
        {magnitude.mw.toFixed(1)} ± {magnitude.sigma.toFixed(2)}
      </span>{' '}
      <span className="sc-chart-legend">
        {magnitude.relation}
        {lowerBound ? '; from the site span, a lower bound' : ''}
      </span>
    </>
  );
}

/**
 * The regional events of a hypothesis, youngest first: joint and independent ages side by side, concordance, the
 * Ward & Wilson (1978) same-age test in words, rupture length and magnitude. Order loops are
 * listed above the ladder (OrderLoopsCallout).
 */
export function RegionalEventsPanel({ projectId, hypothesis, eventLabels }: RegionalEventsPanelProps) {
  const session = useSession();
  const [downloadError, setDownloadError] = useState<string | null>(null);
  const regionalEvents = [...hypothesis.regionalEvents].sort((a, b) => shownMedian(a) - shownMedian(b));
  const loops = loopRegionalEventIds(hypothesis.orderConflicts);
  const handleDownload = (format: 'csv' | 'json') => () => {
    setDownloadError(null);
    downloadWithToken(`/api/hypotheses/${encodeURIComponent(hypothesis.id)}/regional-events.${format}`, `regional events ${hypothesis.name} v${hypothesis.version}.${format}`, session?.token).catch(
      (error: unknown) => setDownloadError(error instanceof Error ? error.message : 'the download failed'),
    );
  };
  return (
    <div className="sc-side-list">
      {regionalEvents.length > 0 && (
        <div>
          <Button size="small" variant="minimal" icon={IconNames.DOWNLOAD} text="Regional events CSV" onClick={handleDownload('csv')} />
          <Button size="small" variant="minimal" icon={IconNames.DOWNLOAD} text="JSON" onClick={handleDownload('json')} />
          {downloadError && <span className={Classes.INTENT_DANGER}> {downloadError}</span>}
        </div>
      )}
      {regionalEvents.length === 0 && <p>No ties yet: every site event stands alone.</p>}
      {regionalEvents.map((regional, index) => {
        const low = regional.concordanceLow;
        return (
          <div key={regional.id} className="sc-regional-card">
            <strong>Regional event R{index + 1}</strong> <Tag minimal>{regional.members.length} sites</Tag>{' '}
            {(() => {
              const failures = regionalEventFailures(regional, loops);
              return failures.length > 0 ? (
                <Tag minimal intent={Intent.DANGER} icon={IconNames.CROSS}>
                  fails: {failures.join(', ')}
                </Tag>
              ) : null;
            })()}
            <div>{regional.members.map((member) => eventLabels.get(member.id) ?? member.name).join(' · ')}</div>
            <RegionalEventAges event={regional} />
            <dl>
              <dt>Concordance</dt>
              <dd>
                <span className="num">{regional.concordance === null || regional.concordance === undefined ? '–' : regional.concordance.toFixed(2)}</span>{' '}
                {low && (
                  <Tag intent={Intent.WARNING} minimal icon={IconNames.WARNING_SIGN}>
                    low (below {regional.concordanceThreshold?.toPrecision(2)} for {regional.members.length} members)
                  </Tag>
                )}
              </dd>
              <dt title="Ward & Wilson (1978) chi-square test">Same age?</dt>
              <dd>
                {regional.chiSquare ? (
                  (() => {
                    const verdict = sameAgeVerdict(regional.chiSquare);
                    return (
                      <>
                        <Tag minimal intent={verdict.passes ? Intent.SUCCESS : Intent.DANGER} icon={verdict.passes ? IconNames.TICK : IconNames.CROSS}>
                          {verdict.heading}
                        </Tag>
                        <div className="sc-chart-legend">{verdict.sentence}</div>
                      </>
                    );
                  })()
                ) : (
                  '–'
                )}
              </dd>
              <dt title="Along-strike span of the member sites: the rupture was at least this long">Minimum rupture length</dt>
              <dd className="num">
                {regional.ruptureLengthKm === null || regional.ruptureLengthKm === undefined ? '–' : `≥ ${regional.ruptureLengthKm.toFixed(0)} km (site span)`}
              </dd>
              <dt title="From the minimum rupture length, so a lower bound">Mw from minimum length</dt>
              <dd>
                <MagnitudeValue magnitude={regional.magnitude} lowerBound />
              </dd>
              <dt title="Site span times the segment's down-dip width">Mw from area</dt>
              <dd>
                <MagnitudeValue magnitude={regional.magnitudeFromArea} lowerBound empty="– (no down-dip width on the segment)" />
              </dd>
              <dt title="Mean measured displacement of the members">Mw from displacement</dt>
              <dd>
                <MagnitudeValue magnitude={regional.magnitudeFromDisplacement} empty="– (no measured displacement)" />
              </dd>
              <dt title="Each member site's newest successful age model run">Ages from</dt>
              <dd>
                {regional.ageModelRuns.length === 0
                  ? '–'
                  : regional.ageModelRuns.map((run, i) => (
                      <span key={run.id}>
                        {i > 0 && ' · '}
                        <Link to={paths.ageModel(projectId, run.site.id)}>{run.site.name}</Link> <span className="num">seed {run.seed}</span>
                        {run.stale && (
                          <Tag minimal intent={Intent.WARNING}>
                            out of date
                          </Tag>
                        )}
                      </span>
                    ))}
              </dd>
            </dl>
            {regional.warnings.map((warning) => (
              <Callout key={warning} intent={Intent.WARNING} icon={null}>
                {warning}
              </Callout>
            ))}
          </div>
        );
      })}
    </div>
  );
}
