import { describe, expect, it } from 'vitest';
import { defaultRecurrenceSettings, readRecurrenceSettings } from './recurrenceForm';

describe(readRecurrenceSettings.name, () => {
  it('reads a segment analysis with sorted, de-duplicated windows', () => {
    const form = { ...defaultRecurrenceSettings(2026, 'h1'), segmentId: 's1', windows: '100, 30 50;30' };
    expect(readRecurrenceSettings(form)).toEqual({
      ok: true,
      input: { segmentId: 's1', hypothesisId: 'h1', siteId: null, forecastStartYear: 2026, windowsYears: [30, 50, 100], draws: 10000, seed: null },
    });
  });

  it('needs a segment and a hypothesis for a segment, only the site for a site', () => {
    const segment = readRecurrenceSettings(defaultRecurrenceSettings(2026, null));
    expect(segment.ok).toBe(false);
    if (!segment.ok) expect(Object.keys(segment.errors).sort()).toEqual(['hypothesisId', 'segmentId']);
    const site = readRecurrenceSettings({ ...defaultRecurrenceSettings(2026, null), target: 'site', siteId: 'x' });
    expect(site.ok && site.input).toMatchObject({ siteId: 'x', segmentId: null, hypothesisId: null });
  });

  it('refuses non-positive windows and fractional draws', () => {
    const result = readRecurrenceSettings({ ...defaultRecurrenceSettings(2026, 'h'), segmentId: 's', windows: '30, -5', draws: '10.5' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['draws', 'windows']);
  });
});
