/** A unit of a core as the depth conversion needs it. */
export type DepthUnit = { topDepthM: number; baseDepthM: number; facies: string };

/**
 * Event-free depth: true depth with every turbidite's thickness above it removed, so hemipelagic
 * mud alone measures time (Goldfinger et al. 2012, USGS Professional Paper 1661-F, for the
 * practice). A depth inside a turbidite maps to the bed's top.
 */
export function eventFreeDepth(units: readonly DepthUnit[], depthM: number): number {
  let removed = 0;
  for (const unit of units) {
    if (unit.facies !== 'TURBIDITE' || unit.topDepthM >= depthM) continue;
    removed += Math.min(depthM, unit.baseDepthM) - unit.topDepthM;
  }
  return depthM - removed;
}
