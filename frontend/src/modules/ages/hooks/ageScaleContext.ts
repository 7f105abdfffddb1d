import { createContext } from 'react';
import type { AgeScale } from '@/modules/ages/utils/formatAge';

export type AgeScaleContextValue = {
  scale: AgeScale;
  setScale: (scale: AgeScale) => void;
};

/** The reader's choice of cal BP or CE/BCE; AgeScaleProvider supplies it. */
export const AgeScaleContext = createContext<AgeScaleContextValue | null>(null);
