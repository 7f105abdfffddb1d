/**
 * Reading and checking a core log sheet: a physical-property log of one core (magnetic
 * susceptibility, density, CT number, ...) as CSV. The first column is depth below the core top
 * in metres, headed `depth (m)`; every further column is one channel headed `name (unit)`, e.g.
 * `magnetic susceptibility (SI 1e-5)`. One row per measured depth, depths strictly increasing.
 * A cell may be left empty where a channel has no reading.
 *
 * Checked like a lab sheet: every problem is collected with its row (data rows count from 1,
 * the row after the header; row 0 is the header or the sheet), and nothing is stored unless the
 * whole sheet is clean. The list is capped so an unreadable sheet cannot make a huge answer.
 * Plain code: no framework, no I/O.
 */
import Papa from 'papaparse';
import { readNumber } from '../sample-import/lab-sheet';

/** At most this many depth rows: bounds the stored log and the request that sends it. */
export const MAX_CORE_LOG_ROWS = 20_000;
/** At most this many channels besides depth. */
export const MAX_CORE_LOG_CHANNELS = 16;
/** At most this many problems are listed; the count of all of them is given beside. */
export const MAX_LISTED_PROBLEMS = 50;
/** Channel names and units are short labels. */
export const MAX_CHANNEL_LABEL_LENGTH = 60;

export interface CoreLogChannel {
  readonly name: string;
  readonly unit: string;
}

/** A clean log: depths strictly increasing, one value array per channel (null: no reading). */
export interface CoreLogData {
  readonly channels: readonly CoreLogChannel[];
  readonly depthsM: readonly number[];
  readonly values: readonly (readonly (number | null)[])[];
}

export interface CoreLogProblem {
  readonly row: number;
  /** `csv`, `depth` or the channel's name. */
  readonly column: string;
  readonly message: string;
}

export interface CoreLogReading {
  /** Null when there is any problem. */
  readonly log: CoreLogData | null;
  /** The first `MAX_LISTED_PROBLEMS` problems, header first, then by row. */
  readonly problems: readonly CoreLogProblem[];
  /** How many problems there are in all. */
  readonly problemCount: number;
  readonly rowCount: number;
}

/** What the sheet is checked against: the core's depth extent, when its column has units. */
export interface CoreLogContext {
  /** Depth of the base of the deepest unit (m); null when the column has no units yet. */
  readonly columnBaseDepthM: number | null;
}

const DEPTH_HEADER = /^depth\s*\(\s*m\s*\)$/i;
const CHANNEL_HEADER = /^(.+?)\s*\(\s*([^()]+?)\s*\)$/;

function delimiterOf(text: string): string {
  const firstLine = text.slice(0, text.search(/\r?\n|$/));
  const counts = [',', ';', '\t'].map((d) => [d, firstLine.split(d).length - 1] as const);
  counts.sort((a, b) => b[1] - a[1]);
  return counts[0][1] > 0 ? counts[0][0] : ',';
}

function readHeader(header: readonly string[], problems: CoreLogProblem[]): CoreLogChannel[] | null {
  const cells = header.map((cell) => cell.trim());
  if (cells.length === 0 || !DEPTH_HEADER.test(cells[0] ?? '')) {
    problems.push({
      row: 0, column: 'depth',
      message: `The first column must be depth in metres, headed "depth (m)"${cells[0] ? `; found "${cells[0]}"` : ''}.`,
    });
  }
  const channels: CoreLogChannel[] = [];
  const seen = new Set<string>();
  cells.slice(1).forEach((cell, index) => {
    const match = CHANNEL_HEADER.exec(cell);
    if (!match) {
      problems.push({
        row: 0, column: cell || `column ${index + 2}`,
        message: `Column ${index + 2} ("${cell}") needs a channel name and its unit in brackets, e.g. "density (g/cm3)".`,
      });
      return;
    }
    const [, name, unit] = match;
    if (name.length > MAX_CHANNEL_LABEL_LENGTH || unit.length > MAX_CHANNEL_LABEL_LENGTH) {
      problems.push({ row: 0, column: name, message: `Column ${index + 2}: names and units are at most ${MAX_CHANNEL_LABEL_LENGTH} characters.` });
      return;
    }
    const key = name.toLowerCase();
    if (seen.has(key)) {
      problems.push({ row: 0, column: name, message: `The channel "${name}" appears twice.` });
      return;
    }
    seen.add(key);
    channels.push({ name, unit });
  });
  if (cells.length < 2) problems.push({ row: 0, column: 'csv', message: 'The sheet needs at least one channel column after depth.' });
  if (channels.length > MAX_CORE_LOG_CHANNELS) {
    problems.push({ row: 0, column: 'csv', message: `The sheet has ${channels.length} channels; at most ${MAX_CORE_LOG_CHANNELS} fit in one log. Split it.` });
  }
  return problems.length > 0 ? null : channels;
}

/**
 * Read and check a core log sheet. Returns the log when every row is clean, and otherwise the
 * problems (capped), their full count and no log.
 */
export function readCoreLogSheet(csv: string, context: CoreLogContext): CoreLogReading {
  const text = csv.charCodeAt(0) === 0xfeff ? csv.slice(1) : csv;
  const problems: CoreLogProblem[] = [];
  const done = (rowCount: number, log: CoreLogData | null = null): CoreLogReading => {
    problems.sort((a, b) => a.row - b.row);
    return { log: problems.length > 0 ? null : log, problems: problems.slice(0, MAX_LISTED_PROBLEMS), problemCount: problems.length, rowCount };
  };
  if (text.trim() === '') {
    problems.push({ row: 0, column: 'csv', message: 'The sheet is empty: it needs a header row ("depth (m)", then channels) and one row per depth.' });
    return done(0);
  }
  const parsed = Papa.parse<string[]>(text, { delimiter: delimiterOf(text), header: false, skipEmptyLines: false });
  for (const error of parsed.errors.slice(0, MAX_LISTED_PROBLEMS)) {
    problems.push({ row: error.row ?? 0, column: 'csv', message: `The CSV is malformed here: ${error.message}.` });
  }
  const [header = [], ...records] = parsed.data;
  const channels = readHeader(header, problems);
  const rows = records.map((cells, index) => ({ cells, row: index + 1 })).filter(({ cells }) => cells.some((cell) => cell.trim() !== ''));
  if (rows.length > MAX_CORE_LOG_ROWS) {
    problems.push({ row: 0, column: 'csv', message: `The sheet has ${rows.length} rows; at most ${MAX_CORE_LOG_ROWS} fit in one log. Resample it or split the core.` });
  }
  if (rows.length < 2 && problems.length === 0) {
    problems.push({ row: 0, column: 'csv', message: 'A log needs at least two depth rows.' });
  }
  if (!channels || problems.length > 0) return done(rows.length);

  const depthsM: number[] = [];
  const values: (number | null)[][] = channels.map(() => []);
  let previousDepth = -Infinity;
  let previousRow = 0;
  for (const { cells, row } of rows) {
    if (cells.length !== channels.length + 1) {
      problems.push({ row, column: 'csv', message: `Row ${row} has ${cells.length} cells; the header has ${channels.length + 1}.` });
      continue;
    }
    const depth = readNumber(cells[0]);
    if (cells[0].trim() === '') {
      problems.push({ row, column: 'depth', message: `Row ${row} has no depth.` });
    } else if (typeof depth === 'string') {
      problems.push({ row, column: 'depth', message: `Row ${row}: depth ${depth}.` });
    } else if (depth < 0) {
      problems.push({ row, column: 'depth', message: `Row ${row}: depth ${depth} m is above the core top; depths are metres below it (0 or more).` });
    } else if (context.columnBaseDepthM !== null && depth > context.columnBaseDepthM) {
      problems.push({
        row, column: 'depth',
        message: `Row ${row}: depth ${depth} m is below the base of the core's column (${context.columnBaseDepthM} m).`,
      });
    } else if (!(depth > previousDepth)) {
      problems.push({
        row, column: 'depth',
        message: `Row ${row}: depth ${depth} m does not increase on row ${previousRow} (${previousDepth} m); rows go down the core.`,
      });
    } else {
      previousDepth = depth;
      previousRow = row;
      depthsM.push(depth);
    }
    channels.forEach((channel, c) => {
      const cell = cells[c + 1];
      if (cell.trim() === '') {
        values[c].push(null);
        return;
      }
      const value = readNumber(cell);
      if (typeof value === 'string') {
        problems.push({ row, column: channel.name, message: `Row ${row}, ${channel.name}: ${value}.` });
        values[c].push(null);
      } else {
        values[c].push(value);
      }
    });
  }
  channels.forEach((channel, c) => {
    if (problems.length === 0 && values[c].every((value) => value === null)) {
      problems.push({ row: 0, column: channel.name, message: `The channel "${channel.name}" has no readings.` });
    }
  });
  return done(rows.length, { channels, depthsM, values });
}

/** A channel thinned for drawing: at most `maxPoints` block means over equal depth bins. */
export interface CoreLogTrace {
  readonly depthsM: number[];
  readonly values: (number | null)[];
}

/**
 * Block means of one channel in `maxPoints` equal depth bins (each bin's mean depth and mean
 * reading; a bin without readings is left out). Keeps a drawn log's size bounded whatever the
 * sampling interval; with fewer rows than bins the rows come back as they are.
 */
export function thinChannel(depthsM: readonly number[], values: readonly (number | null)[], maxPoints: number): CoreLogTrace {
  const present = depthsM.map((depth, i) => ({ depth, value: values[i] })).filter((p): p is { depth: number; value: number } => p.value !== null);
  if (present.length <= maxPoints) return { depthsM: present.map((p) => p.depth), values: present.map((p) => p.value) };
  const top = present[0].depth;
  const span = present[present.length - 1].depth - top || 1;
  const sums = new Float64Array(maxPoints);
  const depthSums = new Float64Array(maxPoints);
  const counts = new Int32Array(maxPoints);
  for (const { depth, value } of present) {
    const bin = Math.min(maxPoints - 1, Math.floor(((depth - top) / span) * maxPoints));
    sums[bin] += value;
    depthSums[bin] += depth;
    counts[bin]++;
  }
  const trace: CoreLogTrace = { depthsM: [], values: [] };
  for (let b = 0; b < maxPoints; b++) {
    if (counts[b] === 0) continue;
    trace.depthsM.push(depthSums[b] / counts[b]);
    trace.values.push(sums[b] / counts[b]);
  }
  return trace;
}
