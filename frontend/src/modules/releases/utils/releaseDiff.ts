import type { ReleaseDiffQuery } from '@/gql/graphql';

export type ReleaseChangeRow = ReleaseDiffQuery['releaseDiff']['changes'][number];

/** The kinds of change a diff reports (backend releases/release-diff.ts), in reading order. */
export const CHANGE_KINDS = ['added', 'changed', 'removed'] as const;
export type ChangeKind = (typeof CHANGE_KINDS)[number];

export type ChangeGroup = { objectType: string; counts: Record<ChangeKind, number>; changes: ReleaseChangeRow[] };

/**
 * Changes grouped by object type (types in the order they first appear), each group's changes
 * sorted added, changed, removed and then by label, with a count per kind for the summary.
 */
export function groupReleaseChanges(changes: readonly ReleaseChangeRow[]): ChangeGroup[] {
  const groups = new Map<string, ChangeGroup>();
  for (const change of changes) {
    let group = groups.get(change.objectType);
    if (!group) {
      group = { objectType: change.objectType, counts: { added: 0, changed: 0, removed: 0 }, changes: [] };
      groups.set(change.objectType, group);
    }
    if ((CHANGE_KINDS as readonly string[]).includes(change.change)) group.counts[change.change as ChangeKind] += 1;
    group.changes.push(change);
  }
  const rank = (kind: string) => {
    const index = (CHANGE_KINDS as readonly string[]).indexOf(kind);
    return index < 0 ? CHANGE_KINDS.length : index;
  };
  for (const group of groups.values()) {
    group.changes.sort((a, b) => rank(a.change) - rank(b.change) || a.label.localeCompare(b.label));
  }
  return [...groups.values()];
}

/**
 * The pair to compare by default: the latest release against the one before it, given
 * releases in any order; null with fewer than two.
 */
export function defaultDiffPair(releases: readonly { id: string; number: number }[]): { fromId: string; toId: string } | null {
  if (releases.length < 2) return null;
  const byNumber = [...releases].sort((a, b) => a.number - b.number);
  const to = byNumber[byNumber.length - 1];
  const from = byNumber[byNumber.length - 2];
  return to && from ? { fromId: from.id, toId: to.id } : null;
}
