/** The joint age model of a correlation hypothesis (issue 13): its interface and computation. */
export * from './types';
export * from './joint-age-model';
export { JointModelInputError } from './joint-model';
