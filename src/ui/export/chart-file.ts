import { methodSpec, type LossMethod } from '../../core';
import type { Scenario } from '../../scenario/types';
import { CAPACITY_CURVES } from '../chart/capacity';
import { lossPartOf, rateLine } from '../chart/method-layers';
import { methodParametersText } from './bar-table-csv';
import type { LegendEntry } from './chart-svg';
import { scenarioTitle } from '../../scenario/label-text';

/** The line under an exported chart: scenario, method and parameters. */
export function chartHeading(scenario: Scenario, method: Scenario['method']): string {
  return `${scenarioTitle(scenario.name)} — ${methodSpec(method.kind).label}; ${methodParametersText(method, scenario.units)}`;
}

/** The chart's legend for a file: the layers the hyetograph draws (data-layer marks them), in the method's words. */
export function chartLegend(method: LossMethod): LegendEntry[] {
  const line = rateLine(method)?.param.label;
  const part = lossPartOf(method)?.label;
  const capacity = CAPACITY_CURVES[method.kind]?.label;
  return [
    { selector: '[data-layer="rain"]', label: 'Rainfall excess', kind: 'fill' },
    { selector: '[data-layer="loss"]', label: 'Loss', kind: 'fill' },
    ...(part ? [{ selector: '[data-layer="loss-part"]', label: part, kind: 'fill' as const }] : []),
    ...(capacity ? [{ selector: '[data-layer="capacity"]', label: capacity, kind: 'line' as const }] : []),
    ...(line ? [{ selector: '.loss-line__stroke', label: line, kind: 'line' as const }] : []),
  ];
}
