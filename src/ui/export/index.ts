// Exports of the scenario on screen: bar table CSV, chart SVG and PNG, and the printed report.
import './export.css';

export { ExportButtons, chartHeading, chartLegend, liveChartSvg } from './ExportButtons';
export { PrintReport } from './PrintReport';
export { StaticChart } from './StaticChart';
export { barTableCsv, barTableHeader, methodParametersText, exportFileName } from './bar-table-csv';
export { standaloneSvg, wrapText, type LegendEntry } from './chart-svg';
export { svgToPng } from './chart-png';
export { downloadBlob } from './download';
