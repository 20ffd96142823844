import { useLayoutEffect, useRef, useState } from 'react';

/**
 * Width of an element, following resizes. Where ResizeObserver is missing
 * (jsdom in tests) the element keeps the fallback width.
 */
export function useElementWidth<E extends HTMLElement>(fallback: number) {
  const ref = useRef<E | null>(null);
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const measure = (w: number): void => {
      if (w > 0) setWidth(Math.round(w));
    };
    measure(el.getBoundingClientRect().width);
    const observer = new ResizeObserver((entries) => {
      const entry = entries[entries.length - 1];
      if (entry) measure(entry.contentRect.width);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return [ref, width] as const;
}
