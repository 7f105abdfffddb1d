import { HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { AgeRangesValue, AgeValue } from '@/modules/ages/components/AgeValues';
import { regionalAges, type RegionalAgeFields } from '@/modules/correlation/utils/jointRun';
import '@/modules/correlation/components/joint-run.css';

export type RegionalEventAgesProps = { event: RegionalAgeFields };

/**
 * A regional event's two ages side by side: from the hypothesis' joint age model run (one age
 * shared by every member's column) and independent (the product of the members' own site
 * posteriors), marking the one shown elsewhere (the joint age while a fresh joint run exists).
 */
export function RegionalEventAges({ event }: RegionalEventAgesProps) {
  const ages = regionalAges(event);
  const rows = ages.jointShown ? [ages.shown, ages.other] : [ages.other, ages.shown];
  return (
    <HTMLTable compact className="sc-regional-ages">
      <thead>
        <tr>
          <th />
          <th>Median</th>
          <th>95.4 %</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((age) => (
          <tr key={age.label}>
            <th scope="row">
              {age.label}{' '}
              {age === ages.shown && (
                <Tag minimal intent={Intent.PRIMARY}>
                  shown
                </Tag>
              )}
            </th>
            <td>{age.medianCalBp === null ? <span className="sc-chart-legend">{age.missing}</span> : <AgeValue calBp={age.medianCalBp} />}</td>
            <td>{age.medianCalBp === null ? '–' : <AgeRangesValue ranges={age.hpd95} />}</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
