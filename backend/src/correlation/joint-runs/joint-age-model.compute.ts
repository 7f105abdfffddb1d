import { computeTask } from '../../jobs/compute-task';
import { runJointChain, summariseJointChains } from '../../chronology/joint-age-model/joint-age-model';
import type { JointAgeModelResult, JointChainDraws, JointChainSettings, JointModelInput } from '../../chronology/joint-age-model/types';

/** What one chain's computation thread is given. */
export interface JointChainComputeInput {
  input: JointModelInput;
  settings: JointChainSettings;
}

/** One chain of a joint age model run (chronology/joint-age-model), run in a worker thread. */
export const jointChainCompute = computeTask(__filename, 'jointChainCompute', (request: JointChainComputeInput, onProgress): JointChainDraws =>
  runJointChain(request.input, request.settings, { onProgress }),
);

/** What the summary of a run's chains is given. */
export interface JointSummaryComputeInput {
  input: JointModelInput;
  chains: JointChainDraws[];
  maxStoredDraws: number;
}

/** Every chain of a run turned into its posteriors, diagnostics and stored joint draws, in a worker thread. */
export const jointSummaryCompute = computeTask(__filename, 'jointSummaryCompute', (request: JointSummaryComputeInput): JointAgeModelResult =>
  summariseJointChains(request.input, request.chains, { maxStoredDraws: request.maxStoredDraws }),
);
