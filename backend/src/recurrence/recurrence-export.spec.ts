import { describe, expect, it } from 'vitest';
import { RECURRENCE_CAUTION } from './recurrence-caution';
import { recurrenceExport, recurrenceExportCsv, RecurrenceExportHeader } from './recurrence-export';
import { computeRecurrence } from './recurrence-results';
import { normalDensity } from '../chronology/common/density';

const HEADER: RecurrenceExportHeader = {
  id: 'a1',
  projectId: 'p1',
  segmentId: 's1',
  siteId: null,
  hypothesisId: 'h1',
  hypothesisVersion: 3,
  ageModelRunIds: ['r1', 'r2'],
  seed: 5,
  forecastStartYear: 2025,
  windowsYears: [30, 50],
  draws: 500,
  createdAt: '2025-01-01T00:00:00.000Z',
  finishedAt: null,
};
const RESULTS = computeRecurrence(
  { kind: 'ordered-densities', densities: [normalDensity(400, 30), normalDensity(900, 30), normalDensity(1500, 30), normalDensity(1950, 30)] },
  { forecastStartYearCe: 2025, windowsYears: [30, 50], drawCount: 500, seed: 5 },
);

describe(recurrenceExportCsv.name, () => {
  const csv = recurrenceExportCsv(HEADER, RESULTS);
  const lines = csv.split('\r\n');

  it('opens with the caution as its own line', () => {
    expect(lines[0]).toBe(RECURRENCE_CAUTION);
    expect(RECURRENCE_CAUTION).toMatch(/not an official seismic hazard assessment/);
  });

  it('holds the four tables with every interval, model and window', () => {
    for (const title of ['intervals', 'statistics', 'models', 'probabilities']) expect(lines).toContain(title);
    const probabilityRows = lines.slice(lines.indexOf('probabilities') + 2).filter((line) => line !== '');
    // Four models, the model-averaged row and the plain Poisson figure, two windows each.
    expect(probabilityRows).toHaveLength((4 + 1 + 1) * 2);
    expect(lines.filter((line) => /^[0-2],/.test(line))).toHaveLength(3);
    expect(csv).toContain('hypothesis version,3');
  });

  it('puts names first and keeps the ids on their own lines', () => {
    const named = recurrenceExportCsv(
      { ...HEADER, names: { project: 'Invented margin', segment: 'North', site: null, hypothesis: 'One-to-one', ageModelRuns: ['Tarn Flat', null] } },
      RESULTS,
    ).split('\r\n');
    expect(named).toContain('project,Invented margin');
    expect(named).toContain(`project id,${HEADER.projectId}`);
    expect(named).toContain('hypothesis,One-to-one');
    expect(named).toContain('age model runs,Tarn Flat (r1); r2');
    expect(named).toContain('age model run ids,r1 r2');
    expect(named).toContain('seed,5');
    expect(named.some((line) => line.startsWith('joint age model run'))).toBe(false);
  });

  it('names the joint run an analysis drew from, with its id', () => {
    const joint = recurrenceExportCsv(
      { ...HEADER, ageModelRunIds: [], jointRunId: 'j1', names: { project: 'P', segment: 'North', site: null, hypothesis: 'H', ageModelRuns: [], jointRun: 'joint run under H' } },
      RESULTS,
    ).split('\r\n');
    expect(joint).toContain('joint age model run,joint run under H (j1)');
  });

  it('starts no text cell with a formula character (negative numbers stay numbers)', () => {
    for (const line of lines) {
      for (const cell of line.split(',')) if (!Number.isFinite(Number(cell))) expect(cell).not.toMatch(/^[=+\-@]/);
    }
  });
});

describe(recurrenceExport.name, () => {
  it('carries the caution and the inputs in JSON', () => {
    const json = JSON.parse(JSON.stringify(recurrenceExport(HEADER, RESULTS)));
    expect(json.caution).toBe(RECURRENCE_CAUTION);
    expect(json.analysis.ageModelRunIds).toEqual(['r1', 'r2']);
    expect(json.intervals).toHaveLength(3);
    expect(json.models).toHaveLength(4);
    expect(json.probabilities).toHaveLength(12);
  });
});
