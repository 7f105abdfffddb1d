import { describe, expect, it } from 'vitest';
import { MAX_CORE_LOG_ROWS, MAX_LISTED_PROBLEMS, readCoreLogSheet, thinChannel } from './core-log-sheet';

const OPEN = { columnBaseDepthM: null };

describe(readCoreLogSheet.name, () => {
  it('reads depth and named channels with their units, empty cells as no reading', () => {
    const csv = 'depth (m),magnetic susceptibility (SI 1e-5),density (g/cm3)\n0.00,12.5,1.61\n0.02,,1.63\n0.04,14,1.70\n';
    const reading = readCoreLogSheet(csv, OPEN);
    expect(reading.problems).toEqual([]);
    expect(reading.log).toEqual({
      channels: [
        { name: 'magnetic susceptibility', unit: 'SI 1e-5' },
        { name: 'density', unit: 'g/cm3' },
      ],
      depthsM: [0, 0.02, 0.04],
      values: [
        [12.5, null, 14],
        [1.61, 1.63, 1.7],
      ],
    });
  });

  it('takes semicolons or tabs as the delimiter and a byte-order mark before the header', () => {
    expect(readCoreLogSheet('\ufeffDepth (m);ct (HU)\n1;500\n2;510', OPEN).log?.depthsM).toEqual([1, 2]);
    expect(readCoreLogSheet('depth (m)\tct (HU)\n1\t500\n2\t510', OPEN).log?.values).toEqual([[500, 510]]);
  });

  it('refuses a header without depth in metres or a channel without its unit, saying how to write it', () => {
    const reading = readCoreLogSheet('depth (cm),density\n1,2\n2,3', OPEN);
    expect(reading.log).toBeNull();
    expect(reading.problems.map((p) => p.message)).toEqual([
      'The first column must be depth in metres, headed "depth (m)"; found "depth (cm)".',
      'Column 2 ("density") needs a channel name and its unit in brackets, e.g. "density (g/cm3)".',
    ]);
    expect(readCoreLogSheet('depth (m),density (g/cm3),Density (kg/m3)\n1,2,3\n2,3,4', OPEN).problems[0].message).toBe(
      'The channel "Density" appears twice.',
    );
  });

  it('lists every bad row with its number and column, and stores nothing', () => {
    const csv = [
      'depth (m),ms (SI)',
      '0.1,5', // row 1
      '0.3,6', // row 2
      '0.2,7', // row 3: goes up the core
      'x,8', // row 4
      '0.5,1,2', // row 5: too many cells
      '0.6,1,5', // row 6: a decimal comma splits the row
      '-0.1,3', // row 7
      '0.7,=A1', // row 8
      ',9', // row 9
    ].join('\n');
    const reading = readCoreLogSheet(csv, OPEN);
    expect(reading.log).toBeNull();
    expect(reading.problems.map((p) => [p.row, p.column])).toEqual([
      [3, 'depth'],
      [4, 'depth'],
      [5, 'csv'],
      [6, 'csv'],
      [7, 'depth'],
      [8, 'ms'],
      [9, 'depth'],
    ]);
    expect(reading.problems[0].message).toBe('Row 3: depth 0.2 m does not increase on row 2 (0.3 m); rows go down the core.');
    expect(reading.problems[1].message).toBe('Row 4: depth "x" is not a number.');
    expect(reading.problems[4].message).toContain('above the core top');
    expect(reading.problems[5].message).toContain('spreadsheet formula');
    expect(reading.problemCount).toBe(7);
  });

  it('refuses depths below the base of the core column when the column is drawn', () => {
    const reading = readCoreLogSheet('depth (m),ms (SI)\n1,2\n4.5,3', { columnBaseDepthM: 4.2 });
    expect(reading.problems).toEqual([
      { row: 2, column: 'depth', message: "Row 2: depth 4.5 m is below the base of the core's column (4.2 m)." },
    ]);
  });

  it('caps the listed problems but counts them all, and refuses too many rows or an empty channel', () => {
    const rows = Array.from({ length: 120 }, (_, i) => `${i},abc`);
    const reading = readCoreLogSheet(`depth (m),ms (SI)\n${rows.join('\n')}`, OPEN);
    expect(reading.problems).toHaveLength(MAX_LISTED_PROBLEMS);
    expect(reading.problemCount).toBe(120);
    const many = Array.from({ length: MAX_CORE_LOG_ROWS + 1 }, (_, i) => `${i},1`).join('\n');
    expect(readCoreLogSheet(`depth (m),ms (SI)\n${many}`, OPEN).problems[0].message).toContain('at most 20000');
    expect(readCoreLogSheet('depth (m),ms (SI)\n1,\n2,', OPEN).problems[0].message).toBe('The channel "ms" has no readings.');
    expect(readCoreLogSheet('', OPEN).problems[0].message).toContain('empty');
    expect(readCoreLogSheet('depth (m),ms (SI)\n1,2', OPEN).problems[0].message).toBe('A log needs at least two depth rows.');
  });
});

describe(thinChannel.name, () => {
  it('returns the readings as they are when they fit, leaving out empty ones', () => {
    expect(thinChannel([0, 1, 2], [5, null, 7], 10)).toEqual({ depthsM: [0, 2], values: [5, 7] });
  });

  it('averages equal depth bins [analytic]', () => {
    // 0..99 at depths 0..0.99 m into 10 bins: bin k holds 10k..10k+9, mean 10k + 4.5.
    const depths = Array.from({ length: 100 }, (_, i) => i / 100);
    const values = Array.from({ length: 100 }, (_, i) => i);
    const trace = thinChannel(depths, values, 10);
    expect(trace.values).toHaveLength(10);
    trace.values.forEach((value, k) => expect(value).toBeCloseTo(10 * k + 4.5, 10));
    trace.depthsM.forEach((depth, k) => expect(depth).toBeCloseTo((10 * k + 4.5) / 100, 10));
  });
});
