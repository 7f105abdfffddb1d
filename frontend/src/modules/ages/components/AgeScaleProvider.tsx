import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { AgeScaleContext } from '@/modules/ages/hooks/ageScaleContext';
import { AGE_SCALES, type AgeScale } from '@/modules/ages/utils/formatAge';

const STORAGE_KEY = 'stratochron.ageScale';

function storedScale(): AgeScale {
  const stored = typeof localStorage === 'undefined' ? null : localStorage.getItem(STORAGE_KEY);
  return AGE_SCALES.find((scale) => scale === stored) ?? 'CAL_BP';
}

export type AgeScaleProviderProps = { children: ReactNode };

/** Holds the cal BP / CE-BCE choice for the whole app and remembers it in localStorage. */
export function AgeScaleProvider({ children }: AgeScaleProviderProps) {
  const [scale, setScaleState] = useState<AgeScale>(storedScale);
  const setScale = useCallback((next: AgeScale) => {
    localStorage.setItem(STORAGE_KEY, next);
    setScaleState(next);
  }, []);
  const value = useMemo(() => ({ scale, setScale }), [scale, setScale]);
  return <AgeScaleContext.Provider value={value}>{children}</AgeScaleContext.Provider>;
}
