import { Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { EventTable } from '@/modules/recurrence/components/EventTable';
import { AnalysisEventTableDocument } from '@/modules/recurrence/graphql/eventCounting';
import { recurrenceQueries } from '@/modules/recurrence/hooks/recurrenceQueries';
import { formatShare } from '@/modules/recurrence/utils/eventCounting';

export type AnalysisEventTableProps = { projectId: string; analysisId: string; status: string };

/** The event table a finished segment analysis stored, with how its weights made the record vary. */
export function AnalysisEventTable({ projectId, analysisId, status }: AnalysisEventTableProps) {
  const query = useQuery({
    queryKey: [...recurrenceQueries.all(projectId), 'analysis-event-table', analysisId, status] as const,
    queryFn: async () => (await graphqlRequest(AnalysisEventTableDocument, { id: analysisId })).recurrenceAnalysis,
  });
  const analysis = query.data;
  if (!analysis?.eventTable) return null;
  const partial = analysis.intervals.filter((interval) => interval.shareOfDraws != null);
  return (
    <section className="sc-panel">
      <EventTable table={analysis.eventTable} caption="Events this analysis counted" />
      {analysis.recordEvents && (
        <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN}>
          The record held {analysis.recordEvents.low95.toFixed(0)}–{analysis.recordEvents.high95.toFixed(0)} events (95 % of draws; median{' '}
          {analysis.recordEvents.median.toFixed(0)}), so every range above mixes over which events happened as well as over dating and
          parameters.
          {partial.length > 0 &&
            ` Interval rows cover only the draws holding them: ${partial
              .map((interval) => `${interval.index + 2} → ${interval.index + 1} in ${formatShare(interval.shareOfDraws ?? 1)}`)
              .join(', ')}.`}
        </Callout>
      )}
    </section>
  );
}
