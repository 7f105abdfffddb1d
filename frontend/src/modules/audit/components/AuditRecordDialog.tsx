import { Button, Classes, Dialog, DialogBody, DialogFooter, HTMLTable, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useMemo } from 'react';
import type { AuditTrailQuery } from '@/gql/graphql';
import { auditFieldChanges, jsonCellText } from '@/modules/audit/utils/auditFilters';
import './audit.css';

export type AuditRecordRow = AuditTrailQuery['auditTrail']['edges'][number]['node'];

export type AuditRecordDialogProps = {
  record: AuditRecordRow | null;
  onClose: () => void;
};

/** One audit record: its fields before and after side by side, changed ones marked, and the raw JSON. */
export function AuditRecordDialog({ record, onClose }: AuditRecordDialogProps) {
  const changes = useMemo(() => (record ? auditFieldChanges(record.before, record.after) : []), [record]);
  // A create or a delete changes every field: marking them all would say nothing.
  const isUpdate = record !== null && record.before != null && record.after != null;
  const names = useMemo(() => new Map((record?.referencedNames ?? []).map((n) => [n.id, n.name])), [record]);
  /** A cell's text, with the name of what an id identifies beside it. */
  const cellText = (value: unknown) => {
    const text = jsonCellText(value);
    return typeof value === 'string' && names.has(value.toLowerCase()) ? `${names.get(value.toLowerCase())} (${text})` : text;
  };
  return (
    <Dialog
      isOpen={record !== null}
      onClose={onClose}
      title={record ? `${record.action} ${record.objectType}${record.objectName ? `: ${record.objectName}` : ''}` : ''}
      icon={IconNames.HISTORY}
      style={{ width: 820 }}
    >
      {record && (
        <DialogBody>
          <p className={Classes.TEXT_MUTED}>
            <span className="num">{new Date(record.at).toLocaleString()}</span> by {record.actor ? record.actor.displayName : 'the system'}
            {record.actor && <span className="num"> ({record.actor.email})</span>} · object <span className="num">{record.objectId}</span>
          </p>
          <HTMLTable compact striped className="sc-table sc-table-fill sc-audit-changes">
            <thead>
              <tr>
                <th>Field</th>
                <th>Before</th>
                <th>After</th>
              </tr>
            </thead>
            <tbody>
              {changes.map((change) => (
                <tr key={change.field} className={isUpdate && change.changed ? 'sc-audit-changed' : undefined}>
                  <td className="num">
                    {change.field} {isUpdate && change.changed && <Tag minimal>changed</Tag>}
                  </td>
                  <td className="num sc-audit-value">{cellText(change.before)}</td>
                  <td className="num sc-audit-value">{cellText(change.after)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
          <div className="sc-audit-json">
            <div>
              <div className={Classes.TEXT_MUTED}>Before (JSON)</div>
              <pre className="num">{JSON.stringify(record.before ?? null, null, 2)}</pre>
            </div>
            <div>
              <div className={Classes.TEXT_MUTED}>After (JSON)</div>
              <pre className="num">{JSON.stringify(record.after ?? null, null, 2)}</pre>
            </div>
          </div>
        </DialogBody>
      )}
      <DialogFooter actions={<Button text="Close" onClick={onClose} />} />
    </Dialog>
  );
}
