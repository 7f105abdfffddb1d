import { AgeModelResult, AgeModelSettings, runAgeModel } from '../chronology/age-model/age-model';
import { AgeModelInput } from '../chronology/age-model/column';
import { HemipelagicRunSettings, runHemipelagicModel } from '../chronology/age-model/hemipelagic/hemipelagic-model';
import { computeTask } from '../jobs/compute-task';

/** What an age model run's computation thread is given. */
export interface AgeModelComputeInput {
  input: AgeModelInput;
  /** `depthModel` picks the model; absent (older runs) is ORDER_ONLY. */
  settings: AgeModelSettings & { depthModel?: 'ORDER_ONLY' | 'HEMIPELAGIC_RATE'; hemipelagic?: HemipelagicRunSettings['hemipelagic'] };
}

/**
 * The age model of one site (chronology/age-model), run in a worker thread: the Bayesian ordering
 * model, or for HEMIPELAGIC_RATE the hemipelagic rate model of a core.
 */
export const ageModelCompute = computeTask(__filename, 'ageModelCompute', (request: AgeModelComputeInput, onProgress): AgeModelResult =>
  request.settings.depthModel === 'HEMIPELAGIC_RATE'
    ? runHemipelagicModel(request.input, request.settings, { onProgress })
    : runAgeModel(request.input, request.settings, { onProgress }),
);
