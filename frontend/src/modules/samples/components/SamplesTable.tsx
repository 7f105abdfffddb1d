import { Button, Icon, Intent, Menu, MenuItem } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { Cell, Column, ColumnHeaderCell, Table, TruncatedFormat } from '@blueprintjs/table';
import { useMemo, useState, type ReactNode } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { formatRadiocarbonAge } from '@/modules/ages/utils/formatAge';
import { fitColumnWidth } from '@/modules/samples/utils/columnWidth';
import { AGE_RELATION_LABELS, CURVE_LABELS, DATING_METHOD_LABELS, SAMPLE_MATERIAL_LABELS } from '@/modules/samples/utils/sampleVocabulary';
import type { SampleRow, UnitRow } from '@/modules/sites/utils/siteTypes';
import { sortRows, type SortState, type SortValue } from '@/modules/ui/utils/tableSort';

type SampleSortKey =
  | 'labCode'
  | 'method'
  | 'material'
  | 'unit'
  | 'ageRelation'
  | 'depth'
  | 'c14Age'
  | 'curve'
  | 'deltaR'
  | 'median'
  | 'hpd95'
  | 'warnings'
  | 'excluded';

type SampleColumn = {
  key: SampleSortKey;
  name: string;
  /** The narrowest and widest the column may be; its width between them follows its content. */
  width: number;
  maxWidth?: number;
  className?: string;
  sortValue: (sample: SampleRow) => SortValue;
  text: (sample: SampleRow) => ReactNode;
};

export type SamplesTableProps = {
  samples: readonly SampleRow[];
  units: readonly UnitRow[];
  canEdit: boolean;
  onEdit: (sample: SampleRow) => void;
  onDelete: (sample: SampleRow) => void;
  /** Show a sample whole (its lab code is a link to this). */
  onOpen: (sample: SampleRow) => void;
};

const ROW_HEIGHT = 22;
const HEADER_HEIGHT = 30;
const ACTIONS_WIDTH = 64;

const labCodeOf = (sample: SampleRow) => sample.labCode;
const medianOf = (sample: SampleRow) => sample.calibration?.medianCalBp;
const oldest95Of = (sample: SampleRow) => sample.calibration?.hpd95.reduce((oldest, hpd) => Math.max(oldest, hpd.olderCalBp), -Infinity);
const warningsOf = (sample: SampleRow) => [...(sample.calibrationError ? [sample.calibrationError] : []), ...(sample.calibration?.warnings ?? [])];

/**
 * The site's samples with their lab values and calibrated ages (median and 95.4 % ranges in
 * the chosen age scale). Columns sort from their header menu and can be resized.
 */
export function SamplesTable({ samples, units, canEdit, onEdit, onDelete, onOpen }: SamplesTableProps) {
  const { age, ranges, scale } = useAgeScale();
  const [sort, setSort] = useState<SortState<SampleSortKey>>({ key: 'depth', direction: 'ascending' });
  const unitsById = useMemo(() => new Map(units.map((unit) => [unit.id, unit])), [units]);

  const columns = useMemo<SampleColumn[]>(
    () => [
      { key: 'labCode', name: 'Lab code', width: 110, className: 'num', sortValue: labCodeOf, text: labCodeOf },
      { key: 'method', name: 'Method', width: 92, sortValue: (s) => s.method, text: (s) => DATING_METHOD_LABELS[s.method] },
      { key: 'material', name: 'Material', width: 124, sortValue: (s) => s.material, text: (s) => SAMPLE_MATERIAL_LABELS[s.material] },
      {
        key: 'unit',
        name: 'Unit',
        width: 140,
        sortValue: (s) => unitsById.get(s.unit.id)?.position,
        text: (s) => unitsById.get(s.unit.id)?.name ?? '?',
      },
      {
        key: 'ageRelation',
        name: 'Age relation',
        width: 120,
        sortValue: (s) => s.ageRelation,
        text: (s) => AGE_RELATION_LABELS[s.ageRelation].replace(/ \(.*\)$/, ''),
      },
      {
        key: 'depth',
        name: 'Depth m',
        width: 72,
        className: 'num sc-numeric',
        sortValue: (s) => s.depthM,
        text: (s) => (s.depthM == null ? '–' : s.depthM.toFixed(2)),
      },
      {
        key: 'c14Age',
        name: '14C yr BP',
        width: 96,
        className: 'num sc-numeric',
        sortValue: (s) => s.c14Age,
        text: (s) => (s.c14Age != null && s.c14Error != null ? formatRadiocarbonAge(s.c14Age, s.c14Error) : '–'),
      },
      { key: 'curve', name: 'Curve', width: 72, sortValue: (s) => s.curve, text: (s) => (s.curve ? CURVE_LABELS[s.curve] : '–') },
      {
        key: 'deltaR',
        name: 'Delta-R',
        width: 80,
        className: 'num sc-numeric',
        sortValue: (s) => s.deltaR,
        text: (s) => (s.deltaR == null ? '–' : `${Math.round(s.deltaR)} ± ${Math.round(s.deltaRError ?? 0)}`),
      },
      {
        key: 'median',
        name: 'Median',
        width: 100,
        className: 'num sc-numeric',
        sortValue: medianOf,
        text: (s) => (s.calibration ? age(s.calibration.medianCalBp) : '–'),
      },
      {
        key: 'hpd95',
        name: '95.4 % ranges',
        width: 160,
        maxWidth: 420,
        className: 'num',
        sortValue: oldest95Of,
        text: (s) => (s.calibration ? ranges(s.calibration.hpd95) : '–'),
      },
      {
        key: 'warnings',
        name: 'Warnings',
        width: 100,
        maxWidth: 320,
        sortValue: (s) => warningsOf(s).length || null,
        text: (s) => warningsOf(s).join('; '),
      },
      {
        key: 'excluded',
        name: 'Excluded',
        width: 80,
        maxWidth: 240,
        sortValue: (s) => (s.excluded ? 1 : null),
        text: (s) => (s.excluded ? (s.exclusionReason ?? 'yes') : ''),
      },
    ],
    [unitsById, age, ranges],
  );

  const sorted = useMemo(() => {
    const sortValues = Object.fromEntries(columns.map((column) => [column.key, column.sortValue])) as Record<SampleSortKey, (sample: SampleRow) => SortValue>;
    return sortRows(samples, sortValues, sort);
  }, [samples, columns, sort]);

  const headerRenderer = (column: SampleColumn) => () => {
    const active = sort.key === column.key;
    const menuRenderer = () => (
      <Menu>
        <MenuItem icon={IconNames.SORT_ASC} text="Sort ascending" onClick={() => setSort({ key: column.key, direction: 'ascending' })} />
        <MenuItem icon={IconNames.SORT_DESC} text="Sort descending" onClick={() => setSort({ key: column.key, direction: 'descending' })} />
      </Menu>
    );
    const nameRenderer = (name: string) => (
      <span className="sc-table-header-name">
        {name}
        {active && <Icon icon={sort.direction === 'ascending' ? IconNames.CARET_UP : IconNames.CARET_DOWN} size={12} />}
      </span>
    );
    return <ColumnHeaderCell name={column.name} menuRenderer={menuRenderer} nameRenderer={nameRenderer} />;
  };

  const cellRenderer = (column: SampleColumn) => (rowIndex: number) => {
    const sample = sorted[rowIndex];
    if (!sample) return <Cell />;
    if (column.key === 'labCode') {
      return (
        <Cell interactive className="num">
          <button type="button" className="sc-link-button" onClick={() => onOpen(sample)} aria-label={`Open sample ${sample.labCode}`}>
            {sample.labCode}
          </button>
        </Cell>
      );
    }
    const isWarning = column.key === 'warnings' && warningsOf(sample).length > 0;
    const intent = column.key === 'warnings' && sample.calibrationError ? Intent.DANGER : isWarning ? Intent.WARNING : Intent.NONE;
    return (
      <Cell className={`${column.className ?? ''} ${sample.excluded ? 'sc-cell-excluded' : ''}`} intent={intent}>
        <TruncatedFormat detectTruncation>{String(column.text(sample) ?? '')}</TruncatedFormat>
      </Cell>
    );
  };

  const actionsRenderer = (rowIndex: number) => {
    const sample = sorted[rowIndex];
    if (!sample) return <Cell />;
    return (
      <Cell interactive className="sc-cell-actions">
        <Button icon={IconNames.EDIT} size="small" variant="minimal" aria-label={`Edit ${sample.labCode}`} onClick={() => onEdit(sample)} />
        <Button icon={IconNames.TRASH} size="small" variant="minimal" intent={Intent.DANGER} aria-label={`Delete ${sample.labCode}`} onClick={() => onDelete(sample)} />
      </Cell>
    );
  };

  const columnWidths = useMemo(
    () => [
      ...(canEdit ? [ACTIONS_WIDTH] : []),
      ...columns.map((column) => fitColumnWidth(column.name, samples.map((sample) => String(column.text(sample) ?? '')), column.width, column.maxWidth ?? Math.max(column.width, 200))),
    ],
    [canEdit, columns, samples],
  );
  const height = Math.min(560, HEADER_HEIGHT + Math.max(sorted.length, 1) * ROW_HEIGHT + 16);
  return (
    <div className="sc-samples-table" style={{ height }}>
      <Table
        numRows={sorted.length}
        defaultRowHeight={ROW_HEIGHT}
        columnWidths={columnWidths}
        enableRowHeader={false}
        enableColumnResizing
        enableFocusedCell={false}
        numFrozenColumns={canEdit ? 2 : 1}
        cellRendererDependencies={[sorted, scale, canEdit, onOpen]}
      >
        {[
          ...(canEdit ? [<Column key="actions" name="" cellRenderer={actionsRenderer} />] : []),
          ...columns.map((column) => (
            <Column key={column.key} name={column.name} columnHeaderCellRenderer={headerRenderer(column)} cellRenderer={cellRenderer(column)} />
          )),
        ]}
      </Table>
    </div>
  );
}
