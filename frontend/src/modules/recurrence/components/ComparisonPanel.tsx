import { Button, Callout, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import type { RecurrenceComparisonQuery } from '@/gql/graphql';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { useSession } from '@/modules/auth/hooks/useSession';
import { downloadWithToken } from '@/modules/correlation/utils/figureDownload';
import { RecurrenceComparisonDocument } from '@/modules/recurrence/graphql/eventCounting';
import { recurrenceQueries } from '@/modules/recurrence/hooks/recurrenceQueries';
import { formatProbability, modelLabel } from '@/modules/recurrence/utils/recurrenceCharts';
import { differenceLabel, formatShare } from '@/modules/recurrence/utils/eventCounting';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import './eventCounting.css';

type Comparison = RecurrenceComparisonQuery['recurrenceComparison'];
type Side = Comparison['events'][number]['a'];
type Range = { median: number; low95: number; high95: number };

function SideCell({ side }: { side: Side }) {
  if (!side) return <td className="sc-chart-legend">not an event here</td>;
  return (
    <td title={side.reason}>
      {side.counted ? (side.inclusionProbability < 1 ? `p = ${side.inclusionProbability.toFixed(2)}` : 'counted') : 'out'}
      <span className="sc-chart-legend"> · spans {formatShare(side.spanShare)}</span>
    </td>
  );
}

function RangeText({ range, format }: { range: Range; format: (value: number) => string }) {
  return (
    <>
      {format(range.median)} <span className="sc-chart-legend">({format(range.low95)}–{format(range.high95)})</span>
    </>
  );
}

/** How a difference is shown: a medians' gap inside overlapping ranges is not resolved by the data. */
function DifferenceCell({ difference, overlap, format }: { difference: number; overlap: boolean; format: (value: number) => string }) {
  return (
    <td className="num">
      {difference > 0 ? '+' : ''}
      {format(difference)}
      <div className="sc-chart-legend">{overlap ? 'ranges overlap' : 'ranges apart'}</div>
    </td>
  );
}

const years = (value: number) => value.toFixed(0);
const ratio = (value: number) => value.toFixed(2);
/** A difference of probabilities, in percentage points. */
const points = (value: number) => `${(value * 100).toFixed(1)} % points`;

export type ComparisonPanelProps = { projectId: string; analysisAId: string; analysisBId: string };

/**
 * Two finished analyses aligned row by row: their events matched by member site events (events in
 * only one, or counted differently, highlighted), statistics and probabilities with B - A, and
 * the comparison as CSV or JSON.
 */
export function ComparisonPanel({ projectId, analysisAId, analysisBId }: ComparisonPanelProps) {
  const session = useSession();
  const query = useQuery({
    queryKey: [...recurrenceQueries.all(projectId), 'comparison', analysisAId, analysisBId] as const,
    queryFn: async () => (await graphqlRequest(RecurrenceComparisonDocument, { analysisAId, analysisBId })).recurrenceComparison,
  });
  if (query.isPending) return <LoadingState label="Comparing the analyses" />;
  if (query.isError) {
    return (
      <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} title="No comparison">
        {query.error.message}
      </Callout>
    );
  }
  const comparison = query.data;
  const name = (analysis: Comparison['analysisA']) => (analysis.hypothesis ? `${analysis.hypothesis.name} v${analysis.hypothesisVersion ?? '?'}` : 'site analysis');
  const nameA = name(comparison.analysisA);
  const nameB = name(comparison.analysisB);
  const download = (format: 'csv' | 'json') =>
    downloadWithToken(
      `/api/recurrence-analyses/${encodeURIComponent(analysisAId)}/compare/${encodeURIComponent(analysisBId)}/export.${format}`,
      `recurrence comparison ${nameA} vs ${nameB}.${format}`,
      session?.token,
    ).catch(() => undefined);
  const changed = comparison.events.filter((event) => event.difference !== 'SAME').length;
  const isProbability = (unit: string) => unit === '';

  return (
    <section className="sc-panel sc-compare-table">
      <h3>
        A: {nameA} · B: {nameB}
      </h3>
      <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN}>
        {comparison.caution}
      </Callout>
      {comparison.settingDifferences.length > 0 && (
        <Callout intent={Intent.PRIMARY} icon={IconNames.INFO_SIGN} title="Not the same setting">
          {comparison.settingDifferences.join(' ')}
        </Callout>
      )}
      <div className="sc-ladder-toolbar">
        <Button small icon={IconNames.DOWNLOAD} text="Comparison CSV" onClick={() => download('csv')} />
        <Button small icon={IconNames.DOWNLOAD} text="Comparison JSON" onClick={() => download('json')} />
        <span className="sc-chart-legend">{changed === 0 ? 'The same events count in both.' : `${changed} ${changed === 1 ? 'event differs' : 'events differ'} between the tables.`}</span>
      </div>
      <HTMLTable compact className="sc-table">
        <thead>
          <tr>
            <th>Regional event (site event)</th>
            <th>A</th>
            <th>B</th>
            <th>Difference</th>
          </tr>
        </thead>
        <tbody>
          {comparison.events.map((event) => (
            <tr
              key={event.regionalEventId}
              className={
                event.difference === 'SAME' ? undefined : event.difference === 'INCLUSION_CHANGED' ? 'sc-compare-row-changed' : 'sc-compare-row-only'
              }
            >
              <td>{event.label}</td>
              <SideCell side={event.a} />
              <SideCell side={event.b} />
              <td>{event.difference !== 'SAME' && <Tag minimal intent={event.difference === 'INCLUSION_CHANGED' ? Intent.PRIMARY : Intent.WARNING}>{differenceLabel(event.difference)}</Tag>}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <HTMLTable compact className="sc-table">
        <thead>
          <tr>
            <th>Quantity</th>
            <th className="num">A median (95 % range)</th>
            <th className="num">B median (95 % range)</th>
            <th className="num">B − A</th>
          </tr>
        </thead>
        <tbody>
          {comparison.statistics.map((statistic) => {
            const format = isProbability(statistic.unit) ? ratio : years;
            return (
              <tr key={statistic.quantity} className={statistic.rangesOverlap ? undefined : 'sc-compare-row-changed'}>
                <td>
                  {statistic.quantity}
                  {statistic.unit ? `, ${statistic.unit === 'years' ? 'yr' : statistic.unit}` : ''}
                </td>
                <td className="num">
                  <RangeText range={statistic.a} format={format} />
                </td>
                <td className="num">
                  <RangeText range={statistic.b} format={format} />
                </td>
                <DifferenceCell difference={statistic.medianDifference} overlap={statistic.rangesOverlap} format={format} />
              </tr>
            );
          })}
          {comparison.probabilities.map((probability) => (
            <tr key={`${probability.model}-${probability.windowYears}`} className={probability.rangesOverlap ? undefined : 'sc-compare-row-changed'}>
              <td>
                {probability.model === 'MODEL_AVERAGED' ? 'Model-averaged (AICc weights)' : modelLabel(probability.model)}, {probability.windowYears}-yr probability
              </td>
              <td className="num">
                <RangeText range={probability.a} format={formatProbability} />
              </td>
              <td className="num">
                <RangeText range={probability.b} format={formatProbability} />
              </td>
              <DifferenceCell difference={probability.medianDifference} overlap={probability.rangesOverlap} format={points} />
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <p className="sc-chart-legend">{comparison.note}</p>
    </section>
  );
}
