import { Button, Classes, Icon } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { geoGraticule10, geoPath, line, select, zoom, zoomIdentity, type ZoomBehavior, type ZoomTransform } from 'd3';
import { useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { SiteKind } from '@/gql/graphql';
import { mapQueries } from '@/modules/map/hooks/mapQueries';
import { fitMapProjection, nearAndFarSites, positionAtKm, segmentTrackLine, siteTrack, smoothTrack, type LonLat } from '@/modules/map/utils/mapGeometry';
import { keepLabelInFrame, layoutMarkers, placeBandLabel } from '@/modules/map/utils/markerLayout';
import { isMarineSite, SEGMENT_TONES, SITE_KIND_ORDER, SITE_SYMBOLS, siteFill, siteSymbolPath } from '@/modules/map/utils/siteSymbols';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';
import './map.css';

/** A site as the map needs it. */
export type MapSiteRow = {
  id: string;
  name: string;
  kind: SiteKind;
  latitude: number;
  longitude: number;
  alongStrikeKm: number;
  waterDepthM?: number | null;
  segment?: { id: string; name: string } | null;
};

export type MapSegmentRow = { id: string; name: string; startKm: number; endKm: number };

export type SiteMapProps = {
  projectId: string;
  sites: readonly MapSiteRow[];
  segments: readonly MapSegmentRow[];
  height?: number;
};

const FRAME_MARGIN = 28;
/** Marker centres closer than this (pixels) are fanned out. */
const MARKER_SPACING = 14;
/** How far a segment's label sits from its band's axis, pixels. */
const LABEL_OFFSET = 34;

const pathOfLine = line<readonly [number, number]>();

function kindOf(site: MapSiteRow): string {
  return `${SITE_SYMBOLS[site.kind].label}${isMarineSite(site) && site.waterDepthM != null ? `, ${site.waterDepthM} m water depth` : ''}`;
}

/**
 * The project's sites on a world outline shipped with the app: each site by kind, the segments'
 * along-strike extents as labelled bands on the sites' track, wheel to zoom and drag to pan,
 * hover for a site's name and kind, click to open its page. React draws; d3 projects, builds
 * paths and reports zoom gestures.
 */
export function SiteMap({ projectId, sites, segments, height = 380 }: SiteMapProps) {
  const navigate = useNavigate();
  const { ref, width } = useParentSize();
  const svgRef = useRef<SVGSVGElement>(null);
  const behaviourRef = useRef<ZoomBehavior<SVGSVGElement, unknown> | null>(null);
  const [transform, setTransform] = useState<ZoomTransform>(zoomIdentity);
  const [hovered, setHovered] = useState<{ site: MapSiteRow; x: number; y: number } | null>(null);
  const land = useQuery(mapQueries.land());
  const [showFar, setShowFar] = useState(false);

  // A far-away site (or a mistyped position) would shrink the rest into a cluster: the first view
  // fits the near ones and the segment bands along their track, and says what it left out.
  const { near, far } = useMemo(() => nearAndFarSites(sites), [sites]);
  const fitted = showFar ? sites : near;
  const track = useMemo(() => smoothTrack(siteTrack(fitted)), [fitted]);
  const bandEnds = useMemo(
    () => segments.flatMap((segment) => [positionAtKm(track, segment.startKm), positionAtKm(track, segment.endKm)]).filter((end): end is LonLat => end !== null),
    [segments, track],
  );
  const projection = useMemo(() => fitMapProjection(fitted, Math.max(width, 1), height, FRAME_MARGIN, bandEnds), [fitted, width, height, bandEnds]);
  const basePath = useMemo(() => geoPath(projection), [projection]);
  const landPath = useMemo(() => (land.data ? (basePath(land.data) ?? '') : ''), [basePath, land.data]);
  const graticulePath = useMemo(() => basePath(geoGraticule10()) ?? '', [basePath]);

  const toScreen = useMemo(
    () =>
      (position: LonLat): [number, number] => {
        const [x, y] = projection([position[0], position[1]]) ?? [NaN, NaN];
        return [transform.applyX(x), transform.applyY(y)];
      },
    [projection, transform],
  );

  const markers = useMemo(() => {
    const placed = layoutMarkers(
      sites.map((site) => {
        const [x, y] = toScreen([site.longitude, site.latitude]);
        return { id: site.id, x, y };
      }),
      MARKER_SPACING,
    );
    const byId = new Map(sites.map((site) => [site.id, site]));
    return placed.flatMap((marker) => {
      const site = byId.get(marker.id);
      return site ? [{ ...marker, site }] : [];
    });
  }, [sites, toScreen]);

  const segmentBands = useMemo(
    () =>
      [...segments]
        .sort((a, b) => a.startKm - b.startKm)
        .map((segment, index) => {
          const points = segmentTrackLine(track, segment.startKm, segment.endKm).map(toScreen);
          const first = points[0];
          const last = points[points.length - 1];
          const middle = first && last ? ([(first[0] + last[0]) / 2, (first[1] + last[1]) / 2] as const) : null;
          const placed = middle && first && last ? placeBandLabel(middle, first, last, markers, LABEL_OFFSET) : null;
          const kmText = `${segment.startKm}–${segment.endKm} km`;
          const textWidth = Math.max(segment.name.length * 6.6, kmText.length * 6.2);
          const label = placed ? keepLabelInFrame(placed, textWidth, 2, width, height, 4) : null;
          return { segment, tone: SEGMENT_TONES[index % SEGMENT_TONES.length] ?? SEGMENT_TONES[0], path: points.length > 1 ? (pathOfLine(points) ?? '') : '', label };
        })
        .filter((band) => band.path !== ''),
    [segments, track, toScreen, markers, width, height],
  );

  // d3-zoom only listens to the pointer and reports a transform; React draws with it.
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const behaviour = zoom<SVGSVGElement, unknown>()
      .scaleExtent([0.5, 40])
      .on('zoom', (event: { transform: ZoomTransform }) => setTransform(event.transform));
    behaviourRef.current = behaviour;
    const selection = select(svg);
    selection.call(behaviour).on('dblclick.zoom', null);
    return () => {
      selection.on('.zoom', null);
    };
  }, []);

  // A new fit (other sites, another size) starts unzoomed.
  useEffect(() => {
    if (svgRef.current && behaviourRef.current) select(svgRef.current).call(behaviourRef.current.transform, zoomIdentity);
  }, [projection]);

  const handleReset = () => {
    if (svgRef.current && behaviourRef.current) select(svgRef.current).call(behaviourRef.current.transform, zoomIdentity);
  };
  const handleOpen = (site: MapSiteRow) => navigate(paths.site(projectId, site.id));
  const handleKey = (site: MapSiteRow) => (event: KeyboardEvent<SVGGElement>) => {
    if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      handleOpen(site);
    }
  };
  const kindsShown = SITE_KIND_ORDER.filter((kind) => sites.some((site) => site.kind === kind));

  return (
    <div className="sc-map" ref={ref}>
      <svg ref={svgRef} width={width} height={height} className="sc-map-svg" role="img" aria-label={`Map of ${sites.length} sites`}>
        <rect width={width} height={height} className="sc-map-sea" />
        <g transform={transform.toString()}>
          <path d={graticulePath} className="sc-map-graticule" />
          <path d={landPath} className="sc-map-land" />
        </g>
        {segmentBands.map(({ segment, tone, path, label }) => (
          <g key={segment.id} className="sc-map-segment">
            <path d={path} stroke={tone} className="sc-map-segment-band" />
            <path d={path} className="sc-map-segment-axis" />
            {label && (
              <text x={label.x} y={label.y} textAnchor={label.textAnchor} className="sc-map-segment-label">
                {segment.name}
                <tspan className="sc-map-segment-km" x={label.x} dy="1.15em">
                  {segment.startKm}–{segment.endKm} km
                </tspan>
              </text>
            )}
          </g>
        ))}
        {markers
          .filter((marker) => marker.displaced)
          .map((marker) => (
            <g key={`leader-${marker.id}`} className="sc-map-leader">
              <line x1={marker.x} y1={marker.y} x2={marker.drawX} y2={marker.drawY} />
              <circle cx={marker.x} cy={marker.y} r={1.6} />
            </g>
          ))}
        {markers.map(({ site, drawX, drawY }) => (
          <g
            key={site.id}
            transform={`translate(${drawX},${drawY})`}
            className="sc-map-site"
            role="link"
            tabIndex={0}
            aria-label={`${site.name} (${kindOf(site)})`}
            onPointerEnter={() => setHovered({ site, x: drawX, y: drawY })}
            onPointerLeave={() => setHovered(null)}
            onFocus={() => setHovered({ site, x: drawX, y: drawY })}
            onBlur={() => setHovered(null)}
            onClick={() => handleOpen(site)}
            onKeyDown={handleKey(site)}
          >
            <path d={siteSymbolPath(site.kind)} fill={siteFill(site)} className="sc-map-marker" />
          </g>
        ))}
      </svg>
      {hovered && (
        <div className="sc-map-tooltip" style={{ left: hovered.x + 12, top: hovered.y - 12 }}>
          <strong>{hovered.site.name}</strong>
          <div className={Classes.TEXT_MUTED}>
            {kindOf(hovered.site)}
            {hovered.site.segment ? ` · ${hovered.site.segment.name}` : ''}
          </div>
          <div className="num">{hovered.site.alongStrikeKm} km along strike</div>
        </div>
      )}
      <div className="sc-map-controls">
        {far.length > 0 && (
          <Button
            size="small"
            variant="outlined"
            icon={showFar ? IconNames.ZOOM_IN : IconNames.ZOOM_OUT}
            text={showFar ? 'Fit the near sites' : `${far.length} far site${far.length === 1 ? '' : 's'} out of view: show all`}
            title={far.map((site) => site.name).join(', ')}
            onClick={() => setShowFar((previous) => !previous)}
          />
        )}
        <Button icon={IconNames.ZOOM_TO_FIT} size="small" variant="outlined" aria-label="Fit the sites" title="Fit the sites" onClick={handleReset} />
      </div>
      <div className="sc-map-legend" aria-label="Legend">
        {kindsShown.map((kind) => (
          <span key={kind} className="sc-map-legend-item">
            <svg width={14} height={14} viewBox="-7 -7 14 14" aria-hidden>
              <path d={siteSymbolPath(kind)} fill={siteFill({ kind })} transform="scale(0.75)" />
            </svg>
            {SITE_SYMBOLS[kind].label}
          </span>
        ))}
        {segmentBands.length > 0 && (
          <span className="sc-map-legend-item">
            <svg width={18} height={10} aria-hidden>
              <path d="M1 5 H17" stroke={SEGMENT_TONES[0]} strokeWidth={6} strokeOpacity={0.55} strokeLinecap="round" />
            </svg>
            Segment extent
          </span>
        )}
        {land.isError && (
          <span className={Classes.TEXT_MUTED}>
            <Icon icon={IconNames.WARNING_SIGN} size={12} /> outline not loaded
          </span>
        )}
      </div>
    </div>
  );
}
