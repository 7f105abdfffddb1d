/** Correlation checks of site events tied into regional events (SPEC, Computation 3). */
export * from './chi-square';
export * from './combined-age';
export * from './hypothesis';
export * from './order-conflicts';
export * from './regional-events';
export * from './rupture-scaling';
export * from './tie-suggestions';
