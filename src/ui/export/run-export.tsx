import { CAUTION_TEXT, scenarioFileName } from '../../scenario';
import { loadHydrographSide, type WorkbenchStore } from '../../store';
import type { ShowMessage } from '../services/bar-message';
import { formatCount } from '../format';
import { barTableCsv, exportFileName } from './bar-table-csv';
import { chartHeading, chartLegend } from './chart-file';
import { standaloneSvg } from './chart-svg';
import { svgToPng } from './chart-png';
import { hydrographCsv } from './hydrograph-csv';

/** The files the export buttons write. */
export type ExportKind = 'csv' | 'hydrograph-csv' | 'svg' | 'png';

export interface ExportContext {
  readonly store: WorkbenchStore;
  readonly saveFile: (blob: Blob, fileName: string) => void;
  readonly show: ShowMessage;
}

/** The workbench's live chart: the hyetograph's SVG (src/ui/chart/Hyetograph.tsx). */
export function liveChartSvg(doc: Document = document): SVGSVGElement | null {
  return doc.querySelector<SVGSVGElement>('svg.chart__svg');
}

const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * Writes one export of what is on screen and says what it did in the
 * scenario bar's message line: the bar table as CSV (loss, excess and the
 * cumulative mass curve per bar, from the core), the computed hydrograph as
 * CSV, the chart as SVG and PNG (2×). Every one carries the caution. Loaded
 * on the first export (ExportButtons.tsx), so none of it is on the first
 * screen.
 */
export async function runExport(kind: ExportKind, { store, saveFile, show }: ExportContext): Promise<void> {
  const scenario = store.getState().scenario;
  const results = store.derived.results(scenario);
  const base = scenarioFileName(scenario);

  if (kind === 'csv') {
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
      areaUnit: store.getState().areaUnits[scenario.units],
    });
    const name = exportFileName(base, 'bars', 'csv');
    saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), name);
    const n = scenario.storm.depthsMm.length;
    show({ tone: 'done', title: `Exported ${name}: ${formatCount(n)} bar${n === 1 ? '' : 's'} with loss and excess.` });
    return;
  }

  if (kind === 'hydrograph-csv') {
    try {
      await loadHydrographSide();
    } catch (error) {
      show({ tone: 'problem', title: `No hydrograph was exported: ${why(error)}.` });
      return;
    }
    const computed = store.derived.hydrograph(scenario);
    if (!computed?.ok) {
      show({
        tone: 'problem',
        title: 'No hydrograph was exported: it cannot be worked out.',
        body: <p>{computed ? computed.message : 'Choose a unit hydrograph first.'}</p>,
      });
      return;
    }
    if (!results.ok) {
      show({
        tone: 'problem',
        title: 'No hydrograph was exported: the losses cannot be worked out.',
        body: <p>{results.message}</p>,
      });
      return;
    }
    const text = hydrographCsv({
      scenario,
      method: results.method,
      areaUnit: store.getState().areaUnits[scenario.units],
      transform: computed.transform,
      hydrograph: computed.hydrograph,
      comparison: store.derived.comparison(scenario),
    });
    const name = exportFileName(base, 'hydrograph', 'csv');
    saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), name);
    show({ tone: 'done', title: `Exported ${name}: ${formatCount(computed.hydrograph.timesH.length)} samples.` });
    return;
  }

  try {
    const live = liveChartSvg();
    if (!live) throw new Error('the chart is not on screen');
    const svg = standaloneSvg(live, {
      heading: chartHeading(scenario, results.method),
      caution: CAUTION_TEXT,
      legend: chartLegend(results.method),
    });
    if (kind === 'svg') {
      const name = exportFileName(base, 'chart', 'svg');
      saveFile(new Blob([svg.text], { type: 'image/svg+xml' }), name);
      show({ tone: 'done', title: `Exported ${name}.` });
      return;
    }
    const png = await svgToPng(svg.text, svg.width, svg.height, 2);
    const name = exportFileName(base, 'chart', 'png');
    saveFile(png, name);
    show({ tone: 'done', title: `Exported ${name} (${svg.width * 2} × ${svg.height * 2} pixels).` });
  } catch (error) {
    show({
      tone: 'problem',
      title:
        kind === 'svg'
          ? `The chart was not exported: ${why(error)}.`
          : `The chart picture was not exported: ${why(error)}. The SVG export works in any browser.`,
    });
  }
}
