import {
  BUNDLE_FORMAT,
  BUNDLE_VERSION,
  BundleEventHorizon,
  BundleHypothesis,
  BundleProject,
  BundleSample,
  BundleSegment,
  BundleSite,
  BundleTie,
  BundleUnit,
  ProjectBundle,
} from './bundle-format';
import { sampleMeasurements } from '../samples/sample-rules';

/** A project's records as the database holds them (ids instead of refs); extra columns are ignored. */
export interface ProjectRecords {
  project: BundleProject;
  segments: (Omit<BundleSegment, 'ref'> & { id: string })[];
  sites: (Omit<BundleSite, 'ref' | 'segmentRef'> & { id: string; segmentId: string | null })[];
  units: (Omit<BundleUnit, 'ref' | 'siteRef'> & { id: string; siteId: string })[];
  eventHorizons: (Omit<BundleEventHorizon, 'ref' | 'siteRef' | 'unitBelowRef' | 'unitAboveRef'> & {
    id: string;
    siteId: string;
    unitBelowId: string;
    unitAboveId: string;
  })[];
  samples: (Omit<BundleSample, 'ref' | 'siteRef' | 'unitRef' | 'curve' | 'method' | 'material' | 'ageRelation'> & {
    id: string;
    siteId: string;
    unitId: string;
    curve: string | null;
    method: BundleSample['method'];
    material: BundleSample['material'];
    ageRelation: BundleSample['ageRelation'];
  })[];
  hypotheses: (Omit<BundleHypothesis, 'ref' | 'copiedFromRef'> & { id: string; copiedFromId: string | null })[];
  ties: (Omit<BundleTie, 'ref' | 'hypothesisRef' | 'eventARef' | 'eventBRef'> & {
    id: string;
    hypothesisId: string;
    eventAId: string;
    eventBId: string;
  })[];
}

type Key = (string | number | null)[];

function compareKeys(a: Key, b: Key): number {
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    const x = a[i] ?? '';
    const y = b[i] ?? '';
    if (x === y) continue;
    if (typeof x === 'number' && typeof y === 'number') return x - y;
    return String(x) < String(y) ? -1 : 1;
  }
  return 0;
}

/** Sort by content keys, the id last, so the same data gives the same order in any database. */
function sortBy<T extends { id: string }>(rows: readonly T[], key: (row: T) => Key): T[] {
  return [...rows].sort((a, b) => compareKeys([...key(a), a.id], [...key(b), b.id]));
}

/**
 * The bundle of a project: each record with the fields a person entered, refs set to the
 * database ids, records in an order fixed by their content (segments along strike, sites along
 * strike then by name, units by site then position, events by site then the units they lie
 * between, samples by lab code, hypotheses by name, ties by hypothesis then events).
 */
export function buildBundle(records: ProjectRecords, exportedAt: Date): ProjectBundle {
  const segments = sortBy(records.segments, (s) => [s.startKm, s.endKm, s.name]);
  const sites = sortBy(records.sites, (s) => [s.alongStrikeKm, s.name, s.latitude, s.longitude]);
  const siteOrder = new Map(sites.map((s, i) => [s.id, i]));
  const units = sortBy(records.units, (u) => [siteOrder.get(u.siteId) ?? -1, u.position]);
  const unitPosition = new Map(records.units.map((u) => [u.id, u.position]));
  const eventHorizons = sortBy(records.eventHorizons, (h) => [
    siteOrder.get(h.siteId) ?? -1, unitPosition.get(h.unitBelowId) ?? -1, unitPosition.get(h.unitAboveId) ?? -1, h.name, h.quality,
  ]);
  const eventOrder = new Map(eventHorizons.map((h, i) => [h.id, i]));
  const samples = sortBy(records.samples, (s) => [s.labCode]);
  const hypotheses = sortBy(records.hypotheses, (h) => [h.name, h.description, h.preferred ? 1 : 0]);
  const hypothesisOrder = new Map(hypotheses.map((h, i) => [h.id, i]));
  // A hypothesis copied from another project's keeps no link: the bundle stands alone.
  const copiedFrom = (id: string | null) => (id !== null && hypothesisOrder.has(id) ? id : null);
  const ties = sortBy(records.ties, (t) => [
    hypothesisOrder.get(t.hypothesisId) ?? -1, eventOrder.get(t.eventAId) ?? -1, eventOrder.get(t.eventBId) ?? -1,
  ]);

  return {
    format: BUNDLE_FORMAT,
    version: BUNDLE_VERSION,
    exportedAt: exportedAt.toISOString(),
    project: { name: records.project.name, description: records.project.description ?? null, tectonicSetting: records.project.tectonicSetting },
    segments: segments.map((s) => ({ ref: s.id, name: s.name, startKm: s.startKm, endKm: s.endKm, notes: s.notes ?? null })),
    sites: sites.map((s) => ({
      ref: s.id,
      segmentRef: s.segmentId,
      name: s.name,
      kind: s.kind,
      latitude: s.latitude,
      longitude: s.longitude,
      alongStrikeKm: s.alongStrikeKm,
      elevationM: s.elevationM ?? null,
      waterDepthM: s.waterDepthM ?? null,
      notes: s.notes ?? null,
    })),
    units: units.map((u) => ({
      ref: u.id,
      siteRef: u.siteId,
      position: u.position,
      name: u.name,
      topDepthM: u.topDepthM,
      baseDepthM: u.baseDepthM,
      facies: u.facies,
      basalErosionM: u.basalErosionM ?? null,
      notes: u.notes ?? null,
    })),
    eventHorizons: eventHorizons.map((h) => ({
      ref: h.id,
      siteRef: h.siteId,
      name: h.name,
      unitBelowRef: h.unitBelowId,
      unitAboveRef: h.unitAboveId,
      quality: h.quality,
      evidence: [...h.evidence],
      notes: h.notes ?? null,
    })),
    samples: samples.map((s) => ({
      ref: s.id,
      siteRef: s.siteId,
      unitRef: s.unitId,
      ...sampleMeasurements(s),
      excluded: s.excluded,
      exclusionReason: s.exclusionReason ?? null,
    })),
    hypotheses: hypotheses.map((h) => ({
      ref: h.id,
      name: h.name,
      description: h.description ?? null,
      preferred: h.preferred,
      copiedFromRef: copiedFrom(h.copiedFromId),
    })),
    ties: ties.map((t) => ({
      ref: t.id,
      hypothesisRef: t.hypothesisId,
      eventARef: t.eventAId,
      eventBRef: t.eventBId,
      confidence: t.confidence,
      evidence: [...t.evidence],
      note: t.note ?? null,
    })),
  };
}
