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
