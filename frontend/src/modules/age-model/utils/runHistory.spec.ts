import { describe, expect, it } from 'vitest';
import { newestFirst, runSettingsSummary, runsToShow } from './runHistory';

const run = (id: string, status: string, createdAt: string) => ({ id, status, createdAt });

// Three runs of one site, queued on three days: an old success, a failure, a newer success.
const history = [
  run('old', 'SUCCEEDED', '2026-01-01T10:00:00.000Z'),
  run('newer', 'SUCCEEDED', '2026-01-03T10:00:00.000Z'),
  run('failed', 'FAILED', '2026-01-02T10:00:00.000Z'),
];

describe(newestFirst.name, () => {
  it('orders by the time the run was queued, newest first', () => {
    expect(newestFirst(history).map((r) => r.id)).toEqual(['newer', 'failed', 'old']);
  });
});

describe(runsToShow.name, () => {
  it('shows the newest success when nothing is picked and nothing works', () => {
    expect(runsToShow(history, null, null)).toEqual({ shownId: 'newer', activeId: null });
  });

  it('keeps the last success on the page while a newer run is queued', () => {
    const withQueued = [...history, run('queued', 'QUEUED', '2026-01-04T10:00:00.000Z')];
    expect(runsToShow(withQueued, null, null)).toEqual({ shownId: 'newer', activeId: 'queued' });
  });

  it('treats a run just started here as in progress before the list holds it', () => {
    expect(runsToShow(history, null, 'fresh')).toEqual({ shownId: 'newer', activeId: 'fresh' });
  });

  it('once the list holds the started run and it succeeded, shows it and nothing is in progress', () => {
    const done = [...history, run('fresh', 'SUCCEEDED', '2026-01-05T10:00:00.000Z')];
    expect(runsToShow(done, null, 'fresh')).toEqual({ shownId: 'fresh', activeId: null });
  });

  it('shows the run picked in the history, even an older or failed one', () => {
    expect(runsToShow(history, 'old', null).shownId).toBe('old');
    expect(runsToShow(history, 'failed', null).shownId).toBe('failed');
  });

  it('ignores a picked id the list no longer holds', () => {
    expect(runsToShow(history, 'gone', null).shownId).toBe('newer');
  });

  it('without a success, shows the newest ended run so its failure can be read', () => {
    const failures = [run('f1', 'FAILED', '2026-01-01T00:00:00.000Z'), run('c2', 'CANCELLED', '2026-01-02T00:00:00.000Z'), run('r3', 'RUNNING', '2026-01-03T00:00:00.000Z')];
    expect(runsToShow(failures, null, null)).toEqual({ shownId: 'c2', activeId: 'r3' });
  });

  it('shows nothing for a site whose only run is still queued', () => {
    expect(runsToShow([run('q', 'QUEUED', '2026-01-01T00:00:00.000Z')], null, null)).toEqual({ shownId: null, activeId: 'q' });
  });
});

describe(runSettingsSummary.name, () => {
  it('names the depth model, seed, iterations and chains', () => {
    expect(runSettingsSummary('ORDER_ONLY', 42, { iterations: 20000, chains: 4 })).toBe('order only · seed 42 · 20,000 iterations × 4 chains');
    expect(runSettingsSummary('HEMIPELAGIC_RATE', 7, { iterations: 150000 })).toBe('hemipelagic rate · seed 7 · 150,000 iterations');
  });

  it('leaves out what the run did not record', () => {
    expect(runSettingsSummary('ORDER_ONLY', 1, null)).toBe('order only · seed 1');
  });
});
