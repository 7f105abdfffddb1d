import { describe, expect, it } from 'vitest';
import { ageCells, ceBce, parseRangesCalBp, rangesCalBp, tableCsv } from './result-tables';

describe('ceBce', () => {
  it('counts calendar years with no year 0: 1949 cal BP is 1 CE, 1950 cal BP is 1 BCE [common practice]', () => {
    expect(ceBce(0)).toBe('1950 CE');
    expect(ceBce(1949)).toBe('1 CE');
    expect(ceBce(1950)).toBe('1 BCE');
    expect(ceBce(2750)).toBe('801 BCE');
    expect(ceBce(-50)).toBe('2000 CE');
  });
});

describe('rangesCalBp', () => {
  it('reads back what it writes, post-bomb (negative) ages included', () => {
    const ranges = [{ olderCalBp: 2750, youngerCalBp: 2610.5, probability: 0.6 }, { olderCalBp: 10, youngerCalBp: -20, probability: 0.08 }];
    expect(parseRangesCalBp(rangesCalBp(ranges))).toEqual([[2750, 2610.5], [10, -20]]);
    expect(parseRangesCalBp('')).toEqual([]);
  });
});

describe('tableCsv', () => {
  it('writes inputs, then the table under its title, ranges as text', () => {
    const csv = tableCsv({
      table: 'event ages',
      inputs: [{ field: 'seed', value: 7 }],
      columns: [{ key: 'event', title: 'event' }, { key: 'hpd95CalBp', title: '95.4 % range (cal BP)' }],
      rows: [{ event: '=E1', ...ageCells({ medianCalBp: 700, hpd68: [], hpd95: [{ olderCalBp: 800, youngerCalBp: 600, probability: 0.954 }] }) }],
    });
    expect(csv).toBe("inputs\r\nfield,value\r\nseed,7\r\n\r\nevent ages\r\nevent,95.4 % range (cal BP)\r\n'=E1,800 to 600\r\n");
  });
});
