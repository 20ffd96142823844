import { CAUTION_TEXT, scenarioFileName } from '../../scenario';
import { loadHydrographSide, useScenario, useWorkbenchStore } from '../../store';
import { useBarMessage } from '../services/bar-message';
import { useServices } from '../services/services';
import { loadReport } from './PrintReport';
import { formatCount } from '../format';
import './export.css';

/** The workbench's live chart: the hyetograph's SVG (src/ui/chart/Hyetograph.tsx). */
export function liveChartSvg(doc: Document = document): SVGSVGElement | null {
  return doc.querySelector<SVGSVGElement>('svg.chart__svg');
}

/** The code that writes the files, fetched on the first export (offline it comes from the stored app). */
const exportFiles = () => import('./export-files');

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

  const exportCsv = async (): Promise<void> => {
    const { scenario, results, base } = current();
    if (!results.ok) {
      show({
        tone: 'problem',
        title: 'No table was exported: the losses cannot be worked out.',
        body: <p>{results.message}</p>,
      });
      return;
    }
    let files: Awaited<ReturnType<typeof exportFiles>>;
    try {
      files = await exportFiles();
    } catch (error) {
      show({ tone: 'problem', title: `No table was exported: ${why(error)}.` });
      return;
    }
    const text = files.barTableCsv({
      scenario,
      method: results.method,
      result: results.result,
      volumeM3: store.derived.runoffVolumeM3(scenario),
    });
    const name = files.exportFileName(base, 'bars', 'csv');
    saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), name);
    const n = scenario.storm.depthsMm.length;
    show({ tone: 'done', title: `Exported ${name}: ${formatCount(n)} bar${n === 1 ? '' : 's'} with loss and excess.` });
  };

  const hasHydrograph = useScenario((s) => s.hydrograph.transform !== null);
  const exportHydrographCsv = async (): Promise<void> => {
    const { scenario, base } = current();
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
    let files: Awaited<ReturnType<typeof exportFiles>>;
    try {
      files = await exportFiles();
    } catch (error) {
      show({ tone: 'problem', title: `No hydrograph was exported: ${why(error)}.` });
      return;
    }
    const text = files.hydrographCsv({
      scenario,
      transform: computed.transform,
      hydrograph: computed.hydrograph,
      comparison: store.derived.comparison(scenario),
    });
    const name = files.exportFileName(base, 'hydrograph', 'csv');
    saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), name);
    show({ tone: 'done', title: `Exported ${name}: ${formatCount(computed.hydrograph.timesH.length)} samples.` });
  };

  const chart = async () => {
    const live = liveChartSvg();
    if (!live) throw new Error('the chart is not on screen');
    const { scenario, results, base } = current();
    const files = await exportFiles();
    const svg = files.standaloneSvg(live, {
      heading: files.chartHeading(scenario, results.method),
      caution: CAUTION_TEXT,
      legend: files.chartLegend(results.method),
    });
    return { svg, base, files };
  };

  const exportSvg = async (): Promise<void> => {
    try {
      const { svg, base, files } = await chart();
      const name = files.exportFileName(base, 'chart', 'svg');
      saveFile(new Blob([svg.text], { type: 'image/svg+xml' }), name);
      show({ tone: 'done', title: `Exported ${name}.` });
    } catch (error) {
      show({ tone: 'problem', title: `The chart was not exported: ${why(error)}.` });
    }
  };

  const exportPng = async (): Promise<void> => {
    try {
      const { svg, base, files } = await chart();
      const png = await files.svgToPng(svg.text, svg.width, svg.height, 2);
      const name = files.exportFileName(base, 'chart', 'png');
      saveFile(png, name);
      show({ tone: 'done', title: `Exported ${name} (${svg.width * 2} × ${svg.height * 2} pixels).` });
    } catch (error) {
      show({
        tone: 'problem',
        title: `The chart picture was not exported: ${why(error)}. The SVG export works in any browser.`,
      });
    }
  };

  // The report's code arrives when the page is idle; a click before then waits for it.
  const printReport = async (): Promise<void> => {
    try {
      await loadReport();
    } catch (error) {
      show({ tone: 'problem', title: `The report could not be prepared: ${why(error)}.` });
      return;
    }
    print();
  };

  return (
    <>
      <button type="button" onClick={() => void exportCsv()} title="Bars with loss and excess, as CSV">
        Export CSV
      </button>
      {hasHydrograph ? (
        <button type="button" onClick={() => void exportHydrographCsv()} title="The computed hydrograph, as CSV">
          Export hydrograph CSV
        </button>
      ) : null}
      <button type="button" onClick={() => void exportSvg()}>
        Export SVG
      </button>
      <button type="button" onClick={() => void exportPng()}>
        Export PNG
      </button>
      <button type="button" onClick={() => void printReport()} title="A one-page report of this scenario">
        Print report
      </button>
    </>
  );
}
