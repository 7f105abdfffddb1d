import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { CreateSampleInput } from '../samples/dto/create-sample.input';
import type { FieldProblem, LabSheetSample } from './lab-sheet';

/** Fields of CreateSampleInput that a sheet does not give: the import fills them from the site and the unit cell. */
const CONTEXT_FIELDS = new Set(['siteId', 'unitId']);

/**
 * The type and range rules of the single-sample form (CreateSampleInput's class-validator
 * decorators) applied to a sheet row, one problem per field with the form's own message, so a
 * value the form refuses is refused by the import in the same words.
 */
export function sampleFormRules(sample: LabSheetSample): FieldProblem[] {
  const { row: _row, unit: _unit, ...fields } = sample;
  const errors = validateSync(plainToInstance(CreateSampleInput, fields));
  const problems: FieldProblem[] = [];
  for (const error of errors) {
    if (CONTEXT_FIELDS.has(error.property) || !error.constraints) continue;
    problems.push({ field: error.property, message: Object.values(error.constraints)[0] });
  }
  return problems;
}
