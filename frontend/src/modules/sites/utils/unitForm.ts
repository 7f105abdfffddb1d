import type { CreateUnitInput, Facies } from '@/gql/graphql';
import { FieldReader, numberText, optionalText, type FormResult } from '@/modules/ui/utils/formFields';

export type UnitFormValues = {
  position: string;
  name: string;
  topDepthM: string;
  baseDepthM: string;
  facies: Facies;
  basalErosionM: string;
  notes: string;
};

export type UnitFormField = keyof UnitFormValues;

export const UNIT_FORM_FIELDS: readonly UnitFormField[] = ['position', 'name', 'topDepthM', 'baseDepthM', 'facies', 'basalErosionM', 'notes'];

type StoredUnit = {
  position: number;
  name: string;
  topDepthM: number;
  baseDepthM: number;
  facies: Facies;
  basalErosionM?: number | null;
  notes?: string | null;
};

/**
 * A new unit's form: the next position up, its base at the top of the youngest unit, since a
 * column is built from its base (position 1, oldest) upwards.
 */
export function emptyUnitForm(existing: readonly StoredUnit[]): UnitFormValues {
  const top = [...existing].sort((a, b) => b.position - a.position)[0];
  return {
    position: String((top?.position ?? 0) + 1),
    name: '',
    topDepthM: '',
    baseDepthM: top ? numberText(top.topDepthM) : '',
    facies: 'OTHER',
    basalErosionM: '',
    notes: '',
  };
}

/**
 * A form for a unit inserted next to `unit`: above it (younger, taking the next position up) or
 * below it (older, taking `unit`'s position). The new unit's depths start at `unit`'s contact and
 * end at the neighbour's on that side, when that side has a gap; otherwise they are left blank,
 * since the neighbour must first give up some thickness.
 */
export function insertUnitForm(existing: readonly StoredUnit[], unit: StoredUnit, side: 'above' | 'below'): UnitFormValues {
  const sorted = [...existing].sort((a, b) => a.position - b.position);
  const at = sorted.findIndex((u) => u.position === unit.position);
  const blank = { name: '', facies: 'OTHER' as Facies, basalErosionM: '', notes: '' };
  if (side === 'above') {
    const younger = sorted[at + 1];
    const gap = younger ? younger.baseDepthM < unit.topDepthM : unit.topDepthM > 0;
    return {
      ...blank,
      position: String(unit.position + 1),
      baseDepthM: numberText(unit.topDepthM),
      topDepthM: younger && gap ? numberText(younger.baseDepthM) : !younger && gap ? '0' : '',
    };
  }
  const older = sorted[at - 1];
  const gap = older ? older.topDepthM > unit.baseDepthM : false;
  return {
    ...blank,
    position: String(unit.position),
    topDepthM: numberText(unit.baseDepthM),
    baseDepthM: older && gap ? numberText(older.topDepthM) : '',
  };
}

/** Units a new unit at `position` would move up one place (the one there and every younger one). */
export function unitsDisplacedBy(existing: readonly StoredUnit[], position: number): StoredUnit[] {
  return existing.filter((u) => u.position >= position).sort((a, b) => a.position - b.position);
}

export function unitFormFrom(unit: StoredUnit): UnitFormValues {
  return {
    position: String(unit.position),
    name: unit.name,
    topDepthM: numberText(unit.topDepthM),
    baseDepthM: numberText(unit.baseDepthM),
    facies: unit.facies,
    basalErosionM: unit.basalErosionM === null || unit.basalErosionM === undefined ? '' : numberText(unit.basalErosionM),
    notes: unit.notes ?? '',
  };
}

/**
 * Check a unit form: a whole position from 1, depths in metres with the base below the top, and an
 * optional eroded thickness under the unit's base (m, from 0; blank for none recorded).
 */
export function readUnitForm(values: UnitFormValues): FormResult<Omit<CreateUnitInput, 'siteId'>, UnitFormField> {
  const reader = new FieldReader<UnitFormField>();
  const position = reader.number('position', values.position, { required: true, integer: true, min: 1 });
  const name = reader.text('name', values.name, { required: true });
  const topDepthM = reader.number('topDepthM', values.topDepthM, { required: true, min: 0 });
  const baseDepthM = reader.number('baseDepthM', values.baseDepthM, { required: true, min: 0 });
  const basalErosionM = reader.number('basalErosionM', values.basalErosionM, { min: 0 });
  if (topDepthM !== null && baseDepthM !== null && !(baseDepthM > topDepthM)) {
    reader.fail('baseDepthM', 'the base must be deeper than the top');
  }
  return reader.result({
    position: position ?? 0,
    name,
    topDepthM: topDepthM ?? 0,
    baseDepthM: baseDepthM ?? 0,
    facies: values.facies,
    basalErosionM,
    notes: optionalText(values.notes),
  });
}
