import { describe, expect, it } from 'vitest';
import {
  ageOnCurveAxis,
  calendarWindow,
  closeDensity,
  densityPeak,
  normalDensityPoints,
  normalPdf,
  radiocarbonWindow, listedRanges } from './calibrationChart';

describe(ageOnCurveAxis.name, () => {
  it('leaves a terrestrial age as measured', () => {
    expect(ageOnCurveAxis({ c14Age: 1000, c14Error: 30 })).toEqual({ age: 1000, sigma: 30 });
  });

  it('takes Delta-R off a marine age and adds its error in quadrature [analytic]', () => {
    const shifted = ageOnCurveAxis({ c14Age: 2410, c14Error: 30, deltaR: -40, deltaRError: 40 });
    expect(shifted.age).toBe(2450);
    expect(shifted.sigma).toBeCloseTo(50, 10); // sqrt(30^2 + 40^2) = 50
  });
});

describe(normalPdf.name, () => {
  it('peaks at 1 / (sd sqrt(2 pi)) and falls to exp(-1/2) of that one sd away [analytic]', () => {
    expect(normalPdf(1000, 1000, 30)).toBeCloseTo(1 / (30 * Math.sqrt(2 * Math.PI)), 12);
    expect(normalPdf(1030, 1000, 30) / normalPdf(1000, 1000, 30)).toBeCloseTo(Math.exp(-0.5), 12);
  });
});

describe(normalDensityPoints.name, () => {
  const points = normalDensityPoints({ age: 1000, sigma: 30 }, { spanSigmas: 4, steps: 161 });

  it('spans mean +- 4 sd symmetrically', () => {
    expect(points[0]!.value).toBeCloseTo(880, 10);
    expect(points[160]!.value).toBeCloseTo(1120, 10);
    expect(points[20]!.density).toBeCloseTo(points[140]!.density, 12);
  });

  it('holds the normal mass within 4 sd, 0.99994, by the trapezoid rule [analytic]', () => {
    let mass = 0;
    for (let index = 1; index < points.length; index += 1) {
      const a = points[index - 1]!;
      const b = points[index]!;
      mass += ((a.density + b.density) / 2) * (b.value - a.value);
    }
    expect(mass).toBeCloseTo(0.99994, 3);
  });
});

describe(calendarWindow.name, () => {
  const density = [
    { calBp: 900, probability: 0.001 },
    { calBp: 1100, probability: 0.001 },
  ];

  it('pads the extent of every density by a fifth of its span and rounds out to 50 years', () => {
    expect(calendarWindow([density, [{ calBp: 1400, probability: 0.01 }]])).toEqual({
      youngerCalBp: 800, // 900 - 0.2 * 500 = 800
      olderCalBp: 1500, // 1400 + 100
    });
  });

  it('keeps a narrow density at least 300 years wide', () => {
    expect(calendarWindow([density])).toEqual({ youngerCalBp: 850, olderCalBp: 1150 });
  });

  it('stops at the youngest allowed age', () => {
    expect(calendarWindow([[{ calBp: 10, probability: 1 }]])?.youngerCalBp).toBe(-75);
  });

  it('has no window without densities', () => {
    expect(calendarWindow([[], []])).toBeNull();
  });
});

describe(radiocarbonWindow.name, () => {
  const band = [
    { calBp: 700, c14Age: 100, c14Sigma: 10 },
    { calBp: 1000, c14Age: 1000, c14Sigma: 20 },
    { calBp: 1200, c14Age: 1300, c14Sigma: 20 },
  ];

  it('covers the band inside the window and the measured age +- 4 sd, padded by 5 %', () => {
    const window = { youngerCalBp: 900, olderCalBp: 1300 };
    // band: 980..1320; measured 1000 +- 4 * 30: 880..1120; so 880..1320, pad 22
    const [low, high] = radiocarbonWindow(band, [{ age: 1000, sigma: 30 }], window)!;
    expect(low).toBeCloseTo(858, 10);
    expect(high).toBeCloseTo(1342, 10);
  });

  it('has no window with nothing to show', () => {
    expect(radiocarbonWindow([], [], null)).toBeNull();
  });
});

describe(densityPeak.name, () => {
  it('finds the largest probability', () => {
    expect(densityPeak([{ calBp: 1, probability: 0.2 }, { calBp: 2, probability: 0.5 }])).toBe(0.5);
    expect(densityPeak([])).toBe(0);
  });
});

describe(closeDensity.name, () => {
  it('sorts the density and closes it with zeros one year beyond each end', () => {
    expect(closeDensity([{ calBp: 11, probability: 0.4 }, { calBp: 10, probability: 0.6 }])).toEqual([
      { calBp: 9, probability: 0 },
      { calBp: 10, probability: 0.6 },
      { calBp: 11, probability: 0.4 },
      { calBp: 12, probability: 0 },
    ]);
  });
});

describe(listedRanges.name, () => {
  it('leaves out single-year slivers and reports their share, listing the rest oldest first', () => {
    const { ranges, sliverShare } = listedRanges([
      { olderCalBp: 2480, youngerCalBp: 2350, probability: 0.62 },
      { olderCalBp: 2507, youngerCalBp: 2507, probability: 0.003 },
      { olderCalBp: 2720, youngerCalBp: 2620, probability: 0.327 },
    ]);
    expect(ranges.map((range) => range.olderCalBp)).toEqual([2720, 2480]);
    expect(sliverShare).toBeCloseTo(0.003, 9);
  });
});
