import { methodSpec, type LossMethod } from '../../core';
import { CAUTION_TEXT, scenarioFileName } from '../../scenario';
import type { Scenario } from '../../scenario/types';
import { useWorkbenchStore } from '../../store';
import { useBarMessage } from '../services/bar-message';
import { useServices } from '../services/services';
import { barTableCsv, exportFileName, methodParametersText } from './bar-table-csv';
import { svgToPng } from './chart-png';
import { CAPACITY_CURVES } from '../chart/capacity';
import { LINE_PARAM, LOSS_PARTS } from '../chart/line-params';
import { standaloneSvg, type LegendEntry } from './chart-svg';
import { formatCount } from '../format';

/** The workbench's live chart: the hyetograph's SVG (src/ui/chart/Hyetograph.tsx). */
function liveChartSvg(doc: Document = document): SVGSVGElement | null {
  return doc.querySelector<SVGSVGElement>('svg.chart__svg');
}

/** The line under an exported chart: scenario, method and parameters. */
function chartHeading(scenario: Scenario, method: Scenario['method']): string {
  return `${scenario.name} — ${methodSpec(method.kind).label}; ${methodParametersText(method, scenario.units)}`;
}

/** The chart's legend for a file: the layers the hyetograph draws (data-layer marks them), in the method's words. */
function chartLegend(method: LossMethod): LegendEntry[] {
  const lineKey = LINE_PARAM[method.kind];
  const line = lineKey ? methodSpec(method.kind).params.find((p) => p.key === lineKey)?.label : undefined;
  const part = LOSS_PARTS[method.kind]?.label;
  const capacity = CAPACITY_CURVES[method.kind]?.label;
  return [
    { selector: '[data-layer="rain"]', label: 'Rainfall excess', kind: 'fill' },
    { selector: '[data-layer="loss"]', label: 'Loss', kind: 'fill' },
    ...(part ? [{ selector: '[data-layer="loss-part"]', label: part, kind: 'fill' as const }] : []),
    ...(capacity ? [{ selector: '[data-layer="capacity"]', label: capacity, kind: 'line' as const }] : []),
    ...(line ? [{ selector: '.loss-line__stroke', label: line, kind: 'line' as const }] : []),
  ];
}

const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * Exports of what is on screen: the bar table as CSV (loss and excess per
 * bar from the core), the chart as SVG and PNG (2×), and the printable
 * report. Every one carries the caution.
 */
export function ExportButtons() {
  const store = useWorkbenchStore();
  const { saveFile, print } = useServices();
  const show = useBarMessage();

  const current = () => {
    const scenario = store.getState().scenario;
    return { scenario, results: store.derived.results(scenario), base: scenarioFileName(scenario) };
  };

  const exportCsv = (): void => {
    const { scenario, results, base } = current();
    if (!results.ok) {
      show({
        tone: 'problem',
        title: 'No table was exported: the losses cannot be worked out.',
        body: <p>{results.message}</p>,
      });
      return;
    }
    const text = barTableCsv({
      scenario,
      method: results.method,
      result: results.result,
      volumeM3: store.derived.runoffVolumeM3(scenario),
    });
    const name = exportFileName(base, 'bars', 'csv');
    saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), name);
    const n = scenario.storm.depthsMm.length;
    show({ tone: 'done', title: `Exported ${name}: ${formatCount(n)} bar${n === 1 ? '' : 's'} with loss and excess.` });
  };

  const chart = () => {
    const live = liveChartSvg();
    if (!live) throw new Error('the chart is not on screen');
    const { scenario, results, base } = current();
    return {
      svg: standaloneSvg(live, {
        heading: chartHeading(scenario, results.method),
        caution: CAUTION_TEXT,
        legend: chartLegend(results.method),
      }),
      base,
    };
  };

  const exportSvg = (): void => {
    try {
      const { svg, base } = chart();
      const name = exportFileName(base, 'chart', 'svg');
      saveFile(new Blob([svg.text], { type: 'image/svg+xml' }), name);
      show({ tone: 'done', title: `Exported ${name}.` });
    } catch (error) {
      show({ tone: 'problem', title: `The chart was not exported: ${why(error)}.` });
    }
  };

  const exportPng = async (): Promise<void> => {
    try {
      const { svg, base } = chart();
      const png = await svgToPng(svg.text, svg.width, svg.height, 2);
      const name = exportFileName(base, 'chart', 'png');
      saveFile(png, name);
      show({ tone: 'done', title: `Exported ${name} (${svg.width * 2} × ${svg.height * 2} pixels).` });
    } catch (error) {
      show({
        tone: 'problem',
        title: `The chart picture was not exported: ${why(error)}. The SVG export works in any browser.`,
      });
    }
  };

  return (
    <>
      <button type="button" onClick={exportCsv} title="Bars with loss and excess, as CSV">
        Export CSV
      </button>
      <button type="button" onClick={exportSvg}>
        Export SVG
      </button>
      <button type="button" onClick={() => void exportPng()}>
        Export PNG
      </button>
      <button type="button" onClick={print} title="A one-page report of this scenario">
        Print report
      </button>
    </>
  );
}
