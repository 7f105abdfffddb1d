import { ticks } from 'd3';
import { useContext, useMemo } from 'react';
import { AgeScaleContext } from '@/modules/ages/hooks/ageScaleContext';
import { ageAxisTicks, formatAge, formatAgeRange, formatAgeRanges, formatAgeTick, type AgeScale } from '@/modules/ages/utils/formatAge';

export type AgeFormatting = {
  scale: AgeScale;
  setScale: (scale: AgeScale) => void;
  /** One age in the chosen scale. */
  age: (calBp: number) => string;
  /** A range in the chosen scale, older end first. */
  range: (olderCalBp: number, youngerCalBp: number) => string;
  /** Several ranges on one line, oldest first, the unit written once where it can be. */
  ranges: (ranges: readonly { olderCalBp: number; youngerCalBp: number }[]) => string;
  /** An axis tick in the chosen scale. */
  tick: (calBp: number) => string;
  /** Tick positions (cal BP) at round values of the chosen scale for an axis over [older, younger]. */
  axisTicks: (domain: [number, number], count: number) => number[];
};

/** The chosen age scale and formatters bound to it; every age on screen goes through these. */
export function useAgeScale(): AgeFormatting {
  const context = useContext(AgeScaleContext);
  if (!context) throw new Error('useAgeScale needs an AgeScaleProvider above it');
  const { scale, setScale } = context;
  return useMemo(
    () => ({
      scale,
      setScale,
      age: (calBp: number) => formatAge(calBp, scale),
      range: (olderCalBp: number, youngerCalBp: number) => formatAgeRange(olderCalBp, youngerCalBp, scale),
      ranges: (ranges: readonly { olderCalBp: number; youngerCalBp: number }[]) => formatAgeRanges(ranges, scale),
      tick: (calBp: number) => formatAgeTick(calBp, scale),
      axisTicks: (domain: [number, number], count: number) => ageAxisTicks(domain, scale, count, ticks),
    }),
    [scale, setScale],
  );
}
