/**
 * The joint age model run panel's pure parts: reading its settings form (the server's bounds,
 * so a bad number is caught before sending) and what a regional event shows as its age.
 */
import { FieldReader, type FormResult } from '@/modules/ui/utils/formFields';

export type JointRunField = 'seed' | 'chains' | 'iterations';
export type JointRunForm = Record<JointRunField, string>;
export type JointRunInput = { seed: number | null; chains: number | null; iterations: number | null };

/** The server's defaults (4 chains of 3,000 sweeps after burn-in) and a blank seed (random). */
export const DEFAULT_JOINT_RUN_FORM: JointRunForm = { seed: '', chains: '4', iterations: '3000' };

/** Whole numbers within the server's bounds: chains 2-16, iterations 500-200,000; blank is the default. */
export function readJointRunForm(form: JointRunForm): FormResult<JointRunInput, JointRunField> {
  const reader = new FieldReader<JointRunField>();
  return reader.result({
    seed: reader.number('seed', form.seed, { integer: true, min: 0, max: 2_147_483_647 }),
    chains: reader.number('chains', form.chains, { integer: true, min: 2, max: 16 }),
    iterations: reader.number('iterations', form.iterations, { integer: true, min: 500, max: 200_000 }),
  });
}

type HpdLike = { olderCalBp: number; youngerCalBp: number; probability: number };

export type RegionalAgeFields = {
  ageShown: 'JOINT_RUN' | 'COMBINED_DENSITIES';
  combinedMedianCalBp?: number | null;
  combinedHpd95: readonly HpdLike[];
  jointMedianCalBp?: number | null;
  jointHpd95: readonly HpdLike[];
};

/** The age a regional event shows (the joint one when the server says a fresh joint run dates it) and the other one beside it. */
export function regionalAges(event: RegionalAgeFields) {
  const joint = { label: 'Joint run', medianCalBp: event.jointMedianCalBp ?? null, hpd95: event.jointHpd95, missing: 'no up-to-date joint run' };
  const combined = { label: 'Independent', medianCalBp: event.combinedMedianCalBp ?? null, hpd95: event.combinedHpd95, missing: 'no combined age' };
  return event.ageShown === 'JOINT_RUN' ? { shown: joint, other: combined, jointShown: true } : { shown: combined, other: joint, jointShown: false };
}

/** The median used to order regional events: the one shown. */
export function shownMedian(event: RegionalAgeFields): number {
  return regionalAges(event).shown.medianCalBp ?? Infinity;
}
