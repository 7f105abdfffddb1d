/**
 * The long computations a worker runs, as plain functions of plain data, so they can run in a
 * worker thread (structured-cloned in and out) or inline in tests.
 */
import { AgeModelResult, AgeModelSettings, runAgeModel } from '../chronology/age-model/age-model';
import { AgeModelInput } from '../chronology/age-model/column';

export interface AgeModelRequest {
  kind: 'age-model';
  input: AgeModelInput;
  settings: AgeModelSettings;
}

export type ComputeRequest = AgeModelRequest;

export type ComputeResult<K extends ComputeRequest['kind']> = K extends 'age-model' ? AgeModelResult : never;

export function runCompute(request: ComputeRequest, onProgress: (fraction: number) => void): ComputeResult<ComputeRequest['kind']> {
  switch (request.kind) {
    case 'age-model':
      return runAgeModel(request.input, request.settings, { onProgress });
  }
}
