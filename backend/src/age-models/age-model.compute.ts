import { AgeModelResult, AgeModelSettings, runAgeModel } from '../chronology/age-model/age-model';
import { AgeModelInput } from '../chronology/age-model/column';
import { computeTask } from '../jobs/compute-task';

/** What an age model run's computation thread is given. */
export interface AgeModelComputeInput {
  input: AgeModelInput;
  settings: AgeModelSettings;
}

/** The Bayesian ordering model of one site (chronology/age-model), run in a worker thread. */
export const ageModelCompute = computeTask(__filename, 'ageModelCompute', (request: AgeModelComputeInput, onProgress): AgeModelResult =>
  runAgeModel(request.input, request.settings, { onProgress }),
);
