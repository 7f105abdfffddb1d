import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { listedRanges } from '@/modules/calibration/utils/calibrationChart';

export type AgeValueProps = { calBp: number | null | undefined };

/** One age in the chosen scale, in the monospaced face; a dash when there is none. */
export function AgeValue({ calBp }: AgeValueProps) {
  const { age } = useAgeScale();
  return <span className="num">{calBp === null || calBp === undefined ? '–' : age(calBp)}</span>;
}

export type HpdRangeLike = { olderCalBp: number; youngerCalBp: number; probability: number };

export type AgeRangesValueProps = {
  ranges: readonly HpdRangeLike[];
  /** Show each range's share of the probability. */
  withProbability?: boolean;
};

/**
 * Highest-density ranges in the chosen scale, oldest first, one per line when there are several.
 * Single-year slivers are not listed as if they were dates; with probabilities, their share is.
 */
export function AgeRangesValue({ ranges, withProbability = false }: AgeRangesValueProps) {
  const { range } = useAgeScale();
  const { ranges: ordered, sliverShare } = listedRanges(ranges);
  if (ordered.length === 0) return <span className="num">–</span>;
  return (
    <span className="num sc-ranges">
      {ordered.map((hpd) => (
        <span key={`${hpd.olderCalBp}-${hpd.youngerCalBp}`} className="sc-range">
          {range(hpd.olderCalBp, hpd.youngerCalBp)}
          {withProbability && <span className="sc-range-probability"> ({(hpd.probability * 100).toFixed(1)} %)</span>}
        </span>
      ))}
      {withProbability && sliverShare > 0 && <span className="sc-range-probability">+ {(sliverShare * 100).toFixed(1)} % in single-year slivers</span>}
    </span>
  );
}
