import { useLayoutEffect, useRef, useState } from 'react';

export interface ElementWidthOptions {
  /**
   * Take the first width from the ResizeObserver's first report, made once
   * the browser has laid the page out, instead of asking for it at mount.
   * Asking lays out the whole page inside the task that mounts it: on the
   * first draw of a long storm (the largest share link, a 10⁶-bar restore)
   * that was 40–90 ms of a single task (measured, bench:ui link-largest).
   * Until then the width is the fallback and `known` is false.
   */
  readonly firstFromLayout?: boolean;
}

/**
 * Width of an element, following resizes, and whether it has been read yet.
 * Where ResizeObserver is missing (jsdom in tests) the element keeps the
 * fallback width, which then counts as known.
 */
export function useElementWidth<E extends HTMLElement>(fallback: number, options: ElementWidthOptions = {}) {
  const ref = useRef<E | null>(null);
  const [measured, setMeasured] = useState<number | null>(null);
  // Read at mount only, as the effect below runs once.
  const [firstFromLayout] = useState(options.firstFromLayout === true);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const measure = (w: number): void => {
      if (w > 0) setMeasured(Math.round(w));
    };
    if (!firstFromLayout) measure(el.getBoundingClientRect().width);
    const observer = new ResizeObserver((entries) => {
      const entry = entries[entries.length - 1];
      if (entry) measure(entry.contentRect.width);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [firstFromLayout]);
  const known = measured !== null || typeof ResizeObserver === 'undefined';
  return [ref, measured ?? fallback, known] as const;
}
