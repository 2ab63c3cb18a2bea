/** Exchange formats: DXF import and export, SVG export. */
export { importDxf, INSUNITS, DEFAULT_RELATIVE_TOL, MAX_ENTITIES, type DxfImport, type DxfImportOk, type DxfImportOptions, type DxfProblem } from './dxf-import';
export { exportDxf, INSUNITS_CODE, type DxfExportOptions } from './dxf-export';
export { exportSvg, regionPathData, type SvgExportOptions } from './svg-export';
