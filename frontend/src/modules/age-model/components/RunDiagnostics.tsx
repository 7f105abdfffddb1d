import { Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';

export type RunDiagnosticsProps = {
  converged: boolean;
  maxRhat: number;
  minEss: number;
  message: string;
};

/** Convergence figures of a finished run, with a clear warning when it did not converge. */
export function RunDiagnostics({ converged, maxRhat, minEss, message }: RunDiagnosticsProps) {
  return (
    <Callout
      intent={converged ? Intent.SUCCESS : Intent.WARNING}
      icon={converged ? IconNames.TICK_CIRCLE : IconNames.WARNING_SIGN}
      title={converged ? 'Chains converged' : 'Not converged: do not use these ages yet'}
      className="sc-run-diagnostics"
    >
      <div>
        max split R-hat <span className="num">{maxRhat.toFixed(3)}</span> · min effective sample size{' '}
        <span className="num">{Math.round(minEss)}</span>
      </div>
      <div>{message}</div>
      {!converged && <div>Run longer (more iterations) or with more chains, and check the flagged samples.</div>}
    </Callout>
  );
}
