/**
 * Reads the built-in calibration curves shipped in the repository's `reference-data/` folder,
 * once per process. The folder is found by walking up from this file, so it works from `src/`
 * (tests, tsx) and from `dist/` (the built server) alike.
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { CalibrationCurve, parseCurve } from '../chronology/calibration/curve';

export type BuiltInCurveCode = 'INTCAL20' | 'MARINE20';

const BUILT_IN: Record<BuiltInCurveCode, { file: string; name: string; marine: boolean }> = {
  INTCAL20: { file: 'intcal20.csv', name: 'IntCal20 (Reimer et al. 2020)', marine: false },
  MARINE20: { file: 'marine20.csv', name: 'Marine20 (Heaton et al. 2020)', marine: true },
};

const cache = new Map<BuiltInCurveCode, CalibrationCurve>();

/** The repository's `reference-data/` folder. */
export function referenceDataDir(): string {
  let dir = __dirname;
  for (;;) {
    const candidate = join(dir, 'reference-data', 'intcal20.csv');
    if (existsSync(candidate)) return join(dir, 'reference-data');
    const parent = dirname(dir);
    if (parent === dir) throw new Error('reference-data/ with intcal20.csv not found above ' + __dirname);
    dir = parent;
  }
}

export function isBuiltInCurve(code: string): code is BuiltInCurveCode {
  return code in BUILT_IN;
}

/** A built-in curve on its 1-year grid, parsed on first use and kept for the process. */
export function builtInCurve(code: BuiltInCurveCode): CalibrationCurve {
  let curve = cache.get(code);
  if (!curve) {
    const spec = BUILT_IN[code];
    const text = readFileSync(join(referenceDataDir(), spec.file), 'utf8');
    curve = parseCurve(text, { code, name: spec.name, marine: spec.marine });
    cache.set(code, curve);
  }
  return curve;
}
