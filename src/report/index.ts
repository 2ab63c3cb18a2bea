/** The printable report and the shared caution text. */
export { CAUTION_TEXT, shearFormulaCaution, PRINCIPAL_TURN_DEG, PRODUCT_RATIO } from './caution';
export { renderReportHtml, METHOD_NOTE, NUMBER_NOTE, QB_NOTE, type ReportInput } from './html';
export { renderSectionFigure, type Figure, type FigureOptions } from './figure';
export { renderQbDiagram, qbCurve, qbScale, CAP_FACTOR, type QbPoint } from './qb-chart';
export {
  findDimensionFeatures,
  layoutDimensions,
  type DimensionFeature,
  type DimensionLayout,
  type DimLine,
  type DimArrow,
  type DimText,
  type LayoutOptions,
  type OmittedDimension,
} from './dimensions';
export { shapeSchedule, renderScheduleTables, type ShapeSchedule, type ScheduleTable } from './schedule';
export { checkerFields, renderCheckerBlock, type CheckerFields, type RevisionEntry } from './checker';
export { chooseScale, STANDARD_SCALES, type DrawingScale } from './scale';
export { escapeHtml } from './escape';
export { renderLineReport, renderLineFigure, chainPathData, type LineReportInput } from './lines';
export { renderComparisonSection, reportProposal, COMPARISON_CSS } from './comparison';
export { renderComparisonFigure, type ComparisonFigure, type ComparisonFigureInput } from './comparison-figure';
