import type { CurveCode, DatingMethod } from '@/gql/graphql';
import { BP_ZERO_YEAR_CE, formatRadiocarbonAge } from '@/modules/ages/utils/formatAge';
import { CURVE_LABELS, DATING_METHOD_LABELS } from './sampleVocabulary';

/**
 * cal BP of a luminescence age, which counts back from its measurement year, not from 1950
 * [common practice]: calBp = age - (measurementYear - 1950), as the server computes it
 * (backend/src/chronology/calibration/calendar-ages.ts). Shown live in the sample form.
 */
export function luminescenceCalBp(ageYears: number, measurementYear: number): number {
  return ageYears - (measurementYear - BP_ZERO_YEAR_CE);
}

/** What a sample summary needs. */
export type SummarySample = {
  labCode: string;
  method: DatingMethod;
  c14Age?: number | null;
  c14Error?: number | null;
  curve?: CurveCode | null;
  calendarAgeBp?: number | null;
  calendarErrorYears?: number | null;
  measurementYear?: number | null;
  excluded: boolean;
  calibration?: { medianCalBp: number } | null;
};

/** The measured age as the lab reported it, in its own units. */
export function measuredAgeText(sample: SummarySample): string {
  switch (sample.method) {
    case 'RADIOCARBON':
      return sample.c14Age != null && sample.c14Error != null ? `${formatRadiocarbonAge(sample.c14Age, sample.c14Error)} 14C yr BP` : 'no 14C age';
    case 'LUMINESCENCE':
      return sample.calendarAgeBp != null && sample.calendarErrorYears != null
        ? `${Math.round(sample.calendarAgeBp)} ± ${Math.round(sample.calendarErrorYears)} years before ${sample.measurementYear ?? '?'}`
        : 'no luminescence age';
    case 'HISTORICAL':
    case 'TEPHRA':
      return sample.calendarAgeBp != null && sample.calendarErrorYears != null
        ? `${Math.round(sample.calendarAgeBp)} ± ${Math.round(sample.calendarErrorYears)} cal BP`
        : 'no calendar range';
  }
}

/** One line about a sample for tooltips: lab code, method, measured age, curve, median age. */
export function sampleSummary(sample: SummarySample, formatAge: (calBp: number) => string): string {
  const parts = [sample.labCode, DATING_METHOD_LABELS[sample.method], measuredAgeText(sample)];
  if (sample.method === 'RADIOCARBON' && sample.curve) parts.push(CURVE_LABELS[sample.curve]);
  if (sample.calibration) parts.push(`median ${formatAge(sample.calibration.medianCalBp)}`);
  if (sample.excluded) parts.push('excluded');
  return parts.join(' · ');
}
