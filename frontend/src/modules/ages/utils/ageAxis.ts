/** Calendar axes drawn down the page (ladder, space-time, a site's events). */

/**
 * Tick positions (cal BP) for a vertical time scale at round values of the chosen age scale:
 * `axisTicks` is useAgeScale's, which gives round CE/BCE years in CE/BCE (a scale's own ticks
 * would be round cal BP, i.e. odd calendar years such as 950 CE). Ticks outside the scale's
 * domain are dropped.
 */
export function verticalTicks(
  time: { domain: () => number[] },
  axisTicks: (domain: [number, number], count: number) => number[],
  count: number,
): number[] {
  const [a = 0, b = 0] = time.domain();
  const older = Math.max(a, b);
  const younger = Math.min(a, b);
  return axisTicks([older, younger], count).filter((calBp) => calBp <= older && calBp >= younger);
}
