import { computeTask } from '../jobs/compute-task';
import { computeRecurrence, RecurrenceComputeSettings, RecurrenceSource, StoredRecurrenceResults } from './recurrence-results';

/** What a recurrence analysis' computation thread is given. */
export interface RecurrenceComputeInput {
  source: RecurrenceSource;
  settings: RecurrenceComputeSettings;
}

/** The recurrence Monte Carlo and renewal fits of one analysis (recurrence-results), run in a worker thread. */
export const recurrenceCompute = computeTask(
  __filename,
  'recurrenceCompute',
  (request: RecurrenceComputeInput, onProgress): StoredRecurrenceResults => computeRecurrence(request.source, request.settings, onProgress),
);
