// What the export buttons write. ExportButtons loads this on the first export, so none of it is part of the
// first screen's JavaScript.
export { barTableCsv, exportFileName } from './bar-table-csv';
export { chartHeading, chartLegend } from './chart-file';
export { standaloneSvg } from './chart-svg';
export { svgToPng } from './chart-png';
export { hydrographCsv, transformParametersText } from './hydrograph-csv';
export { liveChartSvg, runExport, type ExportKind } from './run-export';
