import { useCallback, useState } from 'react';

export type ParentSize = { width: number; height: number };

/**
 * The size of the element a chart sits in, followed with a ResizeObserver; pass `ref` to that
 * element. Starts at 0 x 0 until the first measurement, so charts draw nothing rather than
 * something of the wrong size.
 */
export function useParentSize<TElement extends HTMLElement = HTMLDivElement>(): ParentSize & {
  ref: (element: TElement | null) => void;
} {
  const [size, setSize] = useState<ParentSize>({ width: 0, height: 0 });
  const ref = useCallback((element: TElement | null) => {
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => {
      if (!entry) return;
      const { width, height } = entry.contentRect;
      setSize((previous) =>
        Math.round(previous.width) === Math.round(width) && Math.round(previous.height) === Math.round(height)
          ? previous
          : { width: Math.round(width), height: Math.round(height) },
      );
    });
    observer.observe(element);
    // React 19 calls a ref callback's returned function when the element goes away.
    return () => observer.disconnect();
  }, []);
  return { ref, ...size };
}
