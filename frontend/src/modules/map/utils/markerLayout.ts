/** A marker to place: its id and its projected position, pixels. */
export type MarkerInput = { id: string; x: number; y: number };

/** A placed marker: where it is drawn, where its site truly is, and whether it was moved aside. */
export type PlacedMarker = MarkerInput & { drawX: number; drawY: number; displaced: boolean };

/**
 * Place markers so that none hides another: markers closer than `spacing` pixels (linked in
 * chains, single linkage) form a cluster, and a cluster's markers are set on a ring around the
 * cluster's centroid, in id order, with neighbours `spacing` apart along the ring. Lone
 * markers stay where they are. Quadratic in the number of markers, which is fine for the tens
 * of sites a project has.
 */
export function layoutMarkers(markers: readonly MarkerInput[], spacing: number): PlacedMarker[] {
  const parent = markers.map((_, index) => index);
  const find = (index: number): number => {
    let root = index;
    while (parent[root] !== root) root = parent[root] ?? root;
    parent[index] = root;
    return root;
  };
  for (let i = 0; i < markers.length; i += 1) {
    for (let j = i + 1; j < markers.length; j += 1) {
      const a = markers[i];
      const b = markers[j];
      if (a && b && Math.hypot(a.x - b.x, a.y - b.y) < spacing) parent[find(j)] = find(i);
    }
  }
  const clusters = new Map<number, number[]>();
  markers.forEach((_, index) => {
    const root = find(index);
    clusters.set(root, [...(clusters.get(root) ?? []), index]);
  });

  const placed: PlacedMarker[] = markers.map((marker) => ({ ...marker, drawX: marker.x, drawY: marker.y, displaced: false }));
  for (const members of clusters.values()) {
    if (members.length < 2) continue;
    const cx = members.reduce((sum, index) => sum + (markers[index]?.x ?? 0), 0) / members.length;
    const cy = members.reduce((sum, index) => sum + (markers[index]?.y ?? 0), 0) / members.length;
    // Chord length between ring neighbours is 2 r sin(pi / n); set it to the spacing.
    const radius = spacing / (2 * Math.sin(Math.PI / members.length));
    const ordered = [...members].sort((a, b) => (markers[a]?.id ?? '').localeCompare(markers[b]?.id ?? ''));
    ordered.forEach((index, position) => {
      const angle = -Math.PI / 2 + (2 * Math.PI * position) / ordered.length;
      const marker = placed[index];
      if (!marker) return;
      marker.drawX = cx + radius * Math.cos(angle);
      marker.drawY = cy + radius * Math.sin(angle);
      marker.displaced = true;
    });
  }
  return placed;
}

/**
 * Where to put a band's label: `offset` pixels to one side or the other of `anchor`, across the
 * band's direction (from `from` to `to`), on the side whose nearest marker is farther away.
 * Returns the label position and which way the text should run from it.
 */
export function placeBandLabel(
  anchor: readonly [number, number],
  from: readonly [number, number],
  to: readonly [number, number],
  markers: readonly { drawX: number; drawY: number }[],
  offset: number,
): { x: number; y: number; textAnchor: 'start' | 'end' } {
  const dx = to[0] - from[0];
  const dy = to[1] - from[1];
  const length = Math.hypot(dx, dy) || 1;
  // A unit normal to the band; which side it points to does not matter, both sides are tried.
  const nx = -dy / length;
  const ny = dx / length;
  const candidates = [1, -1].map((side) => {
    const x = anchor[0] + side * offset * nx;
    const y = anchor[1] + side * offset * ny;
    const clearance = markers.reduce((nearest, marker) => Math.min(nearest, Math.hypot(marker.drawX - x, marker.drawY - y)), Infinity);
    return { x, y, clearance, textAnchor: x >= anchor[0] ? ('start' as const) : ('end' as const) };
  });
  // On a tie (nothing near either side) the label goes right, where text reads away from the band.
  const [right, left] = [...candidates].sort((a, b) => b.x - a.x);
  const best = !left || (right && right.clearance >= left.clearance) ? right : left;
  return best ? { x: best.x, y: best.y, textAnchor: best.textAnchor } : { x: anchor[0], y: anchor[1], textAnchor: 'start' };
}

/**
 * A label kept inside a `width` x `height` frame less `margin`: its anchor point moved in so a
 * text of `textWidth` x `lineCount` lines (about 13 px each) running the anchor's way is not cut
 * by the frame's edge; when it would still run out it turns to run the other way.
 */
export function keepLabelInFrame(
  label: { x: number; y: number; textAnchor: 'start' | 'end' },
  textWidth: number,
  lineCount: number,
  width: number,
  height: number,
  margin: number,
): { x: number; y: number; textAnchor: 'start' | 'end' } {
  let { x, textAnchor } = label;
  if (textAnchor === 'start' && x + textWidth > width - margin) {
    textAnchor = 'end';
    x = Math.min(x, width - margin);
  } else if (textAnchor === 'end' && x - textWidth < margin) {
    textAnchor = 'start';
    x = Math.max(x, margin);
  }
  if (textAnchor === 'start') x = Math.max(margin, Math.min(x, width - margin - textWidth));
  else x = Math.min(width - margin, Math.max(x, margin + textWidth));
  const lineHeight = 13;
  const y = Math.max(margin + lineHeight, Math.min(label.y, height - margin - lineHeight * (lineCount - 1)));
  return { x, y, textAnchor };
}
