/**
 * How ages are shown. Everything is stored and computed in cal BP (calendar years before
 * AD 1950); the reader chooses to see cal BP or calendar years CE/BCE.
 */
export type AgeScale = 'CAL_BP' | 'CE_BCE';

export const AGE_SCALES: readonly AgeScale[] = ['CAL_BP', 'CE_BCE'];

/** The "present" of cal BP: AD 1950 (Stuiver & Polach 1977). */
export const BP_ZERO_YEAR_CE = 1950;

/** Short name of a scale, for switches and axis titles. */
export function ageScaleLabel(scale: AgeScale): string {
  return scale === 'CAL_BP' ? 'cal BP' : 'CE/BCE';
}

/**
 * Astronomical calendar year of a cal BP age: 1950 - calBp. Astronomical numbering has a
 * year 0, which is 1 BCE (there is no year 0 between 1 BCE and 1 CE in the historical count).
 */
export function calBpToAstronomicalYear(calBp: number): number {
  return BP_ZERO_YEAR_CE - Math.round(calBp);
}

/** An astronomical year as a historical year: 1 and later are CE, 0 is 1 BCE, -1 is 2 BCE. */
export function formatCalendarYear(astronomicalYear: number): string {
  return astronomicalYear >= 1 ? `${astronomicalYear} CE` : `${1 - astronomicalYear} BCE`;
}

/** A single age in the chosen scale, e.g. "1250 cal BP" or "700 CE". */
export function formatAge(calBp: number, scale: AgeScale): string {
  if (scale === 'CAL_BP') {
    return `${Math.round(calBp)} cal BP`;
  }
  return formatCalendarYear(calBpToAstronomicalYear(calBp));
}

/**
 * A range, oldest end first in both scales: "1290–1180 cal BP", "660–770 CE", "120 BCE–40 CE".
 * The era is written once when both ends share it.
 */
export function formatAgeRange(olderCalBp: number, youngerCalBp: number, scale: AgeScale): string {
  const older = Math.max(olderCalBp, youngerCalBp);
  const younger = Math.min(olderCalBp, youngerCalBp);
  if (scale === 'CAL_BP') {
    return `${Math.round(older)}–${Math.round(younger)} cal BP`;
  }
  const from = calBpToAstronomicalYear(older);
  const to = calBpToAstronomicalYear(younger);
  if (from >= 1) {
    return `${from}–${to} CE`;
  }
  if (to <= 0) {
    return `${1 - from}–${1 - to} BCE`;
  }
  return `${formatCalendarYear(from)}–${formatCalendarYear(to)}`;
}

/**
 * An axis tick: the bare number in cal BP (the axis title carries the unit), and the year with
 * its era in CE/BCE because the era changes along the axis.
 */
export function formatAgeTick(calBp: number, scale: AgeScale): string {
  return scale === 'CAL_BP' ? String(Math.round(calBp)) : formatCalendarYear(calBpToAstronomicalYear(calBp));
}

/** A radiocarbon age with its 1-sigma error, "1830 ± 25" (the unit, 14C yr BP, goes in the column or label). */
export function formatRadiocarbonAge(c14Age: number, c14Error: number): string {
  return `${Math.round(c14Age)} ± ${Math.round(c14Error)}`;
}

/** The unit or era every formatted range ends in, when they all end in the same one. */
function sharedSuffix(parts: readonly string[], scale: AgeScale): string | null {
  if (scale === 'CAL_BP') return ' cal BP';
  if (parts.every((part) => /^\d+–\d+ CE$/.test(part))) return ' CE';
  if (parts.every((part) => /^\d+–\d+ BCE$/.test(part))) return ' BCE';
  return null;
}

/**
 * Several ranges on one line, oldest first, the unit or era written once when all share it:
 * "507–430, 368–330 cal BP", "1443–1520, 1582–1620 CE"; ranges of mixed eras keep their own.
 */
export function formatAgeRanges(ranges: readonly { olderCalBp: number; youngerCalBp: number }[], scale: AgeScale): string {
  if (ranges.length === 0) return '';
  const ordered = [...ranges].sort((a, b) => Math.max(b.olderCalBp, b.youngerCalBp) - Math.max(a.olderCalBp, a.youngerCalBp));
  const parts = ordered.map((range) => formatAgeRange(range.olderCalBp, range.youngerCalBp, scale));
  const suffix = sharedSuffix(parts, scale);
  if (suffix === null) return parts.join(', ');
  return `${parts.map((part) => part.slice(0, -suffix.length)).join(', ')}${suffix}`;
}

/**
 * Tick positions (in cal BP) for a calendar axis spanning [olderCalBp, youngerCalBp], at round
 * numbers of the chosen scale: round cal BP, or round CE/BCE years. Round historical years
 * sit one year off the astronomical count before the era (1500 BCE is astronomical -1499), and
 * the era boundary, which has no year 0, is marked at 1 CE. `niceTicks` is d3's ticks (or any
 * function giving round values in a range), passed in so this stays free of chart libraries.
 */
export function ageAxisTicks(
  [olderCalBp, youngerCalBp]: [number, number],
  scale: AgeScale,
  count: number,
  niceTicks: (start: number, stop: number, count: number) => number[],
): number[] {
  if (scale === 'CAL_BP') return niceTicks(youngerCalBp, olderCalBp, count);
  const historical = (calBp: number) => {
    const astronomical = BP_ZERO_YEAR_CE - calBp;
    return astronomical <= 0 ? astronomical - 1 : astronomical;
  };
  return niceTicks(historical(olderCalBp), historical(youngerCalBp), count).map((year) => {
    const astronomical = year < 0 ? year + 1 : year === 0 ? 1 : year;
    return BP_ZERO_YEAR_CE - astronomical;
  });
}

/** The title of a calendar axis in the chosen scale (its unit). */
export function ageAxisTitle(scale: AgeScale): string {
  return scale === 'CAL_BP' ? 'age, cal BP' : 'calendar year, CE/BCE';
}

/** A labelled tick of a calendar axis: where (cal BP), what it reads, and how its text is anchored. */
export type AgeAxisTick = { calBp: number; label: string; anchor: 'start' | 'middle' | 'end' };

/** Rough width of a tick label in px at the 10 px chart font (digits and capitals ~6 px). */
export function tickLabelWidth(label: string): number {
  return label.length * 6.2;
}

/**
 * Labelled ticks for a horizontal calendar axis drawn from `left` to `right` px: round values of
 * the chosen scale (ageAxisTicks) inside the domain, each label centred on its tick unless that
 * would run past an end of the axis, where it is anchored to the end instead, so no label is cut
 * ("1950 C", "051 BCE") by the chart's edge.
 */
export function horizontalAgeTicks(
  domain: [number, number],
  scale: AgeScale,
  count: number,
  niceTicks: (start: number, stop: number, count: number) => number[],
  position: (calBp: number) => number,
  [left, right]: [number, number],
): AgeAxisTick[] {
  const older = Math.max(domain[0], domain[1]);
  const younger = Math.min(domain[0], domain[1]);
  return ageAxisTicks([older, younger], scale, count, niceTicks)
    .filter((calBp) => calBp <= older + 1e-9 && calBp >= younger - 1e-9)
    .map((calBp) => {
      const label = formatAgeTick(calBp, scale);
      const half = tickLabelWidth(label) / 2;
      const x = position(calBp);
      const anchor = x - half < left ? 'start' : x + half > right ? 'end' : 'middle';
      return { calBp, label, anchor };
    });
}
