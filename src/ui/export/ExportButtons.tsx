import { useScenario, useWorkbenchStore } from '../../store';
import { useBarMessage } from '../services/bar-message';
import { useServices } from '../services/services';
import { loadReport } from './PrintReport';
import type { ExportKind } from './run-export';
import './export.css';

/** The code that writes the files, fetched on the first export (offline it comes from the stored app). */
const exportFiles = () => import('./export-files');

const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * Exports of what is on screen: the bar table as CSV, the computed
 * hydrograph as CSV, the chart as SVG and PNG (2×), and the printable
 * report. What each writes, and the message it leaves, is in run-export.tsx,
 * loaded on the first click.
 */
export function ExportButtons() {
  const store = useWorkbenchStore();
  const { saveFile, print } = useServices();
  const show = useBarMessage();
  const hasHydrograph = useScenario((s) => s.hydrograph.transform !== null);

  const run = (kind: ExportKind): void =>
    void exportFiles().then(
      (files) => files.runExport(kind, { store, saveFile, show }),
      (error: unknown) => show({ tone: 'problem', title: `Nothing was exported: ${why(error)}.` }),
    );

  // The report's code arrives when the page is idle; a click before then waits for it.
  const printReport = (): void =>
    void loadReport().then(print, (error: unknown) =>
      show({ tone: 'problem', title: `The report could not be prepared: ${why(error)}.` }),
    );

  // The group's own label says "Export", so each button shows only what it writes; its name says the whole
  // ("Export CSV"), and holds the words shown. With a hydrograph's CSV too, the scenario tools stay one row at 1280 px.
  return (
    <>
      <button
        type="button"
        onClick={() => run('csv')}
        aria-label="Export CSV"
        title="Bars with loss and excess, as CSV"
      >
        CSV
      </button>
      {hasHydrograph ? (
        <button
          type="button"
          onClick={() => run('hydrograph-csv')}
          aria-label="Export hydrograph CSV"
          title="The computed hydrograph, as CSV"
        >
          Hydrograph CSV
        </button>
      ) : null}
      <button type="button" onClick={() => run('svg')} aria-label="Export SVG">
        SVG
      </button>
      <button type="button" onClick={() => run('png')} aria-label="Export PNG">
        PNG
      </button>
      <button type="button" onClick={printReport} title="A report of this scenario, with its bar table">
        Print report
      </button>
    </>
  );
}
