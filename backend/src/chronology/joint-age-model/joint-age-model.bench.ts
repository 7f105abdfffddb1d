/**
 * Speed and mixing of the joint age model on the demo's preferred hypothesis (Velmora Margin): every
 * site of the demo with its dated samples calibrated as the app does (`calibrationForSample`), the
 * hypothesis's ties grouped into regional events, cores given HEMIPELAGIC_RATE (modelled by their
 * column's order: see joint-age-model.ts). Four chains at the site model's default settings, run
 * one after another on one core, then two at a time on two worker threads (as two job workers
 * would). Called by the bench script.
 */
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { generateDemoScenario } from '../../demo/generate';
import { builtInCurve } from '../../reference-data/reference-data';
import { calibrationForSample } from '../calibration/sample-calibration';
import { DEFAULT_JOINT_CHAIN_SETTINGS, runJointChain, summariseJointChains } from './joint-age-model';
import type { JointChainDraws, JointChainSettings, JointModelInput, JointRegionalEventInput, JointSiteInput } from './types';

export interface JointAgeModelBench {
  readonly sites: number;
  readonly regionalEvents: number;
  readonly siteEvents: number;
  readonly samples: number;
  readonly chains: number;
  /** Four chains one after another on one core. */
  readonly seconds: number;
  readonly cpuSeconds: number;
  /** The same four chains two at a time on two worker threads; null when run from TypeScript sources. */
  readonly twoWorkerSeconds: number | null;
  readonly minEss: number;
  readonly maxRhat: number;
  readonly minRegionalEss: number;
}

/** The demo's preferred hypothesis as a joint model input. */
export function demoJointInput(): JointModelInput {
  const curves = { intcal20: builtInCurve('INTCAL20'), marine20: builtInCurve('MARINE20') };
  const scenario = generateDemoScenario(undefined, curves);
  const lookup = (code: string) => (code === 'INTCAL20' ? curves.intcal20 : code === 'MARINE20' ? curves.marine20 : undefined);
  const sites: JointSiteInput[] = scenario.sites.map((site) => ({
    siteId: site.key,
    siteName: site.name,
    depthModel: site.kind === 'CORE' ? 'HEMIPELAGIC_RATE' : 'ORDER_ONLY',
    column: {
      units: site.units.map((u) => ({
        id: u.key,
        name: u.name,
        position: u.position,
        topDepthM: u.topDepthM,
        baseDepthM: u.baseDepthM,
        facies: u.facies,
      })),
      eventHorizons: site.eventHorizons.map((h) => ({ id: h.key, name: h.name, unitBelowId: h.unitBelowKey, unitAboveId: h.unitAboveKey })),
      samples: site.samples.map((s) => ({
        id: s.labCode,
        name: s.labCode,
        unitId: s.unitKey,
        depthM: s.depthM,
        ageRelation: s.ageRelation,
        likelihood: calibrationForSample(s, lookup).density,
      })),
      orderSamplesByDepth: site.kind === 'CORE',
    },
  }));
  // Regional events: the connected groups of the preferred hypothesis's ties (union-find).
  const hypothesis = scenario.hypotheses.find((h) => h.preferred);
  if (!hypothesis) throw new Error('the demo has no preferred hypothesis');
  const key = (ref: { siteKey: string; horizonKey: string }) => `${ref.siteKey}\u0000${ref.horizonKey}`;
  const parent = new Map<string, string>();
  const find = (x: string): string => {
    let root = x;
    while ((parent.get(root) ?? root) !== root) root = parent.get(root) as string;
    parent.set(x, root);
    return root;
  };
  for (const tie of hypothesis.ties) {
    const a = find(key(tie.eventAKey));
    const b = find(key(tie.eventBKey));
    if (a !== b) parent.set(a, b);
  }
  const groups = new Map<string, { siteId: string; eventHorizonId: string }[]>();
  for (const site of scenario.sites) {
    for (const horizon of site.eventHorizons) {
      const k = key({ siteKey: site.key, horizonKey: horizon.key });
      if (!parent.has(k)) continue;
      const root = find(k);
      const list = groups.get(root) ?? [];
      list.push({ siteId: site.key, eventHorizonId: horizon.key });
      groups.set(root, list);
    }
  }
  const regionalEvents: JointRegionalEventInput[] = [...groups.values()].map((members, k) => ({
    regionalEventId: `regional-${k + 1}`,
    name: `R${k + 1}`,
    members,
  }));
  return { sites, regionalEvents };
}

const SETTINGS: Omit<JointChainSettings, 'chainIndex'> = { ...DEFAULT_JOINT_CHAIN_SETTINGS, seed: 7 };

function runOnWorker(input: JointModelInput, chainIndices: readonly number[]): Promise<JointChainDraws[]> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(join(__dirname, 'joint-age-model.bench-thread.js'), { workerData: { input, settings: SETTINGS, chainIndices } });
    worker.once('message', (draws: JointChainDraws[]) => resolve(draws));
    worker.once('error', reject);
  });
}

export async function benchJointAgeModel(): Promise<JointAgeModelBench> {
  const input = demoJointInput();
  const chains = 4;
  const started = process.hrtime.bigint();
  const cpuStarted = process.cpuUsage();
  const draws = Array.from({ length: chains }, (_, chainIndex) => runJointChain(input, { ...SETTINGS, chainIndex }));
  const result = summariseJointChains(input, draws, { maxStoredDraws: 2_000 });
  const cpu = process.cpuUsage(cpuStarted);
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;

  let twoWorkerSeconds: number | null = null;
  if (__filename.endsWith('.js')) {
    const twoStarted = process.hrtime.bigint();
    const halves = await Promise.all([runOnWorker(input, [0, 2]), runOnWorker(input, [1, 3])]);
    summariseJointChains(input, halves.flat(), { maxStoredDraws: 2_000 });
    twoWorkerSeconds = Number(process.hrtime.bigint() - twoStarted) / 1e9;
  }
  return {
    sites: input.sites.length,
    regionalEvents: input.regionalEvents.length,
    siteEvents: result.siteEvents.length,
    samples: result.samples.length,
    chains,
    seconds,
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
    twoWorkerSeconds,
    minEss: result.diagnostics.minEss,
    maxRhat: result.diagnostics.maxRhat,
    minRegionalEss: Math.min(...result.regionalEvents.map((r) => r.ess)),
  };
}
