import type { Facies } from '@/gql/graphql';
import { FACIES_ORDER, FACIES_STYLES, faciesGroundId, faciesPatternId } from '@/modules/column/utils/facies';

/** One texture tile per facies: marks drawn in the facies ink on a transparent tile. */
function FaciesMarks({ facies }: { facies: Facies }) {
  const { ink } = FACIES_STYLES[facies];
  switch (facies) {
    case 'SOIL':
      // rootlets: short slanted strokes
      return <path d="M2 9 L4 4 M9 12 L10 7 M6 3 L7 1" stroke={ink} strokeWidth={1} fill="none" strokeLinecap="round" />;
    case 'COLLUVIUM':
      // angular clasts
      return (
        <g fill="none" stroke={ink} strokeWidth={0.9}>
          <path d="M2 5 L5 2 L7 6 Z" />
          <path d="M9 12 L12 9 L13 13 Z" />
        </g>
      );
    case 'PEAT':
      // fibrous wavy laminae
      return <path d="M0 4 Q3.5 2 7 4 T14 4 M0 10 Q3.5 8 7 10 T14 10" stroke={ink} strokeWidth={0.9} fill="none" />;
    case 'TIDAL_MUD':
      // fine parallel laminae
      return <path d="M0 3.5 H14 M0 10.5 H14" stroke={ink} strokeWidth={0.6} />;
    case 'SAND_SHEET':
      return (
        <g fill={ink}>
          <circle cx={3} cy={3} r={0.9} />
          <circle cx={10} cy={6} r={0.9} />
          <circle cx={5} cy={11} r={0.9} />
        </g>
      );
    case 'TURBIDITE':
      return (
        <g fill={ink}>
          <circle cx={3} cy={4} r={0.7} />
          <circle cx={10} cy={10} r={0.7} />
        </g>
      );
    case 'HEMIPELAGIC_MUD':
      // broken laminae
      return <path d="M1 4 H6 M8 4 H12 M4 11 H10" stroke={ink} strokeWidth={0.7} />;
    case 'TEPHRA':
      // glass-shard ticks
      return <path d="M2 4 L3.5 6.5 L5 4 M8 10 L9.5 12.5 L11 10" stroke={ink} strokeWidth={0.8} fill="none" />;
    case 'OTHER':
      return null;
  }
}

export type FaciesPatternsProps = { idPrefix: string };

/** SVG definitions of every facies ground and texture, for a chart's <defs>. */
export function FaciesPatterns({ idPrefix }: FaciesPatternsProps) {
  return (
    <>
      {FACIES_ORDER.map((facies) => {
        const style = FACIES_STYLES[facies];
        return (
          <g key={facies}>
            <pattern id={faciesPatternId(idPrefix, facies)} width={14} height={14} patternUnits="userSpaceOnUse">
              <FaciesMarks facies={facies} />
            </pattern>
            {style.gradedTo && (
              <linearGradient id={faciesGroundId(idPrefix, facies)} x1={0} y1={1} x2={0} y2={0}>
                <stop offset="0%" stopColor={style.ground} />
                <stop offset="100%" stopColor={style.gradedTo} />
              </linearGradient>
            )}
          </g>
        );
      })}
    </>
  );
}
