import { SegmentedControl } from '@blueprintjs/core';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { AGE_SCALES, ageScaleLabel, type AgeScale } from '@/modules/ages/utils/formatAge';

const OPTIONS = AGE_SCALES.map((scale) => ({ value: scale, label: ageScaleLabel(scale) }));

/** The global switch between cal BP and CE/BCE. */
export function AgeScaleSwitch() {
  const { scale, setScale } = useAgeScale();
  const handleValueChange = (value: string) => setScale(value as AgeScale);
  return (
    <SegmentedControl
      className="sc-age-switch"
      size="small"
      options={OPTIONS}
      value={scale}
      onValueChange={handleValueChange}
      aria-label="Show ages as"
    />
  );
}
