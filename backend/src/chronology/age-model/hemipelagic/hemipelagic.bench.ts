/**
 * Speed and mixing of the hemipelagic depth model on the demo's longest core (by depth), its foram
 * levels calibrated on Marine20 with their Delta-R, 4 chains at the default settings. Called by the
 * bench script.
 */
import { generateDemoScenario } from '../../../demo/generate';
import { builtInCurve } from '../../../reference-data/reference-data';
import { calibrateRadiocarbon } from '../../calibration/calibrate';
import { AgeModelInput } from '../column';
import { calibratedGrid, ReservoirSource, reservoirSources, SampleReservoir } from '../reservoir-offsets';
import { runHemipelagicModel } from './hemipelagic-model';

export interface HemipelagicBench {
  readonly site: string;
  readonly seconds: number;
  readonly cpuSeconds: number;
  readonly minEss: number;
  readonly maxRhat: number;
  readonly events: number;
  readonly levels: number;
  readonly sections: number;
}

/** The demo's longest core as the service hands it to the model (shared Delta-R offsets included). */
export function demoLongestCore(): { site: string; input: AgeModelInput } {
  const curves = { intcal20: builtInCurve('INTCAL20'), marine20: builtInCurve('MARINE20') };
  const scenario = generateDemoScenario(undefined, curves);
  const cores = scenario.sites.filter((s) => s.kind === 'CORE');
  const depthOf = (site: (typeof cores)[number]) => Math.max(...site.units.map((u) => u.baseDepthM));
  const site = cores.reduce((a, b) => (depthOf(b) > depthOf(a) ? b : a));
  const input: AgeModelInput = {
    units: site.units.map((u) => ({
      id: u.key, name: u.name, position: u.position, topDepthM: u.topDepthM, baseDepthM: u.baseDepthM, facies: u.facies,
      basalErosionM: u.basalErosionM,
    })),
    eventHorizons: site.eventHorizons.map((h) => ({ id: h.key, name: h.name, unitBelowId: h.unitBelowKey, unitAboveId: h.unitAboveKey })),
    samples: site.samples
      .filter((s) => s.c14Age !== null && s.curve !== null)
      .map((s) => ({
        id: s.labCode, name: s.labCode, unitId: s.unitKey, depthM: s.depthM, ageRelation: s.ageRelation,
        likelihood: calibrateRadiocarbon({
          c14Age: s.c14Age!, c14Error: s.c14Error!, curve: s.curve === 'MARINE20' ? curves.marine20 : curves.intcal20,
          deltaR: s.deltaR, deltaRError: s.deltaRError,
        }).density,
      })),
    orderSamplesByDepth: true,
  };
  // As the service does: marine levels with one Delta-R share one offset (reservoir-offsets.ts).
  const marine = site.samples.filter((s) => s.c14Age !== null && s.curve === 'MARINE20' && s.deltaR !== null);
  const { sources, keyOf } = reservoirSources(
    marine.map((s) => ({ id: s.labCode, name: s.labCode, deltaR: s.deltaR!, deltaRError: s.deltaRError ?? 0, source: null })),
  );
  const reservoirSourcesKept: ReservoirSource[] = [];
  const bySample = new Map<string, SampleReservoir>();
  for (const source of sources) {
    const members = marine.filter((s) => keyOf.get(s.labCode) === source.key);
    const grids = members.map((s) =>
      source.grid.map((deltaR) => {
        try {
          return calibrateRadiocarbon({ c14Age: s.c14Age!, c14Error: s.c14Error!, curve: curves.marine20, deltaR, deltaRError: 0 });
        } catch {
          return null;
        }
      }),
    );
    const kept = calibratedGrid(source, grids);
    reservoirSourcesKept.push(kept.source);
    members.forEach((s, i) =>
      bySample.set(s.labCode, {
        sourceKey: source.key,
        gridLikelihoods: kept.perSample[i].map((g) => g.density),
        gridLogMass: kept.perSample[i].map((g) => Math.log(g.likelihoodMass!)),
      }),
    );
  }
  const shared: AgeModelInput = {
    ...input,
    samples: input.samples.map((s) => (bySample.has(s.id) ? { ...s, reservoir: bySample.get(s.id)! } : s)),
    reservoirSources: reservoirSourcesKept,
  };
  return { site: site.name, input: shared };
}

export function benchHemipelagic(): HemipelagicBench {
  const { site, input } = demoLongestCore();
  const started = process.hrtime.bigint();
  const cpuStarted = process.cpuUsage();
  const result = runHemipelagicModel(input, { seed: 7 });
  const cpu = process.cpuUsage(cpuStarted);
  return {
    site,
    seconds: Number(process.hrtime.bigint() - started) / 1e9,
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
    minEss: result.diagnostics.minEss,
    maxRhat: result.diagnostics.maxRhat,
    events: result.events.length,
    levels: result.samples.length,
    sections: result.hemipelagic.sections,
  };
}
