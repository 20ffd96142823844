/**
 * A span of hours as h:mm, rounded to the minute: 1.5 → "1:30", 0.25 → "0:15".
 * With `signed`, a sign in front ("+0:20", "−1:05", "0:00" for none), for a
 * timing error: positive when the computed peak comes late.
 */
export function hoursMinutes(hours: number, signed = false): string {
  if (!Number.isFinite(hours)) return '—';
  const minutes = Math.round(Math.abs(hours) * 60);
  const text = `${Math.floor(minutes / 60)}:${String(minutes % 60).padStart(2, '0')}`;
  if (!signed || minutes === 0) return text;
  return `${hours < 0 ? '−' : '+'}${text}`;
}

/** What is said of a hydrograph with no flow, wherever its peak would be written (screen, comparison, report, CSV). */
export const NO_RUNOFF_TEXT = 'no direct runoff';

/** What a hydrograph with no flow shows for its time to peak: it has no peak (the core puts it at 0 h). */
const NO_PEAK_TEXT = `none: ${NO_RUNOFF_TEXT}`;

/**
 * When a computed hydrograph peaks, as "2:20 after the storm start"; one with
 * no flow at all has no peak, and said "0:00 after the storm start" as if
 * the runoff peaked at once.
 */
export function peakTimeText(h: { readonly peakM3s: number; readonly timeOfPeakH: number }): string {
  return h.peakM3s > 0 ? `${hoursMinutes(h.timeOfPeakH)} after the storm start` : NO_PEAK_TEXT;
}

/** "11.02 m³/s at 2:20 after the storm start", or "0 m³/s (no direct runoff)": a peak given with its discharge text. */
export function peakAtText(h: { readonly peakM3s: number; readonly timeOfPeakH: number }, discharge: string): string {
  return h.peakM3s > 0
    ? `${discharge} at ${hoursMinutes(h.timeOfPeakH)} after the storm start`
    : `${discharge} (${NO_RUNOFF_TEXT})`;
}

/** For a chart's name after its peak discharge: "3:00 after the storm start", or "(no direct runoff)". */
export function peakWhenText(h: { readonly peakM3s: number; readonly timeOfPeakH: number }): string {
  return h.peakM3s > 0 ? `${hoursMinutes(h.timeOfPeakH)} after the storm start` : `(${NO_RUNOFF_TEXT})`;
}
