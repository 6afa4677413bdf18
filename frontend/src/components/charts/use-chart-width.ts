import { useEffect, useRef, useState } from 'react';

/**
 * The width of the chart's box, followed as it changes (tablet turned, window resized), so text
 * in the chart keeps its size instead of being scaled down. Until it is measured (or where
 * ResizeObserver is missing), `fallback` is used.
 */
export function useChartWidth<T extends HTMLElement>(fallback: number, min = 280) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const element = ref.current;
    if (!element || typeof ResizeObserver === 'undefined') return undefined;
    const observer = new ResizeObserver(([entry]) => {
      const measured = Math.floor(entry?.contentRect.width ?? 0);
      if (measured > 0) setWidth(Math.max(min, measured));
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [min]);
  return { ref, width };
}
