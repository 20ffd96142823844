// Exports of the scenario on screen: bar table CSV, chart SVG and PNG, and the printed report.

export { PrintReport, loadReport } from './PrintReport';
export { barTableCsv } from './bar-table-csv';
export { wrapText } from './chart-svg';
