import type { FitSummary } from '../../core';

/**
 * The spread of a value fitted to every event (count, those without one,
 * mean, median, smallest, largest): one list for the loss parameter and the
 * unit hydrograph's, so both read alike.
 */
export function SpreadList({
  label,
  summary,
  withoutLabel,
  without,
  stat,
}: {
  readonly label: string;
  readonly summary: FitSummary;
  /** What the events left out are called ("Without an answer", "Without a fit"). */
  readonly withoutLabel: string;
  readonly without: number;
  /** A statistic as shown, with its unit ('—' for none). */
  readonly stat: (x: number | null) => string;
}) {
  const rows: ReadonlyArray<readonly [string, string | number]> = [
    ['Events fitted', summary.count],
    [withoutLabel, without],
    ['Mean', stat(summary.mean)],
    ['Median', stat(summary.median)],
    ['Smallest', stat(summary.min)],
    ['Largest', stat(summary.max)],
  ];
  return (
    <dl className="fit-all__summary" aria-label={label}>
      {rows.map(([term, value]) => (
        <div key={term}>
          <dt>{term}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
