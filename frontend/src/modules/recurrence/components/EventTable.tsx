import { HTMLTable, Intent, Tag } from '@blueprintjs/core';
import type { SegmentEventTableFieldsFragment } from '@/gql/graphql';
import { AgeValue } from '@/modules/ages/components/AgeValues';
import { extentLabel, formatShare } from '@/modules/recurrence/utils/eventCounting';
import './eventCounting.css';

export type EventTableProps = {
  table: SegmentEventTableFieldsFragment;
  /** Shown above the rows, e.g. "Events this analysis counted". */
  caption?: string;
};

/**
 * A segment's regional events under a hypothesis and a counting rule, young to old: where each was
 * recorded, how much of the segment its sites span, its tie confidences and horizon qualities,
 * and whether (and with what probability) it is in the record.
 */
export function EventTable({ table, caption }: EventTableProps) {
  const rule = table.rule;
  return (
    <div className="sc-event-table">
      {caption && <h4>{caption}</h4>}
      <p className="sc-chart-legend">
        {table.segmentName} ({table.segmentStartKm}–{table.segmentEndKm} km along strike) under “{table.hypothesisName}” (version {table.hypothesisVersion}).
        Rule: {rule.minimumSpanShare > 0 ? `tied events spanning at least ${formatShare(rule.minimumSpanShare)} of the segment` : 'every tied event recorded on the segment'};
        untied single-site events {rule.includeUntied ? 'in' : 'out'}
        {rule.qualityWeights ? `; quality weights ${rule.qualityWeights.join(' / ')}` : ''}
        {rule.confidenceWeights ? `; tie confidence weights ${rule.confidenceWeights.join(' / ')}` : ''}. {table.countedEvents} events counted
        {table.weighted ? `, ${table.expectedEvents.toFixed(1)} expected per draw` : ''}.
      </p>
      <HTMLTable compact className="sc-table">
        <thead>
          <tr>
            <th>Regional event (site event)</th>
            <th>Extent</th>
            <th className="num">Share of segment</th>
            <th>Segments</th>
            <th className="num">Tie confidence</th>
            <th className="num">Quality</th>
            <th className="num">Median age</th>
            <th>Counted</th>
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row) => (
            <tr key={row.regionalEventId} className={row.counted ? undefined : 'sc-event-out'}>
              <td>{row.label}</td>
              <td>{extentLabel(row)}</td>
              <td className="num">{formatShare(row.spanShare)}</td>
              <td>{row.segmentNames.join(', ') || '–'}</td>
              <td className="num">{row.tieConfidences.length > 0 ? row.tieConfidences.join(', ') : 'no ties'}</td>
              <td className="num">{row.qualities.join(', ')}</td>
              <td className="num">
                <AgeValue calBp={row.medianCalBp} />
              </td>
              <td title={row.reason}>
                <Tag minimal intent={row.counted ? (row.inclusionProbability < 1 ? Intent.WARNING : Intent.SUCCESS) : Intent.NONE}>
                  {row.counted ? (row.inclusionProbability < 1 ? `p = ${row.inclusionProbability.toFixed(2)}` : 'yes') : 'out'}
                </Tag>
                <div className="sc-chart-legend">{row.reason}</div>
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <p className="sc-chart-legend">{table.note}</p>
    </div>
  );
}
