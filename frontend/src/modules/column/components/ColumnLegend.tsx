import { useId } from 'react';
import type { Facies } from '@/gql/graphql';
import { FaciesPatterns } from '@/modules/column/components/FaciesPatterns';
import { FACIES_ORDER, FACIES_STYLES, faciesGroundFill, faciesPatternId } from '@/modules/column/utils/facies';

export type ColumnLegendProps = {
  /** Facies present in the column; the legend lists only these. */
  facies: readonly Facies[];
};

/** Swatches of the facies in a column, and the marks used for horizons and samples. */
export function ColumnLegend({ facies }: ColumnLegendProps) {
  const idPrefix = `legend${useId().replace(/:/g, '')}`;
  const present = FACIES_ORDER.filter((candidate) => facies.includes(candidate));
  return (
    <div className="sc-legend">
      <svg width={0} height={0} aria-hidden className="sc-defs-only">
        <defs>
          <FaciesPatterns idPrefix={idPrefix} />
        </defs>
      </svg>
      {present.map((item) => (
        <span key={item} className="sc-legend-item">
          <svg width={22} height={14} aria-hidden>
            <rect width={22} height={14} fill={faciesGroundFill(idPrefix, item)} />
            <rect width={22} height={14} fill={`url(#${faciesPatternId(idPrefix, item)})`} className="sc-unit-box" />
          </svg>
          {FACIES_STYLES[item].label}
        </span>
      ))}
      <span className="sc-legend-item">
        <svg width={22} height={14} aria-hidden>
          <line x1={0} x2={22} y1={7} y2={7} className="sc-horizon-line" />
        </svg>
        Event horizon (dashed: quality 3–4)
      </span>
      <span className="sc-legend-item">
        <svg width={14} height={14} aria-hidden>
          <path d="M7 1 L12 7 L7 13 L2 7 Z" fill="var(--sc-peat-700)" />
        </svg>
        14C land
      </span>
      <span className="sc-legend-item">
        <svg width={14} height={14} aria-hidden>
          <path d="M7 1 L12 7 L7 13 L2 7 Z" fill="var(--sc-sea-600)" />
        </svg>
        14C marine
      </span>
      <span className="sc-legend-item">
        <svg width={14} height={14} aria-hidden>
          <circle cx={7} cy={7} r={4.5} fill="var(--sc-ochre-600)" />
        </svg>
        Luminescence
      </span>
      <span className="sc-legend-item">
        <svg width={14} height={14} aria-hidden>
          <rect x={3} y={3} width={8} height={8} fill="var(--sc-slate-600)" />
        </svg>
        Historical / tephra
      </span>
    </div>
  );
}
