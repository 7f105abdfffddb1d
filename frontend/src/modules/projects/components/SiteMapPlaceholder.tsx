import { Classes, Icon } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';

export type SiteMapPlaceholderProps = { siteCount: number };

/**
 * Where the map of segments and sites goes. TODO: replace with the d3-geo map from
 * modules/map once it exists; this box only holds its place in the layout.
 */
export function SiteMapPlaceholder({ siteCount }: SiteMapPlaceholderProps) {
  return (
    <div className="sc-map-placeholder" aria-label="Map (not yet available)">
      <Icon icon={IconNames.GLOBE_NETWORK} size={28} className={Classes.TEXT_MUTED} />
      <div className={Classes.TEXT_MUTED}>
        Map of segments and {siteCount} {siteCount === 1 ? 'site' : 'sites'} — coming with the map module.
      </div>
    </div>
  );
}
