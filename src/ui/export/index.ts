// Exports of the scenario on screen: bar table CSV, chart SVG and PNG, and the printed report.

export { ExportButtons, liveChartSvg } from './ExportButtons';
export { chartHeading, chartLegend } from './chart-file';
export { PrintReport, loadReport } from './PrintReport';
export { ReportBody } from './ReportBody';
export { StaticChart } from './StaticChart';
export { barTableCsv, barTableHeader, methodParametersText, exportFileName } from './bar-table-csv';
export { standaloneSvg, wrapText, type LegendEntry } from './chart-svg';
export { svgToPng } from './chart-png';
export { downloadBlob } from './download';
