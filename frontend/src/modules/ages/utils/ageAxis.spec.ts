import { scaleLinear, ticks } from 'd3';
import { describe, expect, it } from 'vitest';
import { verticalTicks } from './ageAxis';
import { ageAxisTicks, formatAgeTick } from './formatAge';

describe(verticalTicks.name, () => {
  it('puts a CE/BCE axis at round calendar years, never at round cal BP (odd years)', () => {
    // A ladder scale over 3000-0 cal BP, young at the top.
    const time = scaleLinear().domain([0, 3000]).range([80, 800]);
    const found = verticalTicks(time, (domain, count) => ageAxisTicks(domain, 'CE_BCE', count, ticks), 6);
    const labels = found.map((calBp) => formatAgeTick(calBp, 'CE_BCE'));
    // 3000 cal BP = 1051 BCE, 1000 cal BP = 950 CE [analytic]: neither may appear.
    expect(labels).toEqual(['1000 BCE', '500 BCE', '1 CE', '500 CE', '1000 CE', '1500 CE']);
  });
});
