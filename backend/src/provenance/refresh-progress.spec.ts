import { describe, expect, it } from 'vitest';
import { ProgressStep, refreshProgress, waitingFor } from './refresh-progress';

// A plan written out by hand: two site runs, an analysis needing both, one needing only the second.
const plan = (siteA: string, siteB: string, analysis = 'WAITING'): ProgressStep[] => [
  { id: 'a', label: 'age model of Trench A', status: siteA, dependsOn: [] },
  { id: 'b', label: 'age model of Core B', status: siteB, dependsOn: [] },
  { id: 'x', label: 'recurrence analysis of segment North', status: analysis, dependsOn: ['a', 'b'] },
  { id: 'y', label: 'recurrence analysis of site Core B', status: 'WAITING', dependsOn: ['b'] },
];

describe('waitingFor', () => {
  it('names the needed steps that have not succeeded, and nothing once a step left WAITING', () => {
    const steps = plan('SUCCEEDED', 'QUEUED');
    expect(waitingFor(steps[2], steps)).toEqual(['age model of Core B']);
    expect(waitingFor(steps[3], steps)).toEqual(['age model of Core B']);
    expect(waitingFor(steps[0], steps)).toEqual([]);
    const started = plan('SUCCEEDED', 'SUCCEEDED', 'QUEUED');
    expect(waitingFor(started[2], started)).toEqual([]);
  });
});

describe('refreshProgress', () => {
  it('counts steps by status; the share ended counts failures and blocks too', () => {
    expect(refreshProgress(plan('QUEUED', 'STARTING'), 1)).toEqual({ total: 4, waiting: 2, running: 2, succeeded: 0, failed: 0, blocked: 0, skipped: 1, fraction: 0 });
    const steps = plan('SUCCEEDED', 'FAILED', 'BLOCKED');
    expect(refreshProgress(steps, 0)).toEqual({ total: 4, waiting: 1, running: 0, succeeded: 1, failed: 1, blocked: 1, skipped: 0, fraction: 0.75 });
  });

  it('calls a plan with nothing to re-run done', () => {
    expect(refreshProgress([], 3).fraction).toBe(1);
  });
});
