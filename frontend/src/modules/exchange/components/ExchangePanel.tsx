import { Button, ButtonGroup, Callout, Classes, FileInput, FormGroup, H5, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type ChangeEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { useDownloadExport, useImportBundle } from '@/modules/exchange/hooks/useExchange';
import { CSV_TABLE_LABELS, CSV_TABLES, exchangeRoutes } from '@/modules/exchange/utils/exchangeRoutes';
import './exchange.css';

export type ExchangePanelProps = { projectId: string };

/**
 * Exports of the project (the bundle, every table as CSV, the sites as GeoJSON), each fetched
 * with the bearer token and saved as a file, and the import of a bundle as a new project.
 */
export function ExchangePanel({ projectId }: ExchangePanelProps) {
  const navigate = useNavigate();
  const download = useDownloadExport();
  const importBundle = useImportBundle();
  const [file, setFile] = useState<File | null>(null);

  const handleFile = (event: ChangeEvent<HTMLInputElement>) => {
    importBundle.reset();
    setFile(event.target.files?.[0] ?? null);
  };
  const handleImport = () => {
    if (file) importBundle.mutate(file);
  };

  const downloadError = formErrorOf(download.error, []);
  const importError = formErrorOf(importBundle.error, []);
  return (
    <div className="sc-exchange">
      <section>
        <H5>Export</H5>
        <p className={Classes.TEXT_MUTED}>
          The bundle holds everything entered in the project (format <span className="num">stratochron-bundle</span> version 2) and
          imports into any Stratochron server. Calibrations and runs are recomputed from it.
        </p>
        <div className="sc-exchange-buttons">
          <Button
            icon={IconNames.DOWNLOAD}
            text="Project bundle (JSON)"
            intent={Intent.PRIMARY}
            loading={download.isPending && download.variables?.url === exchangeRoutes.bundle(projectId)}
            onClick={() => download.mutate({ url: exchangeRoutes.bundle(projectId), fallbackFileName: 'project.stratochron.json' })}
          />
          <Button
            icon={IconNames.GLOBE}
            text="Sites (GeoJSON)"
            loading={download.isPending && download.variables?.url === exchangeRoutes.sitesGeoJson(projectId)}
            onClick={() => download.mutate({ url: exchangeRoutes.sitesGeoJson(projectId), fallbackFileName: 'sites.geojson' })}
          />
        </div>
        <div className="sc-exchange-buttons">
          <span className={Classes.TEXT_MUTED}>Tables as CSV:</span>
          <ButtonGroup variant="outlined">
            {CSV_TABLES.map((table) => (
              <Button
                key={table}
                icon={IconNames.TH}
                text={CSV_TABLE_LABELS[table]}
                loading={download.isPending && download.variables?.url === exchangeRoutes.csv(projectId, table)}
                onClick={() => download.mutate({ url: exchangeRoutes.csv(projectId, table), fallbackFileName: `${table}.csv` })}
              />
            ))}
          </ButtonGroup>
        </div>
        {downloadError && (
          <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
            {downloadError}
          </Callout>
        )}
      </section>

      <section className="sc-section">
        <H5>Import a bundle as a new project</H5>
        <p className={Classes.TEXT_MUTED}>The file is checked in full first; nothing is written unless all of it is right. You become the new project's admin.</p>
        <div className="sc-exchange-buttons">
          <FormGroup label="Bundle file" labelFor="bundle-file" className="sc-exchange-file">
            <FileInput
              inputProps={{ id: 'bundle-file', accept: '.json,application/json' }}
              text={file ? file.name : 'Choose a .json bundle…'}
              hasSelection={file !== null}
              onInputChange={handleFile}
              fill
            />
          </FormGroup>
          <Button icon={IconNames.IMPORT} text="Import" intent={Intent.PRIMARY} disabled={!file} loading={importBundle.isPending} onClick={handleImport} />
        </div>
        {importError && (
          <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout sc-exchange-problems" title="The bundle was refused">
            {importError}
          </Callout>
        )}
        {importBundle.data && (
          <Callout intent={Intent.SUCCESS} icon={IconNames.TICK} className="sc-form-callout">
            Imported as <strong>{importBundle.data.name}</strong>.{' '}
            <Button
              variant="minimal"
              intent={Intent.SUCCESS}
              text="Open the new project"
              endIcon={IconNames.ARROW_RIGHT}
              onClick={() => importBundle.data && navigate(paths.project(importBundle.data.id))}
            />
          </Callout>
        )}
      </section>
    </div>
  );
}
