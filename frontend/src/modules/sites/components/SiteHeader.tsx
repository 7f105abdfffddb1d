import { Button, Classes, H2, Icon, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/app/paths';
import { SITE_KIND_LABELS } from '@/modules/projects/utils/siteForm';
import type { SiteDetail } from '@/modules/sites/utils/siteTypes';

export type SiteHeaderProps = {
  site: SiteDetail;
  canEdit: boolean;
  onEdit: () => void;
};

/** A fact with its label, for the site header. */
function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="sc-fact">
      <div className="sc-fact-label">{label}</div>
      <div className="sc-fact-value">{children}</div>
    </div>
  );
}

/** The site's name and facts: kind, segment, position, elevation or water depth, counts. */
export function SiteHeader({ site, canEdit, onEdit }: SiteHeaderProps) {
  const deepest = site.units.reduce((depth, unit) => Math.max(depth, unit.baseDepthM), 0);
  return (
    <header className="sc-page-header">
      <div className="sc-page-header-main">
        <div className="sc-title-row">
          <H2 className="sc-page-title">{site.name}</H2>
          <Tag minimal className={`sc-kind-tag sc-kind-${site.kind.toLowerCase()}`}>
            {SITE_KIND_LABELS[site.kind]}
          </Tag>
          {canEdit && <Button icon={IconNames.EDIT} variant="minimal" text="Edit site" onClick={onEdit} />}
          <Link to={paths.ageModel(site.project.id, site.id)} className={`${Classes.BUTTON} ${Classes.MINIMAL}`}>
            <Icon icon={IconNames.TIMELINE_EVENTS} />
            <span className={Classes.BUTTON_TEXT}>Age model</span>
          </Link>
        </div>
        <div className="sc-facts">
          <Fact label="Segment">{site.segment?.name ?? '–'}</Fact>
          <Fact label="Along strike">
            <span className="num">{site.alongStrikeKm.toFixed(1)} km</span>
          </Fact>
          <Fact label="Position (WGS84)">
            <span className="num">
              {site.latitude.toFixed(4)}°, {site.longitude.toFixed(4)}°
            </span>
          </Fact>
          {site.waterDepthM !== null && site.waterDepthM !== undefined && (
            <Fact label="Water depth">
              <span className="num">{site.waterDepthM} m</span>
            </Fact>
          )}
          {site.elevationM !== null && site.elevationM !== undefined && (
            <Fact label="Elevation">
              <span className="num">{site.elevationM} m</span>
            </Fact>
          )}
          <Fact label="Column">
            <span className="num">
              {site.units.length} units · {deepest.toFixed(2)} m
            </span>
          </Fact>
          <Fact label="Events · samples">
            <span className="num">
              {site.eventHorizons.length} · {site.samples.length}
            </span>
          </Fact>
        </div>
        {site.notes && <p className={`${Classes.TEXT_MUTED} sc-lead`}>{site.notes}</p>}
      </div>
    </header>
  );
}
