/** The site age model: a Bayesian ordering model of a column (SPEC, Computation 2). */
export * from './age-model';
export * from './column';
export * from './convergence';
export * from './likelihood';
export * from './order-check';
export * from './simulated-column';
