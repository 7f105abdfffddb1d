import { describe, expect, it } from 'vitest';
import { fitColumnWidth } from './columnWidth';

describe(fitColumnWidth.name, () => {
  it('is wide enough for the longest cell, so two calibrated ranges are not cut', () => {
    const ranges = ['2720–2490, 2470–2360 cal BP', '1290–1180 cal BP'];
    // 27 characters at about 7 px each plus padding [common practice for a 12 px UI font].
    expect(fitColumnWidth('95.4 % ranges', ranges, 80, 420)).toBeGreaterThanOrEqual(27 * 7);
  });

  it('keeps to its bounds', () => {
    expect(fitColumnWidth('Q', ['1'], 60, 300)).toBe(60);
    expect(fitColumnWidth('Warnings', ['x'.repeat(500)], 80, 320)).toBe(320);
  });
});
