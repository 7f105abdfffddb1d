/** What a regional event's same-age test says, in words a reader can act on. */
export type SameAgeTest = { t: number; df: number; critical5: number; passes: boolean };

export type SameAgeVerdict = { heading: string; sentence: string; passes: boolean };

/**
 * The Ward & Wilson (1978) test as a sentence: T measures how far the member ages spread about
 * their weighted mean (each difference in units of its own error, squared and summed); the limit
 * is the value that ages truly sharing one date would exceed only 1 time in 20 (chi-square with
 * df = n - 1 at 5 %). Below it, one date explains the ages; above it, the tie probably joins
 * events of different ages.
 */
export function sameAgeVerdict({ t, df, critical5, passes }: SameAgeTest): SameAgeVerdict {
  const ages = df + 1;
  const spread = `The ${ages} ages spread by ${t.toFixed(2)}`;
  const limit = `${critical5.toFixed(2)}, the spread that ${ages} ages of one date would pass only 1 time in 20`;
  return passes
    ? { passes, heading: 'could share one date', sentence: `${spread}, under ${limit}: one earthquake can explain them.` }
    : { passes, heading: 'unlikely to share one date', sentence: `${spread}, over ${limit}: the tie probably joins events of different ages.` };
}
