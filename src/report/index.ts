/** The printable report and the shared caution text. */
export { CAUTION_TEXT } from './caution';
export { renderReportHtml, METHOD_NOTE, type ReportInput } from './html';
export { renderSectionFigure, type Figure, type FigureOptions } from './figure';
export { renderQbDiagram } from './qb-chart';
export { chooseScale, STANDARD_SCALES, type DrawingScale } from './scale';
export { escapeHtml } from './escape';
