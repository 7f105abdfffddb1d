import { Button, Callout, Dialog, DialogBody, DialogFooter, H5, HTMLTable, Intent, NonIdealState, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { releaseQueries } from '@/modules/releases/hooks/releaseQueries';
import { groupReleaseChanges } from '@/modules/releases/utils/releaseDiff';
import { LoadingState } from '@/modules/ui/components/LoadingState';

export type ReleaseDiffDialogProps = {
  projectId: string;
  pair: { fromId: string; toId: string } | null;
  onClose: () => void;
};

const CHANGE_INTENT: Record<string, Intent> = { added: Intent.SUCCESS, changed: Intent.WARNING, removed: Intent.DANGER };

/** What was added, changed and removed between two releases, by object type. */
export function ReleaseDiffDialog({ projectId, pair, onClose }: ReleaseDiffDialogProps) {
  const diff = useQuery({ ...releaseQueries.diff(projectId, pair?.fromId ?? '', pair?.toId ?? ''), enabled: pair !== null });
  const groups = useMemo(() => groupReleaseChanges(diff.data?.changes ?? []), [diff.data]);
  const title = diff.data ? `Release ${diff.data.from.number} → release ${diff.data.to.number}` : 'Compare releases';
  return (
    <Dialog isOpen={pair !== null} onClose={onClose} title={title} icon={IconNames.COMPARISON} style={{ width: 760 }}>
      <DialogBody>
        {diff.error ? (
          <Callout intent={Intent.DANGER}>{formErrorOf(diff.error, [])}</Callout>
        ) : !diff.data ? (
          <LoadingState />
        ) : groups.length === 0 ? (
          <NonIdealState icon={IconNames.EQUALS} title="No differences" description="The two releases hold the same data." />
        ) : (
          groups.map((group) => (
            <div key={group.objectType} className="sc-section">
              <H5>
                {group.objectType}{' '}
                <span className="num">
                  +{group.counts.added} ~{group.counts.changed} −{group.counts.removed}
                </span>
              </H5>
              <HTMLTable compact striped className="sc-table sc-table-fill">
                <tbody>
                  {group.changes.map((change) => (
                    <tr key={`${change.change}-${change.objectId}`}>
                      <td style={{ width: 90 }}>
                        <Tag minimal intent={CHANGE_INTENT[change.change] ?? Intent.NONE}>
                          {change.change}
                        </Tag>
                      </td>
                      <td>{change.label}</td>
                      <td className="num">{change.objectId}</td>
                    </tr>
                  ))}
                </tbody>
              </HTMLTable>
            </div>
          ))
        )}
      </DialogBody>
      <DialogFooter actions={<Button text="Close" onClick={onClose} />} />
    </Dialog>
  );
}
