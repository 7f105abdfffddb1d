import { Callout, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { AgeRangesValue, AgeValue } from '@/modules/ages/components/AgeValues';
import type { LadderHypothesis } from '@/modules/correlation/components/EventLadderChart';
import { sameAgeVerdict } from '@/modules/correlation/utils/sameAge';

export type RegionalEventsPanelProps = {
  hypothesis: LadderHypothesis;
  /** "E3 at Core A" by event id, so members read with their sites. */
  eventLabels: ReadonlyMap<string, string>;
};

/**
 * The regional events of a hypothesis, youngest first: combined age, concordance, the
 * Ward & Wilson (1978) same-age test in words, rupture length and magnitude; order conflicts on top.
 */
export function RegionalEventsPanel({ hypothesis, eventLabels }: RegionalEventsPanelProps) {
  const regionalEvents = [...hypothesis.regionalEvents].sort(
    (a, b) => (a.combinedMedianCalBp ?? Infinity) - (b.combinedMedianCalBp ?? Infinity),
  );
  return (
    <div className="sc-side-list">
      {hypothesis.orderConflicts.length > 0 && (
        <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} title={`${hypothesis.orderConflicts.length} order loop(s): these ties cannot all hold`}>
          <ul>
            {hypothesis.orderConflicts.map((conflict) => (
              <li key={conflict.regionalEventIds.join('>')}>{conflict.message}</li>
            ))}
          </ul>
        </Callout>
      )}
      {regionalEvents.length === 0 && <p>No ties yet: every site event stands alone.</p>}
      {regionalEvents.map((regional, index) => {
        const low = regional.concordanceLow;
        return (
          <div key={regional.id} className="sc-regional-card">
            <strong>Regional event {index + 1}</strong> <Tag minimal>{regional.members.length} sites</Tag>
            <div>{regional.members.map((member) => eventLabels.get(member.id) ?? member.name).join(' · ')}</div>
            <dl>
              <dt>Median</dt>
              <dd>
                <AgeValue calBp={regional.combinedMedianCalBp} />
              </dd>
              <dt>95.4 %</dt>
              <dd>
                <AgeRangesValue ranges={regional.combinedHpd95} />
              </dd>
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
              <dt>Rupture</dt>
              <dd className="num">{regional.ruptureLengthKm === null || regional.ruptureLengthKm === undefined ? '–' : `${regional.ruptureLengthKm.toFixed(0)} km`}</dd>
              <dt>Mw</dt>
              <dd>
                {regional.magnitude ? (
                  <>
                    <span className="num">
                      {regional.magnitude.mw.toFixed(1)} ± {regional.magnitude.sigma.toFixed(2)}
                    </span>{' '}
                    <span className="sc-chart-legend">{regional.magnitude.relation}</span>
                  </>
                ) : (
                  '–'
                )}
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
