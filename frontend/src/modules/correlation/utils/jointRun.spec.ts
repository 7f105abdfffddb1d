import { describe, expect, it } from 'vitest';
import { readJointRunForm, regionalAges, shownMedian } from '@/modules/correlation/utils/jointRun';

describe('readJointRunForm', () => {
  it('accepts blanks as the server defaults and whole numbers within bounds', () => {
    expect(readJointRunForm({ seed: '', chains: '4', iterations: '20000' })).toEqual({ ok: true, input: { seed: null, chains: 4, iterations: 20000 } });
    expect(readJointRunForm({ seed: '7', chains: '', iterations: '' })).toEqual({ ok: true, input: { seed: 7, chains: null, iterations: null } });
  });

  it('names each field outside the server bounds', () => {
    const result = readJointRunForm({ seed: '-1', chains: '1', iterations: '300000' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['chains', 'iterations', 'seed']);
  });
});

describe('regionalAges', () => {
  const range = (older: number, younger: number) => [{ olderCalBp: older, youngerCalBp: younger, probability: 0.954 }];
  const event = { combinedMedianCalBp: 1500, combinedHpd95: range(1560, 1440), jointMedianCalBp: 1480, jointHpd95: range(1520, 1450) };

  it('shows the joint age when a fresh joint run dates the event, the independent one beside it', () => {
    const ages = regionalAges({ ...event, ageShown: 'JOINT_RUN' });
    expect(ages.jointShown).toBe(true);
    expect(ages.shown.medianCalBp).toBe(1480);
    expect(ages.other.medianCalBp).toBe(1500);
    expect(shownMedian({ ...event, ageShown: 'JOINT_RUN' })).toBe(1480);
  });

  it('shows the independent (combined) age otherwise', () => {
    const ages = regionalAges({ ...event, jointMedianCalBp: null, jointHpd95: [], ageShown: 'COMBINED_DENSITIES' });
    expect(ages.jointShown).toBe(false);
    expect(ages.shown.medianCalBp).toBe(1500);
    expect(ages.other.medianCalBp).toBeNull();
    expect(ages.other.missing).toBe('no up-to-date joint run');
  });
});
