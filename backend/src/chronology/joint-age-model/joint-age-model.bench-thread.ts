/** Worker-thread entry of the joint age model benchmark: runs the given chains and posts their draws. */
import { parentPort, workerData } from 'node:worker_threads';
import { runJointChain } from './joint-age-model';
import type { JointChainSettings, JointModelInput } from './types';

const { input, settings, chainIndices } = workerData as {
  input: JointModelInput;
  settings: Omit<JointChainSettings, 'chainIndex'>;
  chainIndices: number[];
};
parentPort?.postMessage(chainIndices.map((chainIndex) => runJointChain(input, { ...settings, chainIndex })));
