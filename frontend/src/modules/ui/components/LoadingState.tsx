import { Spinner, SpinnerSize } from '@blueprintjs/core';

export type LoadingStateProps = { label?: string };

/** A quiet spinner while a page or panel loads. */
export function LoadingState({ label = 'Loading' }: LoadingStateProps) {
  return (
    <div className="sc-loading" role="status" aria-label={label}>
      <Spinner size={SpinnerSize.STANDARD} />
    </div>
  );
}
