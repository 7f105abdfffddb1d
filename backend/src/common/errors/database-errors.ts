import { DatabaseError } from 'pg';
import { badInput, conflict, DomainError } from './domain-error';

/**
 * The database backs the rules with constraints; when one fires (a race the service checks did not
 * see, or a bulk write), translate it into the same user-facing error the service would give.
 */
const CONSTRAINT_ERRORS: Record<string, () => DomainError> = {
  samples_project_lab_code_unique: () => badInput('labCode', 'this lab code is already used in the project'),
  units_site_position_unique: () => badInput('position', 'another unit of this site already has this position'),
  units_depths_ordered: () => badInput('baseDepthM', 'the base of a unit must be deeper than its top'),
  units_basal_erosion_not_negative: () => badInput('basalErosionM', 'basalErosionM must be at least 0 (a thickness of eroded mud, m)'),
  segments_extent_ordered: () => badInput('endKm', 'endKm must be greater than startKm'),
  samples_c14_error_positive: () => badInput('c14Error', 'the 14C error must be greater than 0'),
  samples_c14_age_not_negative: () => badInput('c14Age', 'a conventional 14C age cannot be negative'),
  ties_pair_unique: () => badInput('eventBId', 'these two events are already tied in this hypothesis'),
  hypotheses_one_preferred: () => conflict('another hypothesis was marked preferred at the same time; try again'),
  event_horizons_unit_below_id_units_id_fk: () => conflict('a unit that bounds an event horizon cannot be deleted'),
  event_horizons_unit_above_id_units_id_fk: () => conflict('a unit that bounds an event horizon cannot be deleted'),
  samples_unit_id_units_id_fk: () => conflict('a unit that holds samples cannot be deleted; move or delete them first'),
  releases_project_number_unique: () => conflict('another release was created at the same time; try again'),
};

/** Re-throw a PostgreSQL constraint violation as a DomainError; anything else unchanged. */
export function translateDatabaseError(error: unknown): never {
  const cause = error instanceof DatabaseError ? error : (error as { cause?: unknown })?.cause;
  if (cause instanceof DatabaseError && cause.constraint && CONSTRAINT_ERRORS[cause.constraint]) {
    throw CONSTRAINT_ERRORS[cause.constraint]();
  }
  if (cause instanceof DatabaseError && cause.code === '23514') {
    throw badInput('input', `a value breaks the rule "${cause.constraint ?? 'check'}"`);
  }
  throw error;
}

/** Run a write and translate constraint violations. */
export async function withConstraintErrors<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    translateDatabaseError(error);
  }
}
