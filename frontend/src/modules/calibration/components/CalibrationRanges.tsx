import { Callout, Classes, HTMLTable, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import type { HpdRange } from './CalibrationChart';

export type CalibrationSummary = {
  label: string;
  colour: string;
  medianCalBp: number;
  meanCalBp?: number;
  sdYears?: number;
  hpd68: readonly HpdRange[];
  hpd95: readonly HpdRange[];
  warnings: readonly string[];
};

export type CalibrationRangesProps = {
  summaries: readonly CalibrationSummary[];
};

/** Ranges oldest first, each with its share of the probability. */
function RangeList({ ranges }: { ranges: readonly HpdRange[] }) {
  const { range } = useAgeScale();
  return (
    <ul className="sc-range-list">
      {[...ranges]
        .sort((a, b) => b.olderCalBp - a.olderCalBp)
        .map((hpd) => (
          <li key={`${hpd.olderCalBp}-${hpd.youngerCalBp}`} className="num">
            {range(hpd.olderCalBp, hpd.youngerCalBp)} <span className={Classes.TEXT_MUTED}>{(hpd.probability * 100).toFixed(1)} %</span>
          </li>
        ))}
    </ul>
  );
}

/** The calibrated ages as numbers: median, mean and spread, and the 68.3 % and 95.4 % ranges. */
export function CalibrationRanges({ summaries }: CalibrationRangesProps) {
  const { age } = useAgeScale();
  return (
    <div className="sc-calibration-ranges">
      <HTMLTable compact className="sc-table sc-table-fill">
        <thead>
          <tr>
            <th>Age</th>
            <th className="sc-numeric">Median</th>
            <th className="sc-numeric">Mean ± sd</th>
            <th>68.3 % ranges</th>
            <th>95.4 % ranges</th>
          </tr>
        </thead>
        <tbody>
          {summaries.map((summary) => (
            <tr key={summary.label}>
              <td>
                <span className="sc-swatch" style={{ background: summary.colour }} />
                <span className="num">{summary.label}</span>
              </td>
              <td className="num sc-numeric">{age(summary.medianCalBp)}</td>
              <td className="num sc-numeric">
                {summary.meanCalBp !== undefined && summary.sdYears !== undefined ? `${age(summary.meanCalBp)} ± ${Math.round(summary.sdYears)}` : '–'}
              </td>
              <td>
                <RangeList ranges={summary.hpd68} />
              </td>
              <td>
                <RangeList ranges={summary.hpd95} />
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      {summaries.flatMap((summary) => summary.warnings.map((warning) => ({ label: summary.label, warning }))).map(({ label, warning }) => (
        <Callout key={`${label}-${warning}`} intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} compact className="sc-form-callout">
          <span className="num">{label}</span>: {warning}
        </Callout>
      ))}
    </div>
  );
}
