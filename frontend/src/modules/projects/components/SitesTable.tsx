import { Button, ButtonGroup, Classes, HTMLSelect, HTMLTable, InputGroup, Intent, NonIdealState, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useMemo, useState, type ChangeEvent } from 'react';
import { Link } from 'react-router-dom';
import type { SiteKind } from '@/gql/graphql';
import { paths } from '@/app/paths';
import type { SiteRow } from '@/modules/projects/utils/projectTypes';
import { SITE_KIND_LABELS, SITE_KINDS } from '@/modules/projects/utils/siteForm';
import { SortableColumnHeader } from '@/modules/ui/components/SortableColumnHeader';
import { matchesTextFilter, nextSortState, sortRows, type SortState } from '@/modules/ui/utils/tableSort';

type SiteSortKey = 'name' | 'kind' | 'segment' | 'alongStrikeKm' | 'latitude' | 'longitude' | 'height' | 'events' | 'samples';

export type SitesTableProps = {
  projectId: string;
  sites: readonly SiteRow[];
  canEdit: boolean;
  onEdit: (site: SiteRow) => void;
  onDelete: (site: SiteRow) => void;
};

/** Elevation for land sites, water depth (negative) for cores: one sortable height column. */
function heightOf(site: SiteRow): number | null {
  if (site.waterDepthM !== null && site.waterDepthM !== undefined) return -site.waterDepthM;
  return site.elevationM ?? null;
}

const SORT_VALUES = {
  name: (site: SiteRow) => site.name,
  kind: (site: SiteRow) => SITE_KIND_LABELS[site.kind],
  segment: (site: SiteRow) => site.segment?.name,
  alongStrikeKm: (site: SiteRow) => site.alongStrikeKm,
  latitude: (site: SiteRow) => site.latitude,
  longitude: (site: SiteRow) => site.longitude,
  height: heightOf,
  events: (site: SiteRow) => site.eventHorizons.length,
  samples: (site: SiteRow) => site.samples.length,
};

/** The project's sites with a text and kind filter, sortable by any column. */
export function SitesTable({ projectId, sites, canEdit, onEdit, onDelete }: SitesTableProps) {
  const [sort, setSort] = useState<SortState<SiteSortKey>>({ key: 'alongStrikeKm', direction: 'ascending' });
  const [filter, setFilter] = useState('');
  const [kind, setKind] = useState<SiteKind | ''>('');
  const shown = useMemo(
    () =>
      sortRows(
        sites.filter(
          (site) =>
            (kind === '' || site.kind === kind) &&
            matchesTextFilter([site.name, SITE_KIND_LABELS[site.kind], site.segment?.name, site.notes], filter),
        ),
        SORT_VALUES,
        sort,
      ),
    [sites, kind, filter, sort],
  );
  const handleSort = (key: SiteSortKey) => setSort((current) => nextSortState(current, key));
  const handleFilterChange = (event: ChangeEvent<HTMLInputElement>) => setFilter(event.target.value);
  const handleKindChange = (event: ChangeEvent<HTMLSelectElement>) => setKind(event.target.value as SiteKind | '');

  return (
    <div className="sc-table-block">
      <div className="sc-toolbar">
        <InputGroup
          leftIcon={IconNames.FILTER}
          placeholder="Filter by name, segment, notes"
          value={filter}
          onChange={handleFilterChange}
          className="sc-filter-input"
          aria-label="Filter sites"
        />
        <HTMLSelect value={kind} onChange={handleKindChange} aria-label="Site kind">
          <option value="">All kinds</option>
          {SITE_KINDS.map((siteKind) => (
            <option key={siteKind} value={siteKind}>
              {SITE_KIND_LABELS[siteKind]}
            </option>
          ))}
        </HTMLSelect>
        <span className={`${Classes.TEXT_MUTED} num`}>
          {shown.length} / {sites.length}
        </span>
      </div>
      {shown.length === 0 ? (
        <NonIdealState icon={IconNames.MAP_MARKER} title={sites.length === 0 ? 'No sites yet' : 'No site matches the filter'} />
      ) : (
        <HTMLTable compact striped interactive className="sc-table sc-table-fill">
          <thead>
            <tr>
              <SortableColumnHeader sortKey="name" sort={sort} onSort={handleSort}>Site</SortableColumnHeader>
              <SortableColumnHeader sortKey="kind" sort={sort} onSort={handleSort}>Kind</SortableColumnHeader>
              <SortableColumnHeader sortKey="segment" sort={sort} onSort={handleSort}>Segment</SortableColumnHeader>
              <SortableColumnHeader sortKey="alongStrikeKm" sort={sort} onSort={handleSort} numeric>Along strike km</SortableColumnHeader>
              <SortableColumnHeader sortKey="latitude" sort={sort} onSort={handleSort} numeric>Lat °</SortableColumnHeader>
              <SortableColumnHeader sortKey="longitude" sort={sort} onSort={handleSort} numeric>Lon °</SortableColumnHeader>
              <SortableColumnHeader sortKey="height" sort={sort} onSort={handleSort} numeric>Elev. m</SortableColumnHeader>
              <SortableColumnHeader sortKey="events" sort={sort} onSort={handleSort} numeric>Events</SortableColumnHeader>
              <SortableColumnHeader sortKey="samples" sort={sort} onSort={handleSort} numeric>Samples</SortableColumnHeader>
              {canEdit && <th className="sc-actions-cell"><span className={Classes.TEXT_MUTED}>Edit</span></th>}
            </tr>
          </thead>
          <tbody>
            {shown.map((site) => {
              const height = heightOf(site);
              return (
                <tr key={site.id}>
                  <td>
                    <Link to={paths.site(projectId, site.id)}>{site.name}</Link>
                  </td>
                  <td>
                    <Tag minimal className={`sc-kind-tag sc-kind-${site.kind.toLowerCase()}`}>
                      {SITE_KIND_LABELS[site.kind]}
                    </Tag>
                  </td>
                  <td>{site.segment?.name ?? <span className={Classes.TEXT_MUTED}>–</span>}</td>
                  <td className="num sc-numeric">{site.alongStrikeKm.toFixed(1)}</td>
                  <td className="num sc-numeric">{site.latitude.toFixed(4)}</td>
                  <td className="num sc-numeric">{site.longitude.toFixed(4)}</td>
                  <td className="num sc-numeric" title={site.waterDepthM != null ? 'water depth (negative)' : 'ground elevation'}>
                    {height === null ? '–' : height.toFixed(height <= -100 ? 0 : 1)}
                  </td>
                  <td className="num sc-numeric">{site.eventHorizons.length}</td>
                  <td className="num sc-numeric">{site.samples.length}</td>
                  {canEdit && (
                    <td className="sc-actions-cell">
                      <ButtonGroup variant="minimal">
                        <Button icon={IconNames.EDIT} size="small" aria-label={`Edit ${site.name}`} onClick={() => onEdit(site)} />
                        <Button icon={IconNames.TRASH} size="small" intent={Intent.DANGER} aria-label={`Delete ${site.name}`} onClick={() => onDelete(site)} />
                      </ButtonGroup>
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </HTMLTable>
      )}
    </div>
  );
}
