/**
 * Tie suggestions between the turbidites of two cores from their physical-property logs and
 * their bed sequences. Correlators match beds by the shape of their logs (the number, order and
 * relative size of the pulses a turbidity current leaves), and one earthquake's beds keep their
 * order in every core (Goldfinger et al. 2012, USGS Professional Paper 1661-F, for the practice).
 *
 * 1. Each log channel is made comparable between cores by robust standardisation over the whole
 *    core: (x - median) / (1.4826 MAD) (Hampel 1974, JASA 69(346):383-393; 1.4826 makes the MAD
 *    a normal SD [analytic]). Instruments and cores then differ only by noise and shape.
 * 2. Each bed's signature is its standardised log from top to base, resampled to
 *    `SIGNATURE_POINTS` evenly spaced depths by linear interpolation, so beds of different
 *    thickness compare point by point.
 * 3. Two beds' distance is the dynamic time warping distance of their signatures within a
 *    Sakoe-Chiba band (Sakoe & Chiba 1978, IEEE Trans. ASSP 26(1):43-49): the smallest mean
 *    squared difference over monotone alignments that stay within `BAND_FRACTION` of the
 *    diagonal, so a pulse may shift within the bed but not swap with another. Its similarity is
 *    exp(-distance), in (0, 1].
 * 4. Ties are chosen by an order-keeping alignment of the two bed sequences: the monotone
 *    one-to-one matching that maximises the sum of (similarity - `minimumScore`) over matched pairs,
 *    by dynamic programming as in Needleman & Wunsch (1970, J. Mol. Biol. 48(3):443-453) with free
 *    gaps (a bed missing from one core, eroded or never deposited, costs nothing). Pairs the
 *    correlator has already tied are kept as anchors: the alignment must pass through them when
 *    they are in order.
 *
 * Nothing here ties anything; the suggestions are for the correlator to accept or not.
 */

/** Points per bed signature. */
export const SIGNATURE_POINTS = 24;
/** Half-width of the Sakoe-Chiba band as a fraction of the signature length. */
export const BAND_FRACTION = 0.25;
/** Pairs less similar than this are never suggested. */
export const DEFAULT_MINIMUM_SCORE = 0.5;
/** Reward for passing through an existing tie: larger than any sum of similarities. */
const ANCHOR_REWARD = 1e6;

/** A turbidite of a core: the event at its base, and the bed's depth range (m, true depth). */
export interface CoreBed {
  readonly eventId: string;
  readonly topDepthM: number;
  readonly baseDepthM: number;
}

/** One log channel of a core: readings at increasing depths (null: no reading). */
export interface LogChannel {
  readonly depthsM: readonly number[];
  readonly values: readonly (number | null)[];
}

/** A core as matching needs it: its beds and the log channels shared with the other core. */
export interface CoreForMatching {
  readonly beds: readonly CoreBed[];
  /** The same channels, in the same order, for both cores. */
  readonly channels: readonly LogChannel[];
}

export interface TieSuggestion {
  readonly eventAId: string;
  readonly eventBId: string;
  /** Similarity of the two beds' log signatures, in (0, 1]. */
  readonly score: number;
  /** The correlator had already tied this pair. */
  readonly anchored: boolean;
}

export interface SuggestOptions {
  /** Pairs already tied (event of core A, event of core B). */
  readonly anchors?: readonly (readonly [string, string])[];
  readonly minimumScore?: number;
}

/** Median of finite numbers (sorted copy). */
function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** The channel's readings standardised by its median and 1.4826 x MAD (SD when the MAD is 0). */
function standardise(channel: LogChannel): { depths: number[]; values: number[] } {
  const depths: number[] = [];
  const values: number[] = [];
  channel.values.forEach((value, i) => {
    if (value !== null && Number.isFinite(value)) {
      depths.push(channel.depthsM[i]);
      values.push(value);
    }
  });
  if (values.length === 0) return { depths, values };
  const centre = median(values);
  let scale = 1.4826 * median(values.map((v) => Math.abs(v - centre)));
  if (!(scale > 0)) {
    const mean = values.reduce((s, v) => s + v, 0) / values.length;
    scale = Math.sqrt(values.reduce((s, v) => s + (v - mean) ** 2, 0) / values.length) || 1;
  }
  return { depths, values: values.map((v) => (v - centre) / scale) };
}

/** Linear interpolation of (depths, values) at `depth`, held flat beyond the ends. */
function interpolate(depths: readonly number[], values: readonly number[], depth: number): number {
  if (depth <= depths[0]) return values[0];
  const last = depths.length - 1;
  if (depth >= depths[last]) return values[last];
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (depths[mid] <= depth) lo = mid;
    else hi = mid;
  }
  const f = (depth - depths[lo]) / (depths[hi] - depths[lo]);
  return values[lo] + f * (values[hi] - values[lo]);
}

/** Each bed's signature: SIGNATURE_POINTS x channels, row-major by point. */
function signatures(core: CoreForMatching): Float64Array[] {
  const standardised = core.channels.map(standardise);
  const c = standardised.length;
  return core.beds.map((bed) => {
    const signature = new Float64Array(SIGNATURE_POINTS * c);
    for (let k = 0; k < SIGNATURE_POINTS; k++) {
      const depth = bed.topDepthM + ((k + 0.5) / SIGNATURE_POINTS) * (bed.baseDepthM - bed.topDepthM);
      standardised.forEach((channel, j) => {
        signature[k * c + j] = channel.values.length > 0 ? interpolate(channel.depths, channel.values, depth) : 0;
      });
    }
    return signature;
  });
}

/**
 * DTW distance of two signatures within a Sakoe-Chiba band: the minimum over monotone,
 * continuous alignments of the summed squared differences (averaged over channels), divided by
 * the alignment's length.
 */
export function dtwDistance(a: Float64Array, b: Float64Array, channels: number, band = Math.ceil(BAND_FRACTION * SIGNATURE_POINTS)): number {
  const n = a.length / channels;
  const m = b.length / channels;
  const cost = new Float64Array((n + 1) * (m + 1)).fill(Infinity);
  const steps = new Float64Array((n + 1) * (m + 1));
  cost[0] = 0;
  const width = Math.max(band, Math.abs(n - m));
  for (let i = 1; i <= n; i++) {
    const from = Math.max(1, i - width);
    const to = Math.min(m, i + width);
    for (let j = from; j <= to; j++) {
      let local = 0;
      for (let k = 0; k < channels; k++) local += (a[(i - 1) * channels + k] - b[(j - 1) * channels + k]) ** 2;
      local /= channels;
      const diagonal = cost[(i - 1) * (m + 1) + (j - 1)];
      const up = cost[(i - 1) * (m + 1) + j];
      const left = cost[i * (m + 1) + (j - 1)];
      let best = diagonal;
      let previous = (i - 1) * (m + 1) + (j - 1);
      if (up < best) {
        best = up;
        previous = (i - 1) * (m + 1) + j;
      }
      if (left < best) {
        best = left;
        previous = i * (m + 1) + (j - 1);
      }
      cost[i * (m + 1) + j] = best + local;
      steps[i * (m + 1) + j] = steps[previous] + 1;
    }
  }
  return cost[n * (m + 1) + m] / steps[n * (m + 1) + m];
}

/**
 * Suggested ties between core A's and core B's beds (see the module comment), in order down the
 * cores. Beds must be given top (young) to base (old); both cores need the same channels.
 */
export function suggestTies(a: CoreForMatching, b: CoreForMatching, options: SuggestOptions = {}): TieSuggestion[] {
  if (a.channels.length === 0 || a.channels.length !== b.channels.length) {
    throw new RangeError('both cores need the same, non-empty list of log channels');
  }
  const minimumScore = options.minimumScore ?? DEFAULT_MINIMUM_SCORE;
  const channels = a.channels.length;
  const sa = signatures(a);
  const sb = signatures(b);
  const n = sa.length;
  const m = sb.length;
  const anchors = new Set((options.anchors ?? []).map(([x, y]) => `${x}\u0000${y}`));
  const similarity = new Float64Array(n * m);
  const energy = (signature: Float64Array): number => signature.reduce((sum, x) => sum + x * x, 0) / (signature.length / channels) / channels;
  const ea = sa.map(energy);
  const eb = sb.map(energy);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < m; j++) {
      const reference = (ea[i] + eb[j]) / 2;
      similarity[i * m + j] = reference > 0 ? Math.max(1e-6, 1 - dtwDistance(sa[i], sb[j], channels) / reference) : 1e-6;
    }
  }
  const gain = (i: number, j: number): number => {
    const anchored = anchors.has(`${a.beds[i].eventId}\u0000${b.beds[j].eventId}`);
    if (anchored) return ANCHOR_REWARD;
    const s = similarity[i * m + j];
    return s >= minimumScore ? s - minimumScore : -Infinity;
  };

  // best[i][j]: the best total over the first i beds of A and the first j of B.
  const best = new Float64Array((n + 1) * (m + 1));
  for (let i = 1; i <= n; i++) {
    for (let j = 1; j <= m; j++) {
      const match = best[(i - 1) * (m + 1) + (j - 1)] + gain(i - 1, j - 1);
      best[i * (m + 1) + j] = Math.max(match, best[(i - 1) * (m + 1) + j], best[i * (m + 1) + (j - 1)]);
    }
  }
  const pairs: TieSuggestion[] = [];
  for (let i = n, j = m; i > 0 && j > 0; ) {
    const here = best[i * (m + 1) + j];
    if (here === best[(i - 1) * (m + 1) + j]) i--;
    else if (here === best[i * (m + 1) + (j - 1)]) j--;
    else {
      const eventAId = a.beds[i - 1].eventId;
      const eventBId = b.beds[j - 1].eventId;
      pairs.push({ eventAId, eventBId, score: similarity[(i - 1) * m + (j - 1)], anchored: anchors.has(`${eventAId}\u0000${eventBId}`) });
      i--;
      j--;
    }
  }
  return pairs.reverse();
}
