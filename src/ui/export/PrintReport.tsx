import { loadHydrographSide } from '../../store';
import { useEffect, useState, type ComponentType } from 'react';
import { flushSync } from 'react-dom';
import './export.css';

let body: ComponentType | null = null;
let loading: Promise<ComponentType> | null = null;

/**
 * Fetches the report's code once (it is not part of the first screen). The
 * page asks for it when idle, so the browser's own print command finds it
 * ready; "Print report" waits for it. A failed fetch may be tried again.
 */
export function loadReport(): Promise<ComponentType> {
  loading ??= Promise.all([import('./ReportBody'), loadHydrographSide()])
    .then(([m]) => m)
    .then(
      (m) => (body = m.ReportBody),
      (error: unknown) => {
        loading = null;
        throw error;
      },
    );
  return loading;
}

/** Runs `task` when the browser is idle (or soon, where it cannot say); returns a cancel. */
function whenIdle(task: () => void): () => void {
  if (typeof window.requestIdleCallback === 'function') {
    const id = window.requestIdleCallback(task, { timeout: 5000 });
    return () => window.cancelIdleCallback(id);
  }
  const id = window.setTimeout(task, 1000);
  return () => window.clearTimeout(id);
}

/**
 * The printable report (a one-page summary, then the bar table). It is built only while printing (from the
 * "Print report" button, the browser's own print command, or print
 * emulation), so editing on screen never pays for it. Printing before its
 * code has arrived prints the screen as it is.
 */
export function PrintReport() {
  const [printing, setPrinting] = useState(false);
  // Re-render once the code has arrived (the report may be showing by then).
  const [, setArrivals] = useState(0);
  useEffect(() => {
    const fetchBody = (): void =>
      void loadReport().then(
        () => setArrivals((n) => n + 1),
        () => {},
      );
    const cancel = whenIdle(fetchBody);
    const on = (): void => {
      if (!body) fetchBody();
      flushSync(() => setPrinting(true));
    };
    const off = (): void => setPrinting(false);
    window.addEventListener('beforeprint', on);
    window.addEventListener('afterprint', off);
    const media = typeof window.matchMedia === 'function' ? window.matchMedia('print') : null;
    const follow = (e: MediaQueryListEvent): void => (e.matches ? on() : off());
    media?.addEventListener?.('change', follow);
    if (media?.matches) setPrinting(true);
    return () => {
      cancel();
      window.removeEventListener('beforeprint', on);
      window.removeEventListener('afterprint', off);
      media?.removeEventListener?.('change', follow);
    };
  }, []);
  const Body = body;
  if (!printing || !Body) return null;
  return (
    <article className="report" aria-label="Printable report">
      <Body />
    </article>
  );
}
