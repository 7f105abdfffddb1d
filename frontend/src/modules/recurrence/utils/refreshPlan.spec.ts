import { describe, expect, it } from 'vitest';
import { chosenRunNotes, progressLine, stepNote } from './refreshPlan';

describe('stepNote', () => {
  it('names what a waiting step waits for', () => {
    expect(stepNote({ status: 'WAITING', waitingFor: ['age model of Tarn Flat'] })).toBe('waits for age model of Tarn Flat');
    expect(stepNote({ status: 'WAITING', waitingFor: ['age model of A', 'age model of B', 'joint run C'] })).toBe(
      'waits for age model of A, age model of B and joint run C',
    );
  });

  it('keeps the server message of a failed or blocked step', () => {
    expect(stepNote({ status: 'BLOCKED', waitingFor: [], message: 'not started: age model of Sedge Bank failed' })).toBe('not started: age model of Sedge Bank failed');
    expect(stepNote({ status: 'FAILED', waitingFor: [], message: null })).toBe('failed');
  });
});

describe('progressLine', () => {
  it('counts what ended and lists only what is there', () => {
    expect(progressLine({ total: 4, succeeded: 1, failed: 1, blocked: 1, running: 1, waiting: 0, skipped: 0 })).toBe(
      '3 of 4 steps ended · 1 computing · 1 failed · 1 not started',
    );
    expect(progressLine({ total: 1, succeeded: 0, failed: 0, blocked: 0, running: 0, waiting: 1, skipped: 2 })).toBe('0 of 1 step ended · 1 waiting · 2 skipped');
  });
});

describe('chosenRunNotes', () => {
  const choice = (name: string, runAt: string, newestAt: string, newerRunExists: boolean) => ({
    site: { id: name, name },
    run: { id: `${name}-chosen`, createdAt: runAt },
    newestRun: { id: newerRunExists ? `${name}-newest` : `${name}-chosen`, createdAt: newestAt },
    newerRunExists,
  });

  it('names each site whose chosen run is not its newest, with both runs\' times, and no other', () => {
    const notes = chosenRunNotes(
      [choice('Kelp Terrace', '2026-12-01', '2026-12-04', true), choice('Ngaio Swamp', '2026-12-02', '2026-12-02', false)],
      (iso) => `[${iso}]`,
    );
    expect(notes).toEqual([
      'Kelp Terrace: the run queued [2026-12-01] was chosen to feed the ladder and analyses, not its newest successful run (queued [2026-12-04]).',
    ]);
  });

  it('says nothing when every site follows its newest run', () => {
    expect(chosenRunNotes([], String)).toEqual([]);
  });
});
