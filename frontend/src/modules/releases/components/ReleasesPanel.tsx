import { Button, Callout, Classes, FormGroup, HTMLSelect, HTMLTable, InputGroup, Intent, NonIdealState } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { releaseQueries, useCreateRelease } from '@/modules/releases/hooks/releaseQueries';
import { defaultDiffPair } from '@/modules/releases/utils/releaseDiff';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { ReleaseDialog } from './ReleaseDialog';
import { ReleaseDiffDialog } from './ReleaseDiffDialog';
import './releases.css';

export type ReleasesPanelProps = {
  projectId: string;
  canCreate: boolean;
};

/** Freeze a release with a note (admins), list the releases, open one, compare two. */
export function ReleasesPanel({ projectId, canCreate }: ReleasesPanelProps) {
  const releases = useQuery(releaseQueries.list(projectId));
  const create = useCreateRelease(projectId);
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string | undefined>();
  const [openId, setOpenId] = useState<string | null>(null);
  const [choice, setChoice] = useState<{ fromId: string; toId: string } | null>(null);
  const [comparing, setComparing] = useState<{ fromId: string; toId: string } | null>(null);

  const list = [...(releases.data?.releases ?? [])].sort((a, b) => b.number - a.number);
  const pair = choice ?? defaultDiffPair(list);

  const handleCreate = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (note.trim() === '') {
      setNoteError('say what the release is for, e.g. "submitted with the paper"');
      return;
    }
    setNoteError(undefined);
    create.mutate({ input: { projectId, note: note.trim() } }, { onSuccess: () => setNote('') });
  };

  if (releases.isPending) return <LoadingState />;
  if (releases.error) return <Callout intent={Intent.DANGER}>{formErrorOf(releases.error, [])}</Callout>;

  const serverNoteError = fieldErrorsOf(create.error).note;
  const formError = formErrorOf(create.error, ['note']);
  return (
    <div>
      {canCreate && (
        <form onSubmit={handleCreate} noValidate className="sc-release-form">
          <FormGroup
            label="Freeze a release"
            labelFor="release-note"
            helperText={noteError ?? serverNoteError ?? 'A frozen copy of all project data, numbered, read only and citable.'}
            intent={noteError || serverNoteError ? Intent.DANGER : Intent.NONE}
          >
            <InputGroup id="release-note" value={note} onValueChange={setNote} placeholder="Note, e.g. submitted with the paper" />
          </FormGroup>
          <Button type="submit" icon={IconNames.ARCHIVE} text="Freeze" intent={Intent.PRIMARY} loading={create.isPending} />
        </form>
      )}
      {formError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formError}
        </Callout>
      )}
      {create.data && (
        <Callout intent={Intent.SUCCESS} icon={IconNames.TICK} className="sc-form-callout">
          Release <span className="num">{create.data.createRelease.number}</span> is frozen.
        </Callout>
      )}

      {list.length === 0 ? (
        <NonIdealState icon={IconNames.ARCHIVE} title="No releases yet" description="A release freezes the data as it is, for a paper or a report." />
      ) : (
        <>
          <HTMLTable compact striped className="sc-table sc-table-fill">
            <thead>
              <tr>
                <th className="sc-numeric">No.</th>
                <th>Note</th>
                <th>Frozen</th>
                <th>By</th>
                <th aria-label="Actions" />
              </tr>
            </thead>
            <tbody>
              {list.map((release) => (
                <tr key={release.id}>
                  <td className="num sc-numeric">{release.number}</td>
                  <td>{release.note}</td>
                  <td className="num">{new Date(release.createdAt).toLocaleString()}</td>
                  <td>{release.createdBy.displayName}</td>
                  <td className="sc-actions-cell">
                    <Button icon={IconNames.EYE_OPEN} text="Open" variant="minimal" size="small" onClick={() => setOpenId(release.id)} />
                  </td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
          {pair && (
            <div className="sc-release-compare">
              <span className={Classes.TEXT_MUTED}>Compare release</span>
              <HTMLSelect aria-label="Older release" value={pair.fromId} onChange={(event) => setChoice({ ...pair, fromId: event.target.value })}>
                {list.map((release) => (
                  <option key={release.id} value={release.id}>
                    {release.number}
                  </option>
                ))}
              </HTMLSelect>
              <span className={Classes.TEXT_MUTED}>with release</span>
              <HTMLSelect aria-label="Newer release" value={pair.toId} onChange={(event) => setChoice({ ...pair, toId: event.target.value })}>
                {list.map((release) => (
                  <option key={release.id} value={release.id}>
                    {release.number}
                  </option>
                ))}
              </HTMLSelect>
              <Button icon={IconNames.COMPARISON} text="Show differences" disabled={pair.fromId === pair.toId} onClick={() => setComparing(pair)} />
            </div>
          )}
        </>
      )}
      <ReleaseDialog projectId={projectId} releaseId={openId} onClose={() => setOpenId(null)} />
      <ReleaseDiffDialog projectId={projectId} pair={comparing} onClose={() => setComparing(null)} />
    </div>
  );
}
