import { Callout, Classes, HTMLTable, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { listedRanges } from '@/modules/calibration/utils/calibrationChart';
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

/**
 * Where the probability lies: each range oldest first with a bar as long as its share, and any
 * single-year slivers summed on one line instead of listed as if they were dates.
 */
function ShareList({ ranges, colour }: { ranges: readonly HpdRange[]; colour: string }) {
  const { range } = useAgeScale();
  const { ranges: listed, sliverShare } = listedRanges(ranges);
  return (
    <ul className="sc-share-list">
      {listed.map((hpd) => (
        <li key={`${hpd.olderCalBp}-${hpd.youngerCalBp}`}>
          <span className="num">{range(hpd.olderCalBp, hpd.youngerCalBp)}</span>
          <span className="sc-share-bar" aria-hidden>
            <span style={{ width: `${Math.round(hpd.probability * 100)}%`, background: colour }} />
          </span>
          <span className="num sc-share-value">{(hpd.probability * 100).toFixed(1)} %</span>
        </li>
      ))}
      {sliverShare > 0 && (
        <li className={Classes.TEXT_MUTED}>
          and <span className="num">{(sliverShare * 100).toFixed(1)} %</span> in single-year slivers
        </li>
      )}
    </ul>
  );
}

/** The calibrated ages as numbers: median, mean and spread, and where the 68.3 % and 95.4 % of the probability lie. */
export function CalibrationRanges({ summaries }: CalibrationRangesProps) {
  const { age } = useAgeScale();
  return (
    <div className="sc-calibration-ranges">
      <HTMLTable compact className="sc-table sc-table-fill">
        <thead>
          <tr>
            <th>Sample</th>
            <th className="sc-numeric">Median</th>
            <th className="sc-numeric">Mean ± sd</th>
            <th>Most likely 68.3 %</th>
            <th>Most likely 95.4 %</th>
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
                <ShareList ranges={summary.hpd68} colour={summary.colour} />
              </td>
              <td>
                <ShareList ranges={summary.hpd95} colour={summary.colour} />
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
