import { Button, ButtonGroup, Classes, HTMLTable, Intent, NonIdealState } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useMemo, useState } from 'react';
import type { SegmentRow, SiteRow } from '@/modules/projects/utils/projectTypes';
import { SortableColumnHeader } from '@/modules/ui/components/SortableColumnHeader';
import { nextSortState, sortRows, type SortState } from '@/modules/ui/utils/tableSort';

type SegmentSortKey = 'name' | 'startKm' | 'endKm' | 'lengthKm' | 'sites';

export type SegmentsTableProps = {
  segments: readonly SegmentRow[];
  sites: readonly SiteRow[];
  canEdit: boolean;
  onEdit: (segment: SegmentRow) => void;
  onDelete: (segment: SegmentRow) => void;
};

const formatKm = (km: number) => km.toFixed(1);

/** The project's segments with their along-strike extents, sortable by any column. */
export function SegmentsTable({ segments, sites, canEdit, onEdit, onDelete }: SegmentsTableProps) {
  const [sort, setSort] = useState<SortState<SegmentSortKey>>({ key: 'startKm', direction: 'ascending' });
  const siteCounts = useMemo(() => {
    const counts = new Map<string, number>();
    for (const site of sites) {
      if (site.segment) counts.set(site.segment.id, (counts.get(site.segment.id) ?? 0) + 1);
    }
    return counts;
  }, [sites]);
  const sorted = useMemo(
    () =>
      sortRows(
        segments,
        {
          name: (segment) => segment.name,
          startKm: (segment) => segment.startKm,
          endKm: (segment) => segment.endKm,
          lengthKm: (segment) => segment.endKm - segment.startKm,
          sites: (segment) => siteCounts.get(segment.id) ?? 0,
        },
        sort,
      ),
    [segments, siteCounts, sort],
  );
  const handleSort = (key: SegmentSortKey) => setSort((current) => nextSortState(current, key));

  if (segments.length === 0) {
    return <NonIdealState icon={IconNames.TIMELINE_LINE_CHART} title="No segments" description="Segments divide the fault along strike." />;
  }
  return (
    <HTMLTable compact striped className="sc-table">
      <thead>
        <tr>
          <SortableColumnHeader sortKey="name" sort={sort} onSort={handleSort}>Segment</SortableColumnHeader>
          <SortableColumnHeader sortKey="startKm" sort={sort} onSort={handleSort} numeric>From km</SortableColumnHeader>
          <SortableColumnHeader sortKey="endKm" sort={sort} onSort={handleSort} numeric>To km</SortableColumnHeader>
          <SortableColumnHeader sortKey="lengthKm" sort={sort} onSort={handleSort} numeric>Length km</SortableColumnHeader>
          <th className="num">Down-dip width km</th>
          <SortableColumnHeader sortKey="sites" sort={sort} onSort={handleSort} numeric>Sites</SortableColumnHeader>
          {canEdit && <th className="sc-actions-cell"><span className={Classes.TEXT_MUTED}>Edit</span></th>}
        </tr>
      </thead>
      <tbody>
        {sorted.map((segment) => (
          <tr key={segment.id}>
            <td title={segment.notes ?? undefined}>{segment.name}</td>
            <td className="num sc-numeric">{formatKm(segment.startKm)}</td>
            <td className="num sc-numeric">{formatKm(segment.endKm)}</td>
            <td className="num sc-numeric">{formatKm(segment.endKm - segment.startKm)}</td>
            <td className="num sc-numeric">{segment.downDipWidthKm == null ? '–' : formatKm(segment.downDipWidthKm)}</td>
            <td className="num sc-numeric">{siteCounts.get(segment.id) ?? 0}</td>
            {canEdit && (
              <td className="sc-actions-cell">
                <ButtonGroup variant="minimal">
                  <Button icon={IconNames.EDIT} size="small" aria-label={`Edit ${segment.name}`} onClick={() => onEdit(segment)} />
                  <Button icon={IconNames.TRASH} size="small" intent={Intent.DANGER} aria-label={`Delete ${segment.name}`} onClick={() => onDelete(segment)} />
                </ButtonGroup>
              </td>
            )}
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
