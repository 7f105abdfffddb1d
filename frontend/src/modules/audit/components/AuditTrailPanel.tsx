import { Button, Callout, Classes, FormGroup, HTMLSelect, HTMLTable, InputGroup, Intent, NonIdealState } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useState, type ChangeEvent, type FormEvent } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { auditQueries } from '@/modules/audit/hooks/auditQueries';
import { AUDIT_OBJECT_TYPES, auditFilterProblems, NO_AUDIT_FILTERS, type AuditFilters } from '@/modules/audit/utils/auditFilters';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { AuditRecordDialog, type AuditRecordRow } from './AuditRecordDialog';
import './audit.css';

export type AuditPerson = { id: string; displayName: string; email: string };

export type AuditTrailPanelProps = {
  projectId: string;
  /** The people the person filter offers (the project's members). */
  people: readonly AuditPerson[];
};

/** The project's audit trail, newest first, a page at a time, filtered by person, object and days. */
export function AuditTrailPanel({ projectId, people }: AuditTrailPanelProps) {
  const [draft, setDraft] = useState<AuditFilters>(NO_AUDIT_FILTERS);
  const [filters, setFilters] = useState<AuditFilters>(NO_AUDIT_FILTERS);
  // Cursors of the pages before the one shown, so "Newer" can step back.
  const [cursors, setCursors] = useState<(string | null)[]>([null]);
  const [opened, setOpened] = useState<AuditRecordRow | null>(null);
  const after = cursors.at(-1) ?? null;
  const trail = useQuery(auditQueries.page(projectId, filters, after));
  const problems = auditFilterProblems(draft);

  const handleDraft = (field: keyof AuditFilters) => (event: ChangeEvent<HTMLInputElement | HTMLSelectElement>) =>
    setDraft((previous) => ({ ...previous, [field]: event.target.value }));
  const handleApply = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (Object.keys(problems).length > 0) return;
    setFilters(draft);
    setCursors([null]);
  };
  const handleClear = () => {
    setDraft(NO_AUDIT_FILTERS);
    setFilters(NO_AUDIT_FILTERS);
    setCursors([null]);
  };
  const handleOlder = () => {
    const next = trail.data?.pageInfo.endCursor;
    if (next) setCursors((previous) => [...previous, next]);
  };
  const handleNewer = () => setCursors((previous) => (previous.length > 1 ? previous.slice(0, -1) : previous));

  const edges = trail.data?.edges ?? [];
  return (
    <div>
      <form className="sc-audit-filters" onSubmit={handleApply} noValidate>
        <FormGroup label="Person" labelFor="audit-actor">
          <HTMLSelect id="audit-actor" value={draft.actorId} onChange={handleDraft('actorId')}>
            <option value="">Anyone</option>
            {people.map((person) => (
              <option key={person.id} value={person.id}>
                {person.displayName} ({person.email})
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <FormGroup label="Object type" labelFor="audit-type">
          <InputGroup id="audit-type" list="audit-object-types" value={draft.objectType} onChange={handleDraft('objectType')} placeholder="any" />
          <datalist id="audit-object-types">
            {AUDIT_OBJECT_TYPES.map((type) => (
              <option key={type} value={type} />
            ))}
          </datalist>
        </FormGroup>
        <FormGroup label="Object id" labelFor="audit-object">
          <InputGroup id="audit-object" className="num" value={draft.objectId} onChange={handleDraft('objectId')} placeholder="any" />
        </FormGroup>
        <FormGroup label="From day" labelFor="audit-from" helperText={problems.fromDate} intent={problems.fromDate ? Intent.DANGER : Intent.NONE}>
          <InputGroup id="audit-from" type="date" value={draft.fromDate} onChange={handleDraft('fromDate')} />
        </FormGroup>
        <FormGroup label="To day" labelFor="audit-to" helperText={problems.toDate} intent={problems.toDate ? Intent.DANGER : Intent.NONE}>
          <InputGroup id="audit-to" type="date" value={draft.toDate} onChange={handleDraft('toDate')} />
        </FormGroup>
        <Button type="submit" icon={IconNames.FILTER} text="Filter" intent={Intent.PRIMARY} />
        <Button icon={IconNames.FILTER_REMOVE} text="Clear" variant="minimal" onClick={handleClear} />
      </form>

      {trail.error ? (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR}>
          {formErrorOf(trail.error, [])}
        </Callout>
      ) : trail.isPending ? (
        <LoadingState label="Loading the audit trail" />
      ) : edges.length === 0 ? (
        <NonIdealState icon={IconNames.HISTORY} title="No changes" description="Nothing recorded matches these filters." />
      ) : (
        <HTMLTable compact striped interactive className="sc-table sc-table-fill">
          <thead>
            <tr>
              <th>When</th>
              <th>Who</th>
              <th>Action</th>
              <th>Object type</th>
              <th>Object</th>
              <th>Object id</th>
            </tr>
          </thead>
          <tbody>
            {edges.map(({ node }) => (
              <tr key={node.id} className="sc-audit-row" onClick={() => setOpened(node)} title="Show before and after">
                <td className="num">{new Date(node.at).toLocaleString()}</td>
                <td>{node.actor ? node.actor.displayName : <span className={Classes.TEXT_MUTED}>system</span>}</td>
                <td>{node.action}</td>
                <td className="num">{node.objectType}</td>
                <td>{node.objectName ?? <span className={Classes.TEXT_MUTED}>—</span>}</td>
                <td className="num sc-audit-id">{node.objectId}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}

      <div className="sc-audit-pager">
        <span className={Classes.TEXT_MUTED}>
          Page <span className="num">{cursors.length}</span>
        </span>
        <Button icon={IconNames.CHEVRON_LEFT} text="Newer" disabled={cursors.length <= 1 || trail.isFetching} onClick={handleNewer} />
        <Button
          endIcon={IconNames.CHEVRON_RIGHT}
          text="Older"
          disabled={!trail.data?.pageInfo.hasNextPage || trail.isFetching}
          loading={trail.isFetching && !trail.isPending}
          onClick={handleOlder}
        />
      </div>
      <AuditRecordDialog record={opened} onClose={() => setOpened(null)} />
    </div>
  );
}
