import { Button, Callout, FormGroup, HTMLTable, InputGroup, Intent, NonIdealState, TextArea } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { coreLogQueries, useCoreLogMutations } from '@/modules/core-logs/hooks/coreLogQueries';
import { CoreSection } from '@/modules/core-drawing/components/CoreSection';

export type CoreLogsViewProps = {
  projectId: string;
  siteId: string;
  canEdit: boolean;
};

/** A core's physical-property logs drawn beside its column on true or event-free depth, the list of logs, and the upload form. */
export function CoreLogsView({ projectId, siteId, canEdit }: CoreLogsViewProps) {
  const { data: site } = useQuery(coreLogQueries.site(projectId, siteId));
  const { upload, remove } = useCoreLogMutations(projectId, siteId);
  const [name, setName] = useState('');
  const [csv, setCsv] = useState('');
  if (!site) return null;
  const handleUpload = () => upload.mutate({ input: { siteId, name, csv } }, { onSuccess: () => { setName(''); setCsv(''); } });
  const handleFile = async (file: File | undefined) => {
    if (file) setCsv(await file.text());
  };

  return (
    <div className="sc-core-logs">
      {site.coreLogs.length === 0 && <NonIdealState icon={IconNames.TIMELINE_LINE_CHART} title="No core logs yet" />}
      {site.coreLogs.length > 0 && (
        <HTMLTable compact striped className="sc-table">
          <thead>
            <tr>
              <th>Log</th>
              <th>Channels</th>
              <th>Rows</th>
              <th>Depths</th>
              {canEdit && <th aria-label="Actions" />}
            </tr>
          </thead>
          <tbody>
            {site.coreLogs.map((log) => (
              <tr key={log.id}>
                <td>{log.name}</td>
                <td>{log.channels.map((channel, index) => `${channel} (${log.units[index] ?? ''})`).join(', ')}</td>
                <td className="num">{log.rowCount}</td>
                <td className="num">
                  {log.topDepthM}–{log.baseDepthM} m
                </td>
                {canEdit && (
                  <td>
                    <Button small minimal icon={IconNames.TRASH} aria-label={`Delete ${log.name}`} onClick={() => remove.mutate({ id: log.id })} />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      <CoreSection projectId={projectId} siteId={siteId} />
      {canEdit && (
        <div style={{ maxWidth: 640, marginTop: 16 }}>
          <h4>Upload a core log</h4>
          <p>CSV: a header "depth (m)" then one "name (unit)" per channel; one row per depth, increasing down the core.</p>
          <FormGroup label="Name" labelFor="core-log-name">
            <InputGroup id="core-log-name" value={name} onChange={(e) => setName(e.currentTarget.value)} />
          </FormGroup>
          <FormGroup label="CSV file or text" labelFor="core-log-csv">
            <input type="file" accept=".csv,text/csv,text/plain" onChange={(e) => void handleFile(e.currentTarget.files?.[0])} />
            <TextArea id="core-log-csv" fill rows={6} value={csv} onChange={(e) => setCsv(e.currentTarget.value)} className="num" />
          </FormGroup>
          {upload.error && (
            <Callout intent={Intent.DANGER} title="The log was not stored">
              {upload.error.message}
            </Callout>
          )}
          <Button intent={Intent.PRIMARY} icon={IconNames.UPLOAD} disabled={!name.trim() || !csv.trim()} loading={upload.isPending} onClick={handleUpload}>
            Check and store
          </Button>
        </div>
      )}
    </div>
  );
}
