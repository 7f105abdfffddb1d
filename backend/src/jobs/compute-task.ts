/**
 * A long, synchronous computation that a worker runs in a worker thread: a plain function of
 * plain (structured-cloneable) data, defined in its feature's folder. The thread finds it again by
 * the file that defines it and its export name, so this folder never imports a feature.
 * No framework imports here: the thread loads this file and the task's file, nothing else.
 */
export interface ComputeTask<Input, Output> {
  /** The compiled module that exports the task (its `__filename`). */
  readonly file: string;
  /** The name the module exports it under. */
  readonly exportName: string;
  /** The computation; `onProgress` receives the share done (0-1). */
  run(input: Input, onProgress: (fraction: number) => void): Output;
}

/** A compute task exported as `exportName` from `file` (pass `__filename`). */
export function computeTask<Input, Output>(
  file: string,
  exportName: string,
  run: (input: Input, onProgress: (fraction: number) => void) => Output,
): ComputeTask<Input, Output> {
  return { file, exportName, run };
}

/** What a computation thread is started with. */
export interface ComputeThreadData {
  file: string;
  exportName: string;
  input: unknown;
}
