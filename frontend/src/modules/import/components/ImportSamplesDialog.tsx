import {
  Button,
  Callout,
  Classes,
  Collapse,
  Dialog,
  DialogBody,
  DialogFooter,
  FileInput,
  FormGroup,
  HTMLSelect,
  HTMLTable,
  Intent,
  Tag,
  TextArea,
} from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type ChangeEvent } from 'react';
import type { ImportSamplesMutation } from '@/gql/graphql';
import { AgeRangesValue, AgeValue } from '@/modules/ages/components/AgeValues';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { useImportSamples } from '@/modules/import/hooks/useImportSamples';
import {
  choicesInput,
  choiceValueOf,
  IGNORE,
  problemPlace,
  SOURCE_LABELS,
  UNCHOSEN,
  withChoice,
  type ChoiceValue,
  type ColumnChoices,
} from '@/modules/import/utils/columnChoices';
import { SAMPLE_IMPORT_COLUMN_SPECS, SAMPLE_IMPORT_COLUMNS, sampleImportTemplateCsv } from '@/modules/import/utils/template';
import { downloadText } from '@/modules/ui/utils/download';

type ImportResult = ImportSamplesMutation['importSamples'];

export type ImportSamplesDialogProps = {
  site: { id: string; name: string; project: { id: string } };
  onClose: () => void;
};

/**
 * Bulk import of a lab sheet: paste or choose a CSV, check it on the server row by row with a
 * calibrated preview, then write all rows in one go (or none).
 */
export function ImportSamplesDialog({ site, onClose }: ImportSamplesDialogProps) {
  const [csv, setCsv] = useState('');
  const [fileName, setFileName] = useState<string | null>(null);
  const [showColumns, setShowColumns] = useState(false);
  const [checked, setChecked] = useState<{ csv: string; choices: ColumnChoices; result: ImportResult } | null>(null);
  const [imported, setImported] = useState<ImportResult | null>(null);
  // Headers the user has given a field (or chosen to ignore) for this sheet; the server remembers
  // them for the project once the import is committed.
  const [choices, setChoices] = useState<ColumnChoices>({});
  const { check, commit } = useImportSamples(site.project.id);

  const result = checked?.csv === csv && checked.choices === choices ? checked.result : null;
  // The columns stay on screen while a changed choice is re-checked.
  const shownColumns = checked?.csv === csv ? checked.result.columns : null;
  const canCommit = result !== null && result.errors.length === 0 && result.rowCount > 0 && !commit.isPending;
  const requestError = formErrorOf(check.error ?? commit.error, []);

  const handleTextChange = (event: ChangeEvent<HTMLTextAreaElement>) => {
    setCsv(event.target.value);
    setFileName(null);
  };
  const handleFileChange = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    if (!file) return;
    setCsv(await file.text());
    setFileName(file.name);
  };
  const handleTemplate = () => downloadText('stratochron-samples-template.csv', sampleImportTemplateCsv());
  const runCheck = (nextChoices: ColumnChoices) => {
    commit.reset();
    check.mutate(
      { siteId: site.id, csv, columnChoices: choicesInput(nextChoices) },
      { onSuccess: (checkedResult) => setChecked({ csv, choices: nextChoices, result: checkedResult }) },
    );
  };
  const handleCheck = () => runCheck(choices);
  const handleChoice = (header: string, value: ChoiceValue) => {
    const next = withChoice(choices, header, value);
    setChoices(next);
    runCheck(next);
  };
  const handleCommit = () => {
    commit.mutate(
      { input: { siteId: site.id, csv, commit: true, columnChoices: choicesInput(choices) } },
      {
        onSuccess: ({ importSamples }) => {
          if (importSamples.committed) setImported(importSamples);
          else setChecked({ csv, choices, result: importSamples });
        },
      },
    );
  };

  return (
    <Dialog title={`Import samples into ${site.name}`} icon={IconNames.IMPORT} isOpen onClose={onClose} style={{ width: 900 }}>
      <DialogBody>
        {imported ? (
          <Callout intent={Intent.SUCCESS} icon={IconNames.TICK_CIRCLE} title="Imported">
            <span className="num">{imported.rowCount}</span> samples were written to {site.name}.
          </Callout>
        ) : (
          <>
            <div className="sc-import-sources">
              <FileInput
                text={fileName ?? 'Choose a CSV file…'}
                buttonText="Browse"
                inputProps={{ accept: '.csv,text/csv' }}
                onInputChange={handleFileChange}
              />
              <Button icon={IconNames.DOWNLOAD} text="Download template" variant="minimal" onClick={handleTemplate} />
              <Button
                icon={showColumns ? IconNames.CHEVRON_UP : IconNames.CHEVRON_DOWN}
                text="Columns"
                variant="minimal"
                onClick={() => setShowColumns((open) => !open)}
              />
            </div>
            <Collapse isOpen={showColumns}>
              <HTMLTable compact className="sc-table sc-table-fill sc-import-columns">
                <thead>
                  <tr>
                    <th>Column</th>
                    <th>Needed for</th>
                    <th>Holds</th>
                  </tr>
                </thead>
                <tbody>
                  {SAMPLE_IMPORT_COLUMN_SPECS.map((spec) => (
                    <tr key={spec.column}>
                      <td className="num">{spec.column}</td>
                      <td>{spec.requirement}</td>
                      <td className={Classes.TEXT_SMALL}>{spec.description}</td>
                    </tr>
                  ))}
                </tbody>
              </HTMLTable>
            </Collapse>
            <FormGroup label="Sheet" labelFor="import-csv" helperText="Paste the CSV here, or choose a file above. The first line names the columns.">
              <TextArea id="import-csv" className="num sc-csv-input" value={csv} onChange={handleTextChange} rows={8} fill spellCheck={false} />
            </FormGroup>
            {shownColumns && shownColumns.some((column) => column.source !== 'NAME') && (
              <ColumnChoiceTable columns={shownColumns} choices={choices} onChoice={handleChoice} disabled={check.isPending} />
            )}
            {requestError && (
              <Callout intent={Intent.DANGER} icon={IconNames.ERROR} compact className="sc-form-callout">
                {requestError}
              </Callout>
            )}
            {result && <ImportCheckResult result={result} />}
          </>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          imported ? (
            <Button intent={Intent.PRIMARY} text="Done" onClick={onClose} />
          ) : (
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button icon={IconNames.ENDORSED} text="Check sheet" onClick={handleCheck} loading={check.isPending} disabled={csv.trim() === ''} />
              <Button
                intent={Intent.PRIMARY}
                icon={IconNames.IMPORT}
                text={result && result.errors.length === 0 ? `Import ${result.rowCount} samples` : 'Import'}
                onClick={handleCommit}
                loading={commit.isPending}
                disabled={!canCommit}
              />
            </>
          )
        }
      >
        {!imported && !result && <span className={Classes.TEXT_MUTED}>Check the sheet first; nothing is written until you import.</span>}
      </DialogFooter>
    </Dialog>
  );
}

type ImportCheckResultProps = { result: ImportResult };

/** The server's verdict on a sheet: its row-by-row problems and the calibrated preview of the good rows. */
function ImportCheckResult({ result }: ImportCheckResultProps) {
  const ok = result.errors.length === 0;
  return (
    <div className="sc-import-result">
      <Callout intent={ok ? Intent.SUCCESS : Intent.DANGER} icon={ok ? IconNames.TICK : IconNames.ERROR} compact className="sc-form-callout">
        <span className="num">{result.rowCount}</span> rows read;{' '}
        {ok ? (
          'no problems. Nothing is written until you import.'
        ) : (
          <>
            <span className="num">{result.errors.length}</span> {result.errors.length === 1 ? 'problem' : 'problems'} to fix before anything can be
            imported.
          </>
        )}
      </Callout>
      {!ok && (
        <HTMLTable compact striped className="sc-table sc-table-fill" data-testid="import-problems">
          <thead>
            <tr>
              <th>Where</th>
              <th>Field</th>
              <th>Problem</th>
            </tr>
          </thead>
          <tbody>
            {result.errors.map((error, index) => (
              <tr key={`${error.row}-${error.field}-${index}`}>
                <td className="num sc-nowrap">{problemPlace(error)}</td>
                <td className="num">{error.field}</td>
                <td>{error.message}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      {result.preview.length > 0 && (
        <>
          <h4 className="sc-subheading">Preview</h4>
          <HTMLTable compact striped className="sc-table sc-table-fill">
            <thead>
              <tr>
                <th className="sc-numeric">Row</th>
                <th>Lab code</th>
                <th>Unit</th>
                <th className="sc-numeric">Median</th>
                <th>95.4 % ranges</th>
                <th>Warnings</th>
              </tr>
            </thead>
            <tbody>
              {result.preview.map((row) => (
                <tr key={row.row}>
                  <td className="num sc-numeric">{row.row}</td>
                  <td className="num">{row.labCode}</td>
                  <td>{row.unitName}</td>
                  <td className="sc-numeric">
                    <AgeValue calBp={row.medianCalBp} />
                  </td>
                  <td>
                    <AgeRangesValue ranges={row.hpd95} />
                  </td>
                  <td>
                    {row.warnings.map((warning) => (
                      <Tag key={warning} minimal intent={Intent.WARNING} className="sc-wrap-tag">
                        {warning}
                      </Tag>
                    ))}
                  </td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </>
      )}
    </div>
  );
}

type ColumnChoiceTableProps = {
  columns: ImportResult['columns'];
  choices: ColumnChoices;
  onChoice: (header: string, value: ChoiceValue) => void;
  disabled: boolean;
};

/**
 * The sheet's headers with the field each is read as. A header that is not one of our field names
 * gets a field chosen here (or is ignored); the choice is checked at once and, once the sheet is
 * imported, remembered for the project's next sheets.
 */
function ColumnChoiceTable({ columns, choices, onChoice, disabled }: ColumnChoiceTableProps) {
  const unknown = columns.filter((column) => choiceValueOf(column, choices) === UNCHOSEN).length;
  return (
    <div className="sc-import-mapping" data-testid="import-column-choices">
      <h4 className="sc-subheading">Columns of this sheet</h4>
      <p className={Classes.TEXT_SMALL}>
        {unknown > 0
          ? `${unknown} ${unknown === 1 ? 'column is' : 'columns are'} not one of our field names: choose what each holds, or ignore it. `
          : 'Every column is read. '}
        Choices are remembered for this project when the sheet is imported.
      </p>
      <HTMLTable compact striped className="sc-table sc-table-fill">
        <thead>
          <tr>
            <th>Header in the sheet</th>
            <th>Read as</th>
            <th>How</th>
          </tr>
        </thead>
        <tbody>
          {columns.map((column) => {
            const value = choiceValueOf(column, choices);
            const source = column.header in choices ? 'CHOSEN' : column.source;
            return (
              <tr key={column.header}>
                <td className="num">{column.header}</td>
                <td>
                  <HTMLSelect
                    aria-label={`Field held by column ${column.header}`}
                    value={value}
                    disabled={disabled}
                    onChange={(event) => onChoice(column.header, event.target.value as ChoiceValue)}
                  >
                    {value === UNCHOSEN && <option value={UNCHOSEN}>Choose a field…</option>}
                    {SAMPLE_IMPORT_COLUMNS.map((field) => (
                      <option key={field} value={field}>
                        {field}
                      </option>
                    ))}
                    <option value={IGNORE}>Ignore this column</option>
                  </HTMLSelect>
                </td>
                <td>
                  <Tag minimal intent={value === UNCHOSEN ? Intent.WARNING : Intent.NONE}>
                    {value === UNCHOSEN ? SOURCE_LABELS.UNKNOWN : SOURCE_LABELS[source]}
                  </Tag>
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}
