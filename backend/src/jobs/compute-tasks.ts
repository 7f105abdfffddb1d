/**
 * The long computations a worker runs, as plain functions of plain data, so they can run in a
 * worker thread (structured-cloned in and out) or inline in tests.
 */
import { makeThumbnail, Thumbnail, ThumbnailContentType } from '../attachments/thumbnail';
import { AgeModelResult, AgeModelSettings, runAgeModel } from '../chronology/age-model/age-model';
import { AgeModelInput } from '../chronology/age-model/column';
import { HemipelagicRunSettings, runHemipelagicModel } from '../chronology/age-model/hemipelagic/hemipelagic-model';
import {
  computeRecurrence,
  RecurrenceComputeSettings,
  RecurrenceSource,
  StoredRecurrenceResults,
} from '../recurrence/recurrence-results';

export interface AgeModelRequest {
  kind: 'age-model';
  input: AgeModelInput;
  /** `depthModel` picks the model; absent (older runs) is ORDER_ONLY. */
  settings: AgeModelSettings & { depthModel?: 'ORDER_ONLY' | 'HEMIPELAGIC_RATE'; hemipelagic?: HemipelagicRunSettings['hemipelagic'] };
}

export interface RecurrenceRequest {
  kind: 'recurrence';
  source: RecurrenceSource;
  settings: RecurrenceComputeSettings;
}

export interface ThumbnailRequest {
  kind: 'thumbnail';
  bytes: Uint8Array;
  contentType: ThumbnailContentType;
}

export type ComputeRequest = AgeModelRequest | RecurrenceRequest | ThumbnailRequest;

export type ComputeResult<K extends ComputeRequest['kind']> = K extends 'age-model'
  ? AgeModelResult
  : K extends 'recurrence'
    ? StoredRecurrenceResults
    : K extends 'thumbnail'
      ? Thumbnail
      : never;

export function runCompute(request: ComputeRequest, onProgress: (fraction: number) => void): ComputeResult<ComputeRequest['kind']> {
  switch (request.kind) {
    case 'age-model':
      return request.settings.depthModel === 'HEMIPELAGIC_RATE'
        ? runHemipelagicModel(request.input, request.settings, { onProgress })
        : runAgeModel(request.input, request.settings, { onProgress });
    case 'recurrence':
      return computeRecurrence(request.source, request.settings, onProgress);
    case 'thumbnail':
      return makeThumbnail(request.bytes, request.contentType);
  }
}
