import { Button, Dialog, DialogBody, DialogFooter, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { ReactNode } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { measuredAgeText } from '@/modules/samples/utils/sampleSummary';
import { AGE_RELATION_LABELS, CURVE_LABELS, DATING_METHOD_LABELS, SAMPLE_MATERIAL_LABELS } from '@/modules/samples/utils/sampleVocabulary';
import type { SampleRow, UnitRow } from '@/modules/sites/utils/siteTypes';

export type SampleDetailDialogProps = {
  sample: SampleRow;
  units: readonly UnitRow[];
  canEdit: boolean;
  onEdit: (sample: SampleRow) => void;
  onClose: () => void;
};

/** One sample whole, read only: what the lab measured, where it sits, and its calibrated age. */
export function SampleDetailDialog({ sample, units, canEdit, onEdit, onClose }: SampleDetailDialogProps) {
  const { age, ranges } = useAgeScale();
  const unit = units.find((candidate) => candidate.id === sample.unit.id);
  const calibration = sample.calibration;
  const rows: [string, ReactNode][] = [
    ['Method', DATING_METHOD_LABELS[sample.method]],
    ['Material', SAMPLE_MATERIAL_LABELS[sample.material]],
    ['Unit', unit ? `${unit.position} · ${unit.name}` : '?'],
    ['Depth', sample.depthM == null ? '–' : `${sample.depthM.toFixed(2)} m`],
    ['Age relation', AGE_RELATION_LABELS[sample.ageRelation]],
    ['Measured', measuredAgeText(sample)],
    ...(sample.method === 'RADIOCARBON'
      ? ([
          ['Curve', sample.curve ? CURVE_LABELS[sample.curve] : '–'],
          ['Delta-R', sample.deltaR == null ? '–' : `${Math.round(sample.deltaR)} ± ${Math.round(sample.deltaRError ?? 0)} 14C yr`],
          ['δ13C', sample.delta13C == null ? '–' : `${sample.delta13C} ‰`],
        ] as [string, ReactNode][])
      : []),
    ['Median', calibration ? age(calibration.medianCalBp) : '–'],
    ['68.3 % ranges', calibration ? ranges(calibration.hpd68) : '–'],
    ['95.4 % ranges', calibration ? ranges(calibration.hpd95) : '–'],
    ['Warnings', [sample.calibrationError, ...(calibration?.warnings ?? [])].filter(Boolean).join('; ') || 'none'],
    ['Excluded', sample.excluded ? (sample.exclusionReason ?? 'yes') : 'no'],
    ['Notes', sample.notes || '–'],
  ];
  return (
    <Dialog title={`Sample ${sample.labCode}`} icon={IconNames.LAB_TEST} isOpen onClose={onClose} style={{ width: 560 }}>
      <DialogBody>
        <dl className="sc-detail-list">
          {rows.map(([term, value]) => (
            <div key={term}>
              <dt>{term}</dt>
              <dd className="num">{value}</dd>
            </div>
          ))}
        </dl>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            {canEdit && <Button icon={IconNames.EDIT} text="Edit sample" onClick={() => onEdit(sample)} />}
            <Button intent={Intent.PRIMARY} text="Close" onClick={onClose} />
          </>
        }
      />
    </Dialog>
  );
}
