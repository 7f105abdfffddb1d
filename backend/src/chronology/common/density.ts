/**
 * Calendar-age densities on a 1-year grid, shared by calibration, the age model, correlation and
 * recurrence. Ages are cal BP (calendar years before AD 1950); index i of `probabilities` is the
 * year `startCalBp + i`, so the array runs from young to old.
 *
 * Summaries follow the usual practice of the radiocarbon community: the median is the 50 % point
 * of the cumulative mass, highest-density (HPD) ranges are found by sorting grid probabilities
 * from highest to lowest and keeping years until the requested mass is reached (e.g. Bronk Ramsey
 * 2009, Radiocarbon 51(1), section on HPD ranges), then merging adjacent years into ranges.
 */

/** A probability density on a 1-year calendar grid. */
export interface CalendarDensity {
  /** cal BP of index 0 (the youngest year held). */
  readonly startCalBp: number;
  /** One value per year, young to old. Normalised densities sum to 1. */
  readonly probabilities: Float64Array;
}

/** A contiguous highest-density range: `olderCalBp >= youngerCalBp`. */
export interface HpdRange {
  readonly olderCalBp: number;
  readonly youngerCalBp: number;
  /** Mass inside the range (0-1). */
  readonly probability: number;
}

export interface DensitySummary {
  readonly medianCalBp: number;
  readonly meanCalBp: number;
  readonly sdYears: number;
  /** HPD ranges holding 68.27 % of the mass (labelled 68.3 % in the trade), oldest first. */
  readonly hpd68: HpdRange[];
  /** HPD ranges holding 95.45 % of the mass (labelled 95.4 % in the trade), oldest first. */
  readonly hpd95: HpdRange[];
}

/** The +-1 and +-2 sigma masses of a normal distribution, as the trade's 68.3 % and 95.4 %. */
export const HPD68_LEVEL = 0.6826894921370859;
export const HPD95_LEVEL = 0.9544997361036416;

/** Total mass of a density. */
export function totalMass(density: CalendarDensity): number {
  const p = density.probabilities;
  let sum = 0;
  // An indexed loop: iterating a typed array with for...of cost a fifth of a calibration's time.
  for (let i = 0; i < p.length; i++) sum += p[i];
  return sum;
}

/**
 * Normalise a density to unit mass. Throws when the mass is zero or not finite: callers turn that
 * into a user-facing error (an age the curve cannot explain), never a silent number.
 */
export function normalise(density: CalendarDensity): CalendarDensity {
  const mass = totalMass(density);
  if (!(mass > 0) || !Number.isFinite(mass)) {
    throw new RangeError('density has no mass to normalise');
  }
  const probabilities = new Float64Array(density.probabilities.length);
  for (let i = 0; i < probabilities.length; i++) probabilities[i] = density.probabilities[i] / mass;
  return { startCalBp: density.startCalBp, probabilities };
}

/**
 * Drop leading and trailing grid years whose probability is below `relativeThreshold` of the
 * total, so stored and transmitted densities stay small. The mass dropped is at most
 * `relativeThreshold` times the grid length.
 */
export function trim(density: CalendarDensity, relativeThreshold = 1e-6): CalendarDensity {
  const mass = totalMass(density);
  const cutoff = mass * relativeThreshold;
  const p = density.probabilities;
  let first = 0;
  while (first < p.length && p[first] <= cutoff) first++;
  let last = p.length - 1;
  while (last > first && p[last] <= cutoff) last--;
  if (first > last) return { startCalBp: density.startCalBp, probabilities: new Float64Array(0) };
  return { startCalBp: density.startCalBp + first, probabilities: p.slice(first, last + 1) };
}

/** Median, mean, standard deviation and the 68.3 % / 95.4 % HPD ranges of a density. */
export function summarise(density: CalendarDensity): DensitySummary {
  return summariseNormalised(normalise(density));
}

/** `summarise` of a density already normalised to unit mass (no copy is made). */
export function summariseNormalised(d: CalendarDensity): DensitySummary {
  const p = d.probabilities;
  let mean = 0;
  for (let i = 0; i < p.length; i++) mean += p[i] * (d.startCalBp + i);
  let variance = 0;
  for (let i = 0; i < p.length; i++) variance += p[i] * (d.startCalBp + i - mean) ** 2;
  return {
    medianCalBp: quantile(d, 0.5),
    meanCalBp: mean,
    sdYears: Math.sqrt(variance),
    hpd68: hpdRanges(d, HPD68_LEVEL),
    hpd95: hpdRanges(d, HPD95_LEVEL),
  };
}

/**
 * The calendar age below which (younger than which) a fraction `q` of the mass lies, linearly
 * interpolated inside the grid year where the cumulative mass crosses `q`. Each grid value is
 * taken as the mass of the year centred on its index.
 */
export function quantile(density: CalendarDensity, q: number): number {
  const p = density.probabilities;
  const mass = totalMass(density);
  const target = q * mass;
  let cumulative = 0;
  for (let i = 0; i < p.length; i++) {
    const next = cumulative + p[i];
    if (next >= target && p[i] > 0) {
      const within = (target - cumulative) / p[i];
      return density.startCalBp + i - 0.5 + within;
    }
    cumulative = next;
  }
  return density.startCalBp + p.length - 1;
}

/**
 * Relative slack on the HPD level: without it, rounding in the running sum decides ties (fifty
 * years of 0.01 sum to 0.49999999999999994, so the 50 % range of a flat 100-year density took 51
 * years).
 */
export const HPD_LEVEL_ROUNDING = 1e-12;

/**
 * Highest-density ranges holding at least `level` of the mass: sort grid years by probability,
 * keep the highest until their sum reaches the level, then merge runs of kept years. Each range
 * reports its own mass. Ranges are returned oldest first. Among years of equal probability at the
 * cut, younger years are kept first. A sum within HPD_LEVEL_ROUNDING of the level counts as
 * reaching it.
 */
export function hpdRanges(density: CalendarDensity, level: number): HpdRange[] {
  const p = density.probabilities;
  const mass = totalMass(density);
  const kept = new Uint8Array(p.length);
  const { cut, tiesKept } = hpdCut(p, level * mass * (1 - HPD_LEVEL_ROUNDING));
  let ties = tiesKept;
  for (let i = 0; i < p.length; i++) {
    if (p[i] > cut) kept[i] = 1;
    else if (p[i] === cut && ties > 0) {
      kept[i] = 1;
      ties--;
    }
  }
  const ranges: HpdRange[] = [];
  let i = 0;
  while (i < p.length) {
    if (!kept[i]) {
      i++;
      continue;
    }
    let j = i;
    let rangeMass = 0;
    while (j < p.length && kept[j]) rangeMass += p[j++];
    ranges.push({
      youngerCalBp: density.startCalBp + i,
      olderCalBp: density.startCalBp + j - 1,
      probability: rangeMass / mass,
    });
    i = j;
  }
  return ranges.reverse();
}

/**
 * The HPD cut for `target` mass: the years kept are those above `cut` plus the first `tiesKept`
 * (youngest) years equal to it. This is the set the sort-and-accumulate rule keeps, found by a
 * weighted quickselect in expected linear time, because sorting every density is the slowest step
 * of calibrating thousands of ages (a full sort of a few hundred values costs more than computing
 * the likelihood). Sums are taken per partition rather than in sorted order; they differ from a
 * sequential sum only in the last bits, far inside HPD_LEVEL_ROUNDING.
 */
function hpdCut(p: Float64Array, target: number): { cut: number; tiesKept: number } {
  if (!(target > 0)) return { cut: Infinity, tiesKept: 0 };
  const a = p.slice();
  let lo = 0;
  let hi = a.length;
  let remaining = target;
  let seed = 0x9e3779b9;
  while (hi > lo) {
    // Median of three pseudo-random picks: densities are unimodal, so a fixed position is a poor
    // pivot. The picks only affect speed, never which years are kept.
    seed = nextPivotSeed(seed);
    const x = a[lo + (seed % (hi - lo))];
    seed = nextPivotSeed(seed);
    const y = a[lo + (seed % (hi - lo))];
    seed = nextPivotSeed(seed);
    const z = a[lo + (seed % (hi - lo))];
    const pivot = Math.max(Math.min(x, y), Math.min(Math.max(x, y), z));
    // Three-way partition of a[lo, hi) into [> pivot | == pivot | < pivot].
    let greaterEnd = lo;
    let lessStart = hi;
    let i = lo;
    let sumGreater = 0;
    while (i < lessStart) {
      const v = a[i];
      if (v > pivot) {
        a[i] = a[greaterEnd];
        a[greaterEnd++] = v;
        sumGreater += v;
        i++;
      } else if (v < pivot) {
        a[i] = a[--lessStart];
        a[lessStart] = v;
      } else {
        i++;
      }
    }
    if (sumGreater >= remaining) {
      hi = greaterEnd;
      continue;
    }
    remaining -= sumGreater;
    const equal = lessStart - greaterEnd;
    if (pivot > 0 && equal * pivot >= remaining) {
      return { cut: pivot, tiesKept: Math.min(equal, Math.max(1, Math.ceil(remaining / pivot))) };
    }
    remaining -= equal * pivot;
    lo = lessStart;
  }
  // The level is never reached (a level of 1 or rounding): every year is kept.
  return { cut: -Infinity, tiesKept: 0 };
}

/** A 32-bit linear congruential step (Numerical Recipes constants), for pivot picks only. */
function nextPivotSeed(seed: number): number {
  return (Math.imul(seed, 1664525) + 1013904223) >>> 0;
}

/** A normal density N(mean, sd) on the 1-year grid covering mean +- 6 sd (cal BP). */
export function normalDensity(meanCalBp: number, sdYears: number): CalendarDensity {
  const start = Math.floor(meanCalBp - 6 * sdYears);
  const end = Math.ceil(meanCalBp + 6 * sdYears);
  const probabilities = new Float64Array(end - start + 1);
  for (let i = 0; i < probabilities.length; i++) {
    const z = (start + i - meanCalBp) / sdYears;
    probabilities[i] = Math.exp(-0.5 * z * z);
  }
  return normalise({ startCalBp: start, probabilities });
}

/** A uniform density over whole years `youngerCalBp..olderCalBp` inclusive. */
export function uniformDensity(youngerCalBp: number, olderCalBp: number): CalendarDensity {
  const start = Math.round(youngerCalBp);
  const end = Math.round(olderCalBp);
  if (end < start) throw new RangeError('uniform range has older < younger');
  const probabilities = new Float64Array(end - start + 1).fill(1 / (end - start + 1));
  return { startCalBp: start, probabilities };
}

/** Value of a density at calendar age `calBp` (0 outside its grid), linear between years. */
export function densityAt(density: CalendarDensity, calBp: number): number {
  const x = calBp - density.startCalBp;
  const i = Math.floor(x);
  const p = density.probabilities;
  if (i < 0 || i >= p.length) return 0;
  if (i === p.length - 1) return x === i ? p[i] : 0;
  const f = x - i;
  return p[i] * (1 - f) + p[i + 1] * f;
}

/** cal BP to a signed calendar year: 1950 - calBp, where 0 is 1 BCE (astronomical numbering). */
export function calBpToYearCe(calBp: number): number {
  return 1950 - calBp;
}

/** A signed astronomical year to a human label: 1 BCE is year 0, 2 BCE is -1. */
export function formatCeBce(yearAstronomical: number): string {
  const y = Math.round(yearAstronomical);
  return y > 0 ? `${y} CE` : `${1 - y} BCE`;
}

/**
 * Gap (years) below which two HPD ranges are quoted as one: ranges are read to a resolution of
 * about a decade when ages carry errors of tens of years [common practice]. The merged range
 * reports the whole mass inside it, gap included.
 */
export const HPD_MERGE_GAP_YEARS = 10;

/** Most ranges quoted per level; beyond it the closest ranges are merged [common practice]. */
export const HPD_MAX_RANGES = 4;

/**
 * HPD ranges a person can read: the exact HPD set of `hpdRanges`, then ranges separated by
 * fewer than `gapYears` merged, then, while more than `maxRanges` remain, the two separated by the
 * smallest gap merged. Each range reports the density's mass over its whole span (so the masses
 * may sum to a little more than the level), oldest first. A multimodal density keeps its modes
 * as separate ranges with their probabilities as long as they are further apart than the gap.
 */
export function readableHpdRanges(
  density: CalendarDensity,
  level: number,
  gapYears = HPD_MERGE_GAP_YEARS,
  maxRanges = HPD_MAX_RANGES,
): HpdRange[] {
  const young = hpdRanges(density, level).reverse(); // youngest first
  if (young.length <= 1) return young.reverse();
  const spans: { younger: number; older: number }[] = [];
  for (const r of young) {
    const last = spans[spans.length - 1];
    if (last && r.youngerCalBp - last.older - 1 < gapYears) last.older = r.olderCalBp;
    else spans.push({ younger: r.youngerCalBp, older: r.olderCalBp });
  }
  while (spans.length > maxRanges) {
    let best = 1;
    for (let i = 2; i < spans.length; i++) {
      if (spans[i].younger - spans[i - 1].older < spans[best].younger - spans[best - 1].older) best = i;
    }
    spans[best - 1].older = spans[best].older;
    spans.splice(best, 1);
  }
  const mass = totalMass(density);
  const p = density.probabilities;
  return spans
    .map((s) => {
      let inside = 0;
      for (let y = s.younger; y <= s.older; y++) inside += p[y - density.startCalBp] ?? 0;
      return { youngerCalBp: s.younger, olderCalBp: s.older, probability: inside / mass };
    })
    .reverse();
}

/** `summarise` with readable HPD ranges (`readableHpdRanges`) in place of the exact HPD sets. */
export function summariseReadable(density: CalendarDensity): DensitySummary {
  const d = normalise(density);
  const exact = summariseNormalised(d);
  return { ...exact, hpd68: readableHpdRanges(d, HPD68_LEVEL), hpd95: readableHpdRanges(d, HPD95_LEVEL) };
}
