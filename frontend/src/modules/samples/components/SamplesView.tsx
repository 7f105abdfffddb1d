import { Button, Classes, InputGroup, Intent, NonIdealState, Section, SectionCard } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useMemo, useState, type ChangeEvent } from 'react';
import { ImportSamplesDialog } from '@/modules/import/components/ImportSamplesDialog';
import { useSampleMutations } from '@/modules/samples/hooks/sampleMutations';
import { DATING_METHOD_LABELS, SAMPLE_MATERIAL_LABELS } from '@/modules/samples/utils/sampleVocabulary';
import type { SampleRow, SiteDetail } from '@/modules/sites/utils/siteTypes';
import { DeleteAlert } from '@/modules/ui/components/DeleteAlert';
import { matchesTextFilter } from '@/modules/ui/utils/tableSort';
import { SampleDetailDialog } from './SampleDetailDialog';
import { SampleDialog } from './SampleDialog';
import { SamplesTable } from './SamplesTable';

export type SamplesViewProps = {
  site: SiteDetail;
  canEdit: boolean;
};

/** The samples tab: a filter, the samples table, and the add, edit, delete and import forms. */
export function SamplesView({ site, canEdit }: SamplesViewProps) {
  const [filter, setFilter] = useState('');
  const [editing, setEditing] = useState<SampleRow | 'new' | null>(null);
  const [deleting, setDeleting] = useState<SampleRow | null>(null);
  const [opened, setOpened] = useState<SampleRow | null>(null);
  const [importing, setImporting] = useState(false);
  const { remove } = useSampleMutations(site.project.id);
  const unitNames = useMemo(() => new Map(site.units.map((unit) => [unit.id, unit.name])), [site.units]);
  const shown = useMemo(
    () =>
      site.samples.filter((sample) =>
        matchesTextFilter(
          [sample.labCode, DATING_METHOD_LABELS[sample.method], SAMPLE_MATERIAL_LABELS[sample.material], unitNames.get(sample.unit.id), sample.notes],
          filter,
        ),
      ),
    [site.samples, unitNames, filter],
  );
  const handleFilterChange = (event: ChangeEvent<HTMLInputElement>) => setFilter(event.target.value);
  const handleDelete = () => {
    if (deleting) remove.mutate({ id: deleting.id }, { onSuccess: () => setDeleting(null) });
  };
  const handleCancelDelete = () => {
    remove.reset();
    setDeleting(null);
  };
  const canAdd = canEdit && site.units.length > 0;

  return (
    <Section
      title="Samples"
      compact
      rightElement={
        canAdd ? (
          <div className="sc-toolbar-actions">
            <Button icon={IconNames.IMPORT} text="Import CSV" variant="minimal" onClick={() => setImporting(true)} />
            <Button icon={IconNames.ADD} text="Add sample" variant="minimal" intent={Intent.PRIMARY} onClick={() => setEditing('new')} />
          </div>
        ) : undefined
      }
    >
      <SectionCard>
        <div className="sc-toolbar">
          <InputGroup
            leftIcon={IconNames.FILTER}
            placeholder="Filter by lab code, method, material, unit"
            value={filter}
            onChange={handleFilterChange}
            className="sc-filter-input"
            aria-label="Filter samples"
          />
          <span className={`${Classes.TEXT_MUTED} num`}>
            {shown.length} / {site.samples.length}
          </span>
        </div>
        {site.samples.length === 0 ? (
          <NonIdealState
            icon={IconNames.LAB_TEST}
            title="No samples yet"
            description={canAdd ? 'Add samples one by one or import a lab sheet.' : canEdit ? 'Add units to the column first.' : undefined}
          />
        ) : (
          <SamplesTable samples={shown} units={site.units} canEdit={canEdit} onEdit={setEditing} onDelete={setDeleting} onOpen={setOpened} />
        )}
      </SectionCard>
      {opened && (
        <SampleDetailDialog
          sample={opened}
          units={site.units}
          canEdit={canEdit}
          onEdit={(sample) => {
            setOpened(null);
            setEditing(sample);
          }}
          onClose={() => setOpened(null)}
        />
      )}
      {editing && <SampleDialog site={site} sample={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
      {importing && <ImportSamplesDialog site={site} onClose={() => setImporting(false)} />}
      <DeleteAlert
        what={deleting ? <>sample <strong className="num">{deleting.labCode}</strong></> : null}
        onConfirm={handleDelete}
        onCancel={handleCancelDelete}
        deleting={remove.isPending}
        error={remove.error}
      />
    </Section>
  );
}
