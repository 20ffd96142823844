import type { ReactNode } from 'react';
import { formatValue } from '../format';
import type { EventTransformFits } from '../../store/event-transform-fits';
import { SpreadList } from './SpreadList';

/** A fitted transform value with its unit (hours for lag and k; none for n). */
function valueText(shapes: EventTransformFits, value: number): string {
  return shapes.param.unit === 'h' ? `${formatValue(value)} h` : formatValue(value);
}

/** One event's cell in the fit table: its fitted transform value, or why it has none. */
export function transformCell(shapes: EventTransformFits, id: string): ReactNode {
  const fit = shapes.byId.get(id);
  if (fit === undefined) return '—';
  if (fit.result.ok) return valueText(shapes, fit.result.value);
  return (
    <>
      <strong>No fit:</strong> {fit.result.message}
    </>
  );
}

/**
 * The spread of the transform parameter fitted to every event's own record
 * (the loss matched to each event's volume first), read like the loss's.
 */
export function TransformSpread({ shapes }: { readonly shapes: EventTransformFits }) {
  const { summary } = shapes;
  const name = shapes.param.label.toLowerCase();
  const stat = (x: number | null): string => (x === null ? '—' : valueText(shapes, x));
  return (
    <>
      <h3>Spread of the fitted {name}</h3>
      <p className="panel__intro">
        The workbench’s unit hydrograph fitted to each event’s own streamflow record, with the loss matched to that
        event’s observed volume first, as “Fit the hydrograph” does on the workbench.
      </p>
      <SpreadList
        label={`Spread of the fitted ${name}`}
        summary={summary}
        withoutLabel="Without a fit"
        without={summary.withoutAnswer}
        stat={stat}
      />
    </>
  );
}
