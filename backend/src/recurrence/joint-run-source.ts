/**
 * Where a recurrence analysis' event ages come from (issue 13 item 4): a segment analysis under a
 * hypothesis with a fresh joint age model run draws its regional events' ages jointly from that
 * run's stored draws (each row one joint draw, so the events' order and correlation are kept);
 * otherwise each regional event is drawn from its combined density (the product of its members'
 * site posteriors), in median order; a site analysis draws from its site run's joint draws.
 * Pure functions.
 */
import type { StoredJointResults } from '../correlation/joint-runs/joint-run-storage';
import { regionalDrawsOf } from '../correlation/joint-runs/joint-run-storage';

/** `RecurrenceAnalysis.source`. */
export type EventAgeSource = 'JOINT_RUN' | 'COMBINED_DENSITIES' | 'SITE_RUN';

/** The source of an analysis row; analyses stored before the column was added read it from their snapshot. */
export function eventAgeSourceOf(row: { source: string | null; inputSnapshot: unknown }): EventAgeSource {
  if (row.source === 'JOINT_RUN' || row.source === 'COMBINED_DENSITIES' || row.source === 'SITE_RUN') return row.source;
  return (row.inputSnapshot as { kind?: string } | null)?.kind === 'site' ? 'SITE_RUN' : 'COMBINED_DENSITIES';
}

/**
 * The joint draws of a segment's regional events (young to old as `regionalEventIds`) from a
 * fresh joint run, or null when the run did not model every one of them (then the analysis falls
 * back to the combined densities).
 */
export function jointSegmentDraws(results: Pick<StoredJointResults, 'regionalEventDraws'>, regionalEventIds: readonly string[]) {
  return regionalDrawsOf(results.regionalEventDraws, regionalEventIds);
}
