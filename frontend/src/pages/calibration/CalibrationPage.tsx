import { CalibratorView } from '@/modules/calibration/components/CalibratorView';

export function CalibrationPage() {
  return <CalibratorView />;
}
