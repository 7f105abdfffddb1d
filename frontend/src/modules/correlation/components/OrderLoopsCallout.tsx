import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { orderLoopKey } from '@/modules/correlation/utils/ladderOverlays';

export type OrderLoopsCalloutProps = {
  loops: readonly { regionalEventIds: readonly string[]; message: string }[];
  selectedKey: string | null;
  onSelect: (key: string | null) => void;
};

/**
 * The order loops of a hypothesis in words, each with a button that picks it out on the ladder
 * (pressed again, every loop is drawn alike). Nothing shows when the order holds.
 */
export function OrderLoopsCallout({ loops, selectedKey, onSelect }: OrderLoopsCalloutProps) {
  if (loops.length === 0) return null;
  return (
    <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} title={`${loops.length} order loop(s): these ties cannot all hold`} className="sc-form-callout sc-order-loops">
      <ol>
        {loops.map((loop, index) => {
          const key = orderLoopKey(loop);
          const chosen = key === selectedKey;
          const handleClick = () => onSelect(chosen ? null : key);
          return (
            <li key={key}>
              <Button
                size="small"
                variant={chosen ? 'solid' : 'outlined'}
                intent={chosen ? Intent.WARNING : Intent.NONE}
                icon={IconNames.HIGHLIGHT}
                text={`loop ${index + 1}`}
                aria-pressed={chosen}
                title={chosen ? 'Draw every loop alike' : 'Pick this loop out on the ladder'}
                onClick={handleClick}
              />{' '}
              {loop.message}
            </li>
          );
        })}
      </ol>
      <p className="sc-chart-legend">On the ladder a loop is its ties and, along each column, the step from the older member up to the younger one, drawn in a long-short dash.</p>
    </Callout>
  );
}
