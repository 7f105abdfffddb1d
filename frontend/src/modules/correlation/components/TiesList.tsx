import { Button, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { LadderHypothesis } from '@/modules/correlation/components/EventLadderChart';

export type TiesListProps = {
  hypothesis: LadderHypothesis;
  /** "E3 at Core A" by event id, so each tie names its sites. */
  eventLabels: ReadonlyMap<string, string>;
  conflictingTieIds: ReadonlySet<string>;
  /** Selected events: their ties are listed first. */
  selectedEventIds: readonly string[];
  canEdit: boolean;
  removingTieId: string | null;
  onRemove: (tieId: string) => void;
};

/** The ties of a hypothesis, with the ones touching the selection first and a remove button. */
export function TiesList({ hypothesis, eventLabels, conflictingTieIds, selectedEventIds, canEdit, removingTieId, onRemove }: TiesListProps) {
  const touches = (tie: LadderHypothesis['ties'][number]) => selectedEventIds.includes(tie.eventA.id) || selectedEventIds.includes(tie.eventB.id);
  const ties = [...hypothesis.ties].sort((a, b) => Number(touches(b)) - Number(touches(a)));
  if (ties.length === 0) return <p>This hypothesis has no ties yet.</p>;
  return (
    <HTMLTable compact className="sc-table">
      <thead>
        <tr>
          <th>Events</th>
          <th>Conf.</th>
          <th>Evidence</th>
          {canEdit && <th />}
        </tr>
      </thead>
      <tbody>
        {ties.map((tie) => {
          const handleRemove = () => onRemove(tie.id);
          return (
            <tr key={tie.id} className={touches(tie) ? 'sc-row-selected' : undefined}>
              <td>
                {eventLabels.get(tie.eventA.id) ?? tie.eventA.name} – {eventLabels.get(tie.eventB.id) ?? tie.eventB.name}{' '}
                {conflictingTieIds.has(tie.id) && (
                  <Tag minimal intent={Intent.WARNING} icon={IconNames.WARNING_SIGN}>
                    order
                  </Tag>
                )}
              </td>
              <td className="num">{tie.confidence}</td>
              <td>{tie.evidence.join(', ')}</td>
              {canEdit && (
                <td>
                  <Button size="small" variant="minimal" icon={IconNames.UNLINK} aria-label="Remove tie" title="Remove tie" onClick={handleRemove} loading={removingTieId === tie.id} />
                </td>
              )}
            </tr>
          );
        })}
      </tbody>
    </HTMLTable>
  );
}
