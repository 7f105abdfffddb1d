/**
 * Colours of Stratochron's charts, drawn as SVG presentation attributes so an exported figure
 * looks as it does on screen. Sediment tones for ages, a slate for measurements, Blueprint's
 * warning orange for anything that needs a second look.
 */
export const CHART_COLOURS = {
  /** Posterior or combined densities: a warm umber. */
  posterior: '#8a6a4a',
  posteriorFill: '#b8966b',
  /** Calibrated likelihoods of samples on the young side of a horizon: a muted sage. */
  likelihoodAbove: '#4f7a6b',
  /** ... and on the old side: a clay brown. */
  likelihoodBelow: '#9a5b3e',
  tie: '#3f4b53',
  regionalBand: '#c2a67c',
  selected: '#2d72d2',
  warning: '#c87619',
  danger: '#cd4246',
  axis: '#5f6b7c',
  grid: '#e5e8eb',
  text: '#1c2127',
  mutedText: '#5f6b7c',
  /** One colour per renewal model, in the order POISSON, BPT, LOGNORMAL, WEIBULL. */
  models: ['#5f6b7c', '#8a6a4a', '#4f7a6b', '#7a5f8a'],
  histogram: '#d8cbb5',
} as const;
