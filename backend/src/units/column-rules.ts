/**
 * Rules of a stratigraphic column that the database cannot state on one row: units stack without
 * overlap, and position order (1 = oldest, at the base) matches depth order (deeper = older).
 */

export interface UnitPlacement {
  id?: string;
  name: string;
  position: number;
  topDepthM: number;
  baseDepthM: number;
}

export interface ColumnRuleViolation {
  field: 'position' | 'topDepthM' | 'baseDepthM';
  message: string;
}

/** Check a new or edited unit against the other units of its site. */
export function checkUnitPlacement(others: readonly UnitPlacement[], unit: UnitPlacement): ColumnRuleViolation | null {
  if (!(unit.baseDepthM > unit.topDepthM)) {
    return { field: 'baseDepthM', message: `the base (${unit.baseDepthM} m) must be deeper than the top (${unit.topDepthM} m)` };
  }
  for (const other of others) {
    if (other.id !== undefined && other.id === unit.id) continue;
    if (other.position === unit.position) {
      return { field: 'position', message: `unit "${other.name}" already has position ${unit.position}` };
    }
    if (unit.topDepthM < other.baseDepthM && other.topDepthM < unit.baseDepthM) {
      return {
        field: 'topDepthM',
        message: `${unit.topDepthM}-${unit.baseDepthM} m overlaps unit "${other.name}" (${other.topDepthM}-${other.baseDepthM} m)`,
      };
    }
    const olderByPosition = unit.position < other.position;
    const olderByDepth = unit.topDepthM >= other.baseDepthM;
    if (olderByPosition !== olderByDepth) {
      return {
        field: 'position',
        message: `position ${unit.position} puts this unit ${olderByPosition ? 'below' : 'above'} "${other.name}" (position ${other.position}) but its depths put it ${olderByDepth ? 'below' : 'above'}`,
      };
    }
  }
  return null;
}
