import { Button, Classes } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState } from 'react';
import { Link } from 'react-router';
import { paths } from '@/app/paths';
import { useSession } from '@/modules/auth/hooks/useSession';
import { downloadWithToken } from '@/modules/correlation/utils/figureDownload';

export type RunProvenanceProps = {
  projectId: string;
  siteId: string;
  siteName: string;
  run: { id: string; seed: number; createdAt: string; finishedAt?: string | null; status: string };
};

/**
 * Where a run's ages came from, with links: the site's column as it stood when the run was
 * queued, its seed, and the event-age table (CSV/JSON, naming the same inputs) to download.
 */
export function RunProvenance({ projectId, siteId, siteName, run }: RunProvenanceProps) {
  const session = useSession();
  const [error, setError] = useState<string | null>(null);
  const handleDownload = (format: 'csv' | 'json') => () => {
    setError(null);
    downloadWithToken(`/api/age-model-runs/${encodeURIComponent(run.id)}/events.${format}`, `event ages ${siteName} seed ${run.seed}.${format}`, session?.token).catch(
      (failure: unknown) => setError(failure instanceof Error ? failure.message : 'the download failed'),
    );
  };
  return (
    <p className={`sc-run-provenance ${Classes.TEXT_MUTED}`}>
      Computed from the <Link to={paths.site(projectId, siteId)}>column of {siteName}</Link> as it stood on{' '}
      <span className="num">{new Date(run.createdAt).toLocaleString()}</span>, seed <span className="num">{run.seed}</span>
      {run.finishedAt && (
        <>
          , finished <span className="num">{new Date(run.finishedAt).toLocaleString()}</span>
        </>
      )}
      .{' '}
      {run.status === 'SUCCEEDED' && (
        <>
          <Button size="small" variant="minimal" icon={IconNames.DOWNLOAD} text="Event ages CSV" onClick={handleDownload('csv')} />
          <Button size="small" variant="minimal" icon={IconNames.DOWNLOAD} text="JSON" onClick={handleDownload('json')} />
        </>
      )}
      {error && <span className={Classes.INTENT_DANGER}> {error}</span>}
    </p>
  );
}
