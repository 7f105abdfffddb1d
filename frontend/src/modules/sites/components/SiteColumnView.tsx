import { Button, ButtonGroup, Classes, HTMLTable, Intent, NonIdealState, Section, SectionCard, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useMemo, useState } from 'react';
import { ColumnLegend } from '@/modules/column/components/ColumnLegend';
import { SiteColumnChart, type ChartSample, type ChartUnit } from '@/modules/column/components/SiteColumnChart';
import type { ColumnEventHorizon } from '@/modules/column/utils/columnLayout';
import { FACIES_STYLES } from '@/modules/column/utils/facies';
import { SampleDialog } from '@/modules/samples/components/SampleDialog';
import { sampleSummary } from '@/modules/samples/utils/sampleSummary';
import { isMarineCurve } from '@/modules/samples/utils/sampleVocabulary';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { useEventHorizonMutations, useUnitMutations } from '@/modules/sites/hooks/columnMutations';
import type { EventHorizonRow, SampleRow, SiteDetail, UnitRow } from '@/modules/sites/utils/siteTypes';
import { DeleteAlert } from '@/modules/ui/components/DeleteAlert';
import { EventHorizonDialog } from './EventHorizonDialog';
import { UnitDialog } from './UnitDialog';

export type SiteColumnViewProps = {
  site: SiteDetail;
  canEdit: boolean;
};

/** The column tab: the drawing on the left, the units and event horizons with their forms on the right. */
export function SiteColumnView({ site, canEdit }: SiteColumnViewProps) {
  const projectId = site.project.id;
  const { age } = useAgeScale();
  const [editingUnit, setEditingUnit] = useState<UnitRow | 'new' | null>(null);
  const [insertingNextTo, setInsertingNextTo] = useState<{ unit: UnitRow; side: 'above' | 'below' } | null>(null);
  const [deletingUnit, setDeletingUnit] = useState<UnitRow | null>(null);
  const [editingHorizon, setEditingHorizon] = useState<EventHorizonRow | 'new' | null>(null);
  const [deletingHorizon, setDeletingHorizon] = useState<EventHorizonRow | null>(null);
  const [editingSample, setEditingSample] = useState<SampleRow | null>(null);
  const unitMutations = useUnitMutations(projectId);
  const horizonMutations = useEventHorizonMutations(projectId);

  const unitsById = useMemo(() => new Map(site.units.map((unit) => [unit.id, unit])), [site.units]);
  const chartUnits = useMemo<ChartUnit[]>(() => site.units.map((unit) => ({ ...unit })), [site.units]);
  const chartHorizons = useMemo<ColumnEventHorizon[]>(
    () =>
      site.eventHorizons.map((horizon) => ({
        id: horizon.id,
        name: horizon.name,
        quality: horizon.quality,
        unitBelowId: horizon.unitBelow.id,
        unitAboveId: horizon.unitAbove.id,
      })),
    [site.eventHorizons],
  );
  const chartSamples = useMemo<ChartSample[]>(
    () =>
      site.samples.map((sample) => ({
        id: sample.id,
        labCode: sample.labCode,
        unitId: sample.unit.id,
        depthM: sample.depthM ?? null,
        excluded: sample.excluded,
        method: sample.method,
        marine: isMarineCurve(sample.curve),
        title: sampleSummary(sample, age),
      })),
    [site.samples, age],
  );
  const unitsTopDown = useMemo(() => [...site.units].sort((a, b) => b.position - a.position), [site.units]);
  const horizonsTopDown = useMemo(
    () =>
      [...site.eventHorizons].sort(
        (a, b) => (unitsById.get(b.unitBelow.id)?.position ?? 0) - (unitsById.get(a.unitBelow.id)?.position ?? 0),
      ),
    [site.eventHorizons, unitsById],
  );

  const handleUnitClick = (unitId: string) => setEditingUnit(unitsById.get(unitId) ?? null);
  const handleHorizonClick = (horizonId: string) => setEditingHorizon(site.eventHorizons.find((horizon) => horizon.id === horizonId) ?? null);
  const handleSampleClick = (sampleId: string) => setEditingSample(site.samples.find((sample) => sample.id === sampleId) ?? null);
  const handleDeleteUnit = () => {
    if (deletingUnit) unitMutations.remove.mutate({ id: deletingUnit.id }, { onSuccess: () => setDeletingUnit(null) });
  };
  const handleDeleteHorizon = () => {
    if (deletingHorizon) horizonMutations.remove.mutate({ id: deletingHorizon.id }, { onSuccess: () => setDeletingHorizon(null) });
  };
  const handleCancelUnitDelete = () => {
    unitMutations.remove.reset();
    setDeletingUnit(null);
  };
  const handleCancelHorizonDelete = () => {
    horizonMutations.remove.reset();
    setDeletingHorizon(null);
  };

  return (
    <div className="sc-column-layout">
      <Section title="Column" compact className="sc-column-drawing" subtitle="drawn to scale">
        <SectionCard>
          {site.units.length === 0 ? (
            <NonIdealState
              icon={IconNames.LAYERS}
              title="No units yet"
              description={canEdit ? 'Add the units of the column from its base upwards.' : 'Nobody has logged this column yet.'}
            />
          ) : (
            <>
              <SiteColumnChart
                units={chartUnits}
                eventHorizons={chartHorizons}
                samples={chartSamples}
                onUnitClick={canEdit ? handleUnitClick : undefined}
                onEventHorizonClick={canEdit ? handleHorizonClick : undefined}
                onSampleClick={canEdit ? handleSampleClick : undefined}
              />
              <ColumnLegend facies={site.units.map((unit) => unit.facies)} />
            </>
          )}
        </SectionCard>
      </Section>

      <div className="sc-column-side">
        <Section
          title="Units"
          compact
          subtitle="youngest first"
          rightElement={canEdit ? <Button icon={IconNames.ADD} text="Add unit" variant="minimal" intent={Intent.PRIMARY} onClick={() => setEditingUnit('new')} /> : undefined}
        >
          <SectionCard padded={false}>
            {site.units.length === 0 ? (
              <p className={`${Classes.TEXT_MUTED} sc-empty-note`}>No units yet.</p>
            ) : (
            <HTMLTable compact striped className="sc-table sc-table-fill">
              <thead>
                <tr>
                  <th className="sc-numeric">Pos.</th>
                  <th>Unit</th>
                  <th>Facies</th>
                  <th className="sc-numeric">Top m</th>
                  <th className="sc-numeric">Base m</th>
                  {canEdit && <th className="sc-actions-cell" />}
                </tr>
              </thead>
              <tbody>
                {unitsTopDown.map((unit) => (
                  <tr key={unit.id}>
                    <td className="num sc-numeric">{unit.position}</td>
                    <td title={unit.notes ?? undefined}>{unit.name}</td>
                    <td>
                      <span className="sc-swatch" style={{ background: FACIES_STYLES[unit.facies].ground }} />
                      {FACIES_STYLES[unit.facies].label}
                    </td>
                    <td className="num sc-numeric">{unit.topDepthM.toFixed(2)}</td>
                    <td className="num sc-numeric">{unit.baseDepthM.toFixed(2)}</td>
                    {canEdit && (
                      <td className="sc-actions-cell">
                        <ButtonGroup variant="minimal">
                          <Button
                            icon={IconNames.ADD_ROW_TOP}
                            size="small"
                            aria-label={`Insert a unit above ${unit.name}`}
                            title={`Insert a unit above ${unit.name}`}
                            onClick={() => setInsertingNextTo({ unit, side: 'above' })}
                          />
                          <Button
                            icon={IconNames.ADD_ROW_BOTTOM}
                            size="small"
                            aria-label={`Insert a unit below ${unit.name}`}
                            title={`Insert a unit below ${unit.name}`}
                            onClick={() => setInsertingNextTo({ unit, side: 'below' })}
                          />
                          <Button icon={IconNames.EDIT} size="small" aria-label={`Edit ${unit.name}`} onClick={() => setEditingUnit(unit)} />
                          <Button icon={IconNames.TRASH} size="small" intent={Intent.DANGER} aria-label={`Delete ${unit.name}`} onClick={() => setDeletingUnit(unit)} />
                        </ButtonGroup>
                      </td>
                    )}
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
            )}
          </SectionCard>
        </Section>

        <Section
          title="Event horizons"
          compact
          className="sc-section"
          rightElement={
            canEdit && site.units.length >= 2 ? (
              <Button icon={IconNames.ADD} text="Add event horizon" variant="minimal" intent={Intent.PRIMARY} onClick={() => setEditingHorizon('new')} />
            ) : undefined
          }
        >
          <SectionCard padded={false}>
            {site.eventHorizons.length === 0 ? (
              <NonIdealState icon={IconNames.FLASH} title="No event horizons" description="An event horizon sits on the contact between two units." />
            ) : (
              <HTMLTable compact striped className="sc-table sc-table-fill">
                <thead>
                  <tr>
                    <th>Event</th>
                    <th>Contact</th>
                    <th className="sc-numeric">Depth m</th>
                    <th className="sc-numeric">Q</th>
                    <th>Evidence</th>
                    {canEdit && <th className="sc-actions-cell" />}
                  </tr>
                </thead>
                <tbody>
                  {horizonsTopDown.map((horizon) => {
                    const below = unitsById.get(horizon.unitBelow.id);
                    const above = unitsById.get(horizon.unitAbove.id);
                    return (
                      <tr key={horizon.id}>
                        <td title={horizon.notes ?? undefined}>
                          <strong>{horizon.name}</strong>
                        </td>
                        <td className={Classes.TEXT_SMALL}>
                          {below?.name ?? '?'} <span className={Classes.TEXT_MUTED}>under</span> {above?.name ?? '?'}
                        </td>
                        <td className="num sc-numeric">{below ? below.topDepthM.toFixed(2) : '–'}</td>
                        <td className="num sc-numeric">{horizon.quality}</td>
                        <td>
                          <div className="sc-tag-row">
                            {horizon.evidence.map((tag) => (
                              <Tag key={tag} minimal>
                                {tag}
                              </Tag>
                            ))}
                          </div>
                        </td>
                        {canEdit && (
                          <td className="sc-actions-cell">
                            <ButtonGroup variant="minimal">
                              <Button icon={IconNames.EDIT} size="small" aria-label={`Edit ${horizon.name}`} onClick={() => setEditingHorizon(horizon)} />
                              <Button
                                icon={IconNames.TRASH}
                                size="small"
                                intent={Intent.DANGER}
                                aria-label={`Delete ${horizon.name}`}
                                onClick={() => setDeletingHorizon(horizon)}
                              />
                            </ButtonGroup>
                          </td>
                        )}
                      </tr>
                    );
                  })}
                </tbody>
              </HTMLTable>
            )}
          </SectionCard>
        </Section>
      </div>

      {editingUnit && (
        <UnitDialog projectId={projectId} siteId={site.id} units={site.units} unit={editingUnit === 'new' ? null : editingUnit} onClose={() => setEditingUnit(null)} />
      )}
      {insertingNextTo && (
        <UnitDialog
          projectId={projectId}
          siteId={site.id}
          units={site.units}
          unit={null}
          insertNextTo={insertingNextTo}
          onClose={() => setInsertingNextTo(null)}
        />
      )}
      {editingHorizon && (
        <EventHorizonDialog
          projectId={projectId}
          siteId={site.id}
          units={site.units}
          eventHorizon={editingHorizon === 'new' ? null : editingHorizon}
          onClose={() => setEditingHorizon(null)}
        />
      )}
      {editingSample && <SampleDialog site={site} sample={editingSample} onClose={() => setEditingSample(null)} />}
      <DeleteAlert
        what={deletingUnit ? <>unit <strong>{deletingUnit.name}</strong></> : null}
        onConfirm={handleDeleteUnit}
        onCancel={handleCancelUnitDelete}
        deleting={unitMutations.remove.isPending}
        error={unitMutations.remove.error}
      />
      <DeleteAlert
        what={deletingHorizon ? <>event horizon <strong>{deletingHorizon.name}</strong></> : null}
        onConfirm={handleDeleteHorizon}
        onCancel={handleCancelHorizonDelete}
        deleting={horizonMutations.remove.isPending}
        error={horizonMutations.remove.error}
      />
    </div>
  );
}
