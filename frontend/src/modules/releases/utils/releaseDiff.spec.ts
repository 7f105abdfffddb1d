import { describe, expect, it } from 'vitest';
import { defaultDiffPair, groupReleaseChanges } from './releaseDiff';

describe(groupReleaseChanges.name, () => {
  const changes = [
    { objectType: 'sample', objectId: 's2', label: 'VLM-204', change: 'removed' },
    { objectType: 'site', objectId: 'a', label: 'Orrin Flats trench', change: 'changed' },
    { objectType: 'sample', objectId: 's3', label: 'VLM-301', change: 'added' },
    { objectType: 'sample', objectId: 's1', label: 'VLM-110', change: 'added' },
    { objectType: 'sample', objectId: 's4', label: 'VLM-150', change: 'changed' },
  ];

  it('groups by object type in the order types first appear, counting each kind', () => {
    const groups = groupReleaseChanges(changes);
    expect(groups.map((group) => [group.objectType, group.counts])).toEqual([
      ['sample', { added: 2, changed: 1, removed: 1 }],
      ['site', { added: 0, changed: 1, removed: 0 }],
    ]);
  });

  it('lists added, then changed, then removed, each by label', () => {
    expect(groupReleaseChanges(changes)[0]?.changes.map((change) => change.label)).toEqual(['VLM-110', 'VLM-301', 'VLM-150', 'VLM-204']);
  });

  it('gives nothing for no changes', () => {
    expect(groupReleaseChanges([])).toEqual([]);
  });
});

describe(defaultDiffPair.name, () => {
  it('compares the latest release with the one before, whatever the list order', () => {
    expect(
      defaultDiffPair([
        { id: 'r3', number: 3 },
        { id: 'r1', number: 1 },
        { id: 'r2', number: 2 },
      ]),
    ).toEqual({ fromId: 'r2', toId: 'r3' });
  });

  it('has no pair with fewer than two releases', () => {
    expect(defaultDiffPair([{ id: 'r1', number: 1 }])).toBeNull();
  });
});
