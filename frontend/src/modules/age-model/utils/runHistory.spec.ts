import { describe, expect, it } from 'vitest';
import { downstreamRow, downstreamSentence, newestFirst, runSettingsSummary, runsToShow } from './runHistory';

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

describe(downstreamRow.name, () => {
  const following = { downstreamId: 'newer', chosenId: null };
  const chosenOld = { downstreamId: 'old', chosenId: 'old' };

  it('marks the newest successful run while the site follows it, and offers every other success to choose', () => {
    expect(downstreamRow(run('newer', 'SUCCEEDED', ''), following, true)).toEqual({ mark: 'used downstream · newest', action: null });
    expect(downstreamRow(run('old', 'SUCCEEDED', ''), following, true)).toEqual({ mark: null, action: 'choose' });
  });

  it('marks a chosen run as chosen and offers the way back to the newest; the newest is then offered to choose', () => {
    expect(downstreamRow(run('old', 'SUCCEEDED', ''), chosenOld, true)).toEqual({ mark: 'used downstream · chosen', action: 'followNewest' });
    expect(downstreamRow(run('newer', 'SUCCEEDED', ''), chosenOld, true)).toEqual({ mark: null, action: 'choose' });
  });

  it('offers nothing for runs that did not succeed, nor to a reader who may not run age models', () => {
    for (const status of ['FAILED', 'CANCELLED', 'QUEUED', 'RUNNING']) expect(downstreamRow(run('x', status, ''), following, true)).toEqual({ mark: null, action: null });
    expect(downstreamRow(run('old', 'SUCCEEDED', ''), following, false).action).toBeNull();
    expect(downstreamRow(run('old', 'SUCCEEDED', ''), chosenOld, false)).toEqual({ mark: 'used downstream · chosen', action: null });
  });
});

describe(downstreamSentence.name, () => {
  it('says whether the shown run is the one downstream reads, and why', () => {
    expect(downstreamSentence('newer', { downstreamId: 'newer', chosenId: null })).toContain('the newest successful one');
    expect(downstreamSentence('old', { downstreamId: 'old', chosenId: 'old' })).toContain('chosen in place of the newest');
    expect(downstreamSentence('old', { downstreamId: 'newer', chosenId: null })).toContain('use the newest successful run, not this one');
    expect(downstreamSentence('newer', { downstreamId: 'old', chosenId: 'old' })).toContain('another run, chosen for this site');
    expect(downstreamSentence('failed', { downstreamId: null, chosenId: null })).toContain('no successful run');
  });
});
