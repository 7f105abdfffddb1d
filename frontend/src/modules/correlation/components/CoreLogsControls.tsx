import { Callout, HTMLSelect, Intent, Spinner, Switch } from '@blueprintjs/core';
import type { ChangeEvent } from 'react';
import type { LadderCoreLogsState } from '@/modules/correlation/hooks/useLadderCoreLogs';

export type CoreLogsToggleProps = { state: LadderCoreLogsState; coreCount: number };

/** The toolbar's switch for core logs on the ladder and, once on, the channel drawn. */
export function CoreLogsToggle({ state, coreCount }: CoreLogsToggleProps) {
  const handleShown = () => state.setShown(!state.shown);
  const handleChannel = (event: ChangeEvent<HTMLSelectElement>) => state.setChannel(event.target.value);
  return (
    <>
      <Switch checked={state.shown} onChange={handleShown} label="Core logs" disabled={coreCount === 0} inline />
      {state.shown && state.channels.length > 0 && (
        <HTMLSelect value={state.channel ?? ''} onChange={handleChannel} aria-label="Log channel" options={state.channels} />
      )}
      {state.loading && <Spinner size={16} />}
    </>
  );
}

export type CoreLogsCaptionProps = { state: LadderCoreLogsState; pixelsPerMetre: number };

/** How the logs are placed on the ladder's time axis, said once under the toolbar while they show. */
export function CoreLogsCaption({ state, pixelsPerMetre }: CoreLogsCaptionProps) {
  if (!state.shown) return null;
  if (state.error)
    return (
      <Callout intent={Intent.DANGER} className="sc-form-callout">
        The core logs could not be loaded: {state.error.message}
      </Callout>
    );
  if (!state.loading && state.channels.length === 0) return <p className="sc-chart-legend">No core on the ladder has a log yet (a core's Logs tab takes one).</p>;
  return (
    <p className="sc-chart-legend sc-core-log-caption">
      Core logs ({state.channel}
      {state.unit ? `, ${state.unit}` : ''}): left of each core's axis, every turbidite's readings are drawn with the bed's base at its event's median age
      and its thickness at <span className="num">{Math.round(pixelsPerMetre)}</span> px per metre (one scale for all cores), lowest reading of the core
      at the left of the lane, highest at the right. Mud between beds has no age of its own here and is left out.
      {state.withoutLog > 0 && ` ${state.withoutLog} core(s) have no log.`}
    </p>
  );
}
