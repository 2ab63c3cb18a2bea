/**
 * The printable report: one self-contained HTML document (inline CSS and SVG, no scripts, no
 * external resources) that prints on A4 and US Letter. Every number comes from the same
 * formatter as the panel (formatProperty / formatNumber), and every string taken from the
 * document is escaped, so a name is always shown as text.
 */
import { kindOf } from '../shapes/registry';
import type { SectionDocument } from '../document/types';
import { createEvaluator, type Evaluation } from '../evaluate';
import { formatShapeIssue } from '../document/issue-names';
import { regionMoments } from '../moments/kernel';
import type { Region } from '../geometry/contour';
import {
  DISPLAY_SIGFIGS,
  GEOMETRY_SIGFIGS,
  PROPERTY_CATALOG,
  ZERO_RELATIVE,
  formatProperty,
  formatQuantity,
  sectionSize,
  superscript,
  unitText,
  type PropertyInfo,
} from '../properties/catalog';
import { CAUTION_TEXT } from './caution';
import { checkerFields, renderCheckerBlock } from './checker';
import { escapeHtml } from './escape';
import { emptySectionText } from './empty';
import { renderSectionFigure } from './figure';
import { renderQbDiagram } from './qb-chart';
import { renderLineReport } from './lines';
import { frameNotes, listingSummary, paramsText, renderScheduleTables, shapeSchedule } from './schedule';
import { MATERIALS_CSS, renderMaterialsReport } from './materials';
import { COMPARISON_CSS, renderComparisonSection, reportProposal } from './comparison';
import { renderTorsionSection } from './torsion';
import type { SectionTorsion } from '../section-torsion';

export interface ReportInput {
  doc: SectionDocument;
  evaluation: Evaluation;
  cut?: { axis: 'x' | 'y'; at: number } | null;
  /** Shown in the footer when given (e.g. an ISO time stamp); never invented. */
  generated?: string;
  /** Paper size for printing; the browser's default when absent. */
  paper?: 'A4' | 'Letter';
  /** Draw the kern even for a section of one material without loads (src/report/materials.ts). */
  kern?: boolean;
  /**
   * The proposal whose cutout check is printed after the baseline (comparison.ts): by name; when
   * absent, the document's active proposal, else its first; null for none. `evaluation` is always
   * the baseline's.
   */
  variant?: string | null;
  /** Torsion by finite elements, run when the report is made (the document's `torsion` settings); none when absent. */
  torsion?: SectionTorsion | null;
}

export const METHOD_NOTE =
  'Properties are computed by exact boundary integration (Green’s theorem) over the straight lines and circular arcs ' +
  'that bound the section; arcs are not replaced by chords. Shapes are combined in list order (add, subtract, intersect). ' +
  'For the booleans, clipper-lib decides the topology on a fine chord approximation, then each arc and each intersection ' +
  'point is restored exactly before integration.';

const CONVENTIONS =
  'Axes: x to the right, y up, origin O. Second moments Ix, Iy and the product Ixy = ∫(x − x̄)(y − ȳ) dA are about axes ' +
  'through the centroid C. θ is measured counter-clockwise from +x to the major principal axis 1. Elastic moduli are ' +
  'I divided by the distance from the centroid to the extreme fibre; plastic moduli are about the equal-area axes.';

/** How a cut at a level where the width jumps is reported. */
export const QB_NOTE =
  'Cuts: where an edge lies on the cut line the width jumps (a flange underside, a hole edge); both one-sided widths are given, ' +
  'Q is the same from either side, and Q/b uses the smaller non-zero width, the side where VQ/(Ib) is the larger.';

/** The number rule, from the formatter's own constants so that it always states what is applied. */
export const NUMBER_NOTE =
  `Numbers: results to ${DISPLAY_SIGFIGS} significant figures, input geometry to ${GEOMETRY_SIGFIGS}, idle trailing zeros left out. ` +
  `Plain from 0.001 to ${'9'.repeat(DISPLAY_SIGFIGS)} (to ${'9'.repeat(GEOMETRY_SIGFIGS)} for geometry), else engineering notation with powers of ten in steps of 3 (5.369 × 10⁶). ` +
  `A value below 10${superscript(Math.round(Math.log10(ZERO_RELATIVE)))} × Lⁿ in size (L the larger side of the section, n its power of length) is round-off, shown as 0. ` +
  'JSON output keeps full precision.';

// Printable area: A4 is 210 mm wide, US Letter 279.4 mm tall; 15 mm margins fit both.
/** A CSS string literal for any text: every character outside [A-Za-z0-9 ] as a hex escape. */
function cssString(s: string): string {
  return `"${Array.from(s).map((ch) => (/[A-Za-z0-9 ]/.test(ch) ? ch : `\\${ch.codePointAt(0)!.toString(16)} `)).join('')}"`;
}

const pageCss = (heading: string, paper?: 'A4' | 'Letter') => `
@page { margin: 15mm 15mm 17mm;${paper === 'A4' ? ' size: A4 portrait;' : paper === 'Letter' ? ' size: letter portrait;' : ''}
  @bottom-left { content: ${cssString(heading)}; font: 7.5pt Arial, sans-serif; color: #555; }
  @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 7.5pt Arial, sans-serif; color: #555; } }
`;

const CSS = `
* { box-sizing: border-box; }
html { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
body { font: 9pt/1.3 "Helvetica Neue", Arial, sans-serif; color: #111; margin: 0 auto; max-width: 180mm; padding: 8mm 0; }
h1 { font-size: 13pt; margin: 0 0 2mm; }
h2 { font-size: 10pt; margin: 3mm 0 1.2mm; border-bottom: 0.3mm solid #111; padding-bottom: 0.5mm; }
table { border-collapse: collapse; width: 100%; break-inside: avoid; page-break-inside: avoid; }
th, td { border: 0.2mm solid #999; padding: 0.6mm 1.5mm; text-align: left; vertical-align: top; }
th { background: #eef1f4; font-weight: 600; }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tr.group th { background: #dde3ea; }
.titleblock td { width: 25%; }
.titleblock .label { color: #555; font-size: 7.5pt; display: block; }
.titleblock .value { min-height: 4mm; display: block; }
.figure { text-align: center; margin: 1mm 0; }
.figure svg { display: block; margin: 0 auto; }
.caption, .small { font-size: 8pt; color: #333; margin: 1mm 0; }
.caution { border: 0.4mm solid #111; padding: 1.5mm 2.5mm; font-weight: 600; margin: 2mm 0 0; break-inside: avoid; }
.block { break-inside: avoid; page-break-inside: avoid; }
.values { width: 100%; }
.values td { padding: 0.3mm 1.2mm; }
.props td:nth-child(2) { white-space: nowrap; }
.cols { display: flex; gap: 4mm; align-items: flex-start; }
.cols > table { flex: 1 1 0; }
.props th, .props td { padding: 0.2mm 1.2mm; }
.props { font-size: 8pt; }
.method-cols { column-count: 2; column-gap: 5mm; }
.method-cols p { margin: 0 0 1mm; font-size: 7.5pt; break-inside: avoid; }
footer { font-size: 7.5pt; color: #555; margin-top: 3mm; }
h3 { font-size: 9pt; margin: 2mm 0 1mm; }
table.schedule { width: auto; margin: 1.5mm 0; font-size: 7.5pt; }
table.schedule caption { text-align: left; font-weight: 600; font-size: 8pt; padding-bottom: 0.5mm; }
table.schedule th, table.schedule td { padding: 0.2mm 1.2mm; }
table.shapes { break-inside: auto; page-break-inside: auto; }
table.shapes tr { break-inside: avoid; page-break-inside: avoid; }
table.shapes td[data-shape-name] { min-width: 26mm; }
.shapes-list h2 { break-after: avoid; page-break-after: avoid; }
.frame-note { margin: 0.5mm 0; font-size: 7.5pt; }
table.schedule .group-start { border-left: 0.5mm solid #555; }
table.schedule.long { break-inside: auto; page-break-inside: auto; }
.sched { display: inline-block; vertical-align: top; margin-right: 4mm; }
.appendix { break-before: page; page-break-before: always; }
.empty-message { border: 0.3mm dashed #555; padding: 6mm 4mm; text-align: center; font-size: 10pt; margin: 2mm 0; }
.revisions td { height: 4.5mm; }
.revisions td:nth-child(3) { width: 45%; }
.fig-row { display: flex; flex-wrap: wrap; gap: 3mm 5mm; align-items: flex-start; justify-content: center; }
.fig-row > .figure { margin: 0; }
.fig-side { flex: 1 1 50mm; min-width: 50mm; }
.fig-side .caption { margin-top: 0; }
.checker h2 { font-size: 9pt; margin-top: 2mm; }
.checker table { font-size: 7.5pt; }
.checker th, .checker td { padding: 0.3mm 1mm; }
.checker-cols { margin-top: 1.5mm; }
.notes { border: 0.2mm solid #999; min-height: 14mm; padding: 0.8mm 1.2mm; white-space: pre-wrap; font-size: 7.5pt; margin-bottom: 1.5mm; }
.notes-label { color: #555; font-size: 7.5pt; display: block; }
.signoff .label { color: #555; font-size: 7.5pt; display: block; }
.signoff .value { min-height: 6mm; display: block; }
.qb-note { font-size: 8pt; }
.qb-caution { border: 0.3mm solid #8a1c1c; padding: 1mm 2mm; font-size: 8pt; margin: 1.5mm 0; break-inside: avoid; }
@media screen { body { padding: 10mm; background: #fff; } }
@media print { body { padding: 0; max-width: none; } }
`;

function titleBlock(doc: SectionDocument): string {
  const t = doc.title ?? {};
  const ck = checkerFields(doc);
  const last = ck.revisions[ck.revisions.length - 1];
  const cell = (label: string, value: string | undefined) =>
    `<td><span class="label">${escapeHtml(label)}</span><span class="value" data-field="${escapeHtml(label.toLowerCase())}">${escapeHtml(value ?? '')}</span></td>`;
  return (
    `<table class="titleblock block"><tbody>` +
    // The revision history and the sign-off, when recorded, are the current state: the latest
    // revision and the checker's name win over the title block's own fields.
    `<tr>${cell('Project', t.project)}${cell('Section', t.section ?? doc.name)}${cell('Units', doc.units)}${cell('Revision', last?.revision || t.revision)}</tr>` +
    `<tr>${cell('Author', t.author)}${cell('Checker', ck.checked?.by || t.checker)}${cell('Date', last?.date || t.date)}<td><span class="label">Signature</span><span class="value"></span></td></tr>` +
    `</tbody></table>`
  );
}

/** Groups that go in the left column of the property tables; the rest go right. */
const LEFT_GROUPS = new Set(['Area and centroid', 'Second moments', 'Principal axes']);

function propertyTable(input: ReportInput): string {
  const p = input.evaluation.props!;
  const units = input.doc.units;
  const table = (infos: readonly PropertyInfo[]) => {
    const rows: string[] = [];
    let group = '';
    for (const info of infos) {
      if (info.group !== group) {
        group = info.group;
        rows.push(`<tr class="group"><th colspan="4">${escapeHtml(group)}</th></tr>`);
      }
      const fp = formatProperty(info, p, units);
      rows.push(
        `<tr data-prop="${escapeHtml(info.key)}"><td>${escapeHtml(info.label)}</td><td>${escapeHtml(info.symbol)}</td>` +
          `<td class="num" data-value="${escapeHtml(fp.text)}">${escapeHtml(fp.text)}</td><td>${escapeHtml(fp.unit)}</td></tr>`,
      );
    }
    return `<table class="props"><thead><tr><th>Property</th><th>Symbol</th><th>Value</th><th>Unit</th></tr></thead><tbody>${rows.join('')}</tbody></table>`;
  };
  const all = PROPERTY_CATALOG as readonly PropertyInfo[];
  return (
    `<section class="block"><h2>Section properties</h2><div class="cols">` +
    table(all.filter((i) => LEFT_GROUPS.has(i.group))) +
    table(all.filter((i) => !LEFT_GROUPS.has(i.group))) +
    `</div></section>`
  );
}

/** The list of shapes with the geometry schedule: one row each, then the coordinate tables. */
function shapeTable(input: ReportInput, size: number): { html: string; appendix: string } {
  const { doc, evaluation } = input;
  const units = doc.units;
  if (doc.shapes.length === 0) return { html: '', appendix: '' };
  const items = doc.shapes.map((s, i) => shapeSchedule(s, i, size));
  const sched = renderScheduleTables(items, units);
  const area = (v: number) => formatQuantity(v, 2, size);
  // What each shape changes: the section's area after it minus before it, in list order, so the
  // column adds up to the final area and a checker can follow every step.
  const stepper = createEvaluator();
  let before = 0;
  const rows = doc.shapes.map((_s, i) => {
    const res = evaluation.shapes[i];
    let own = '—';
    if (res?.error) own = `error: ${res.error}`;
    else if (res && res.region.length > 0) own = area(Math.abs(regionMoments(res.region).m00));
    const step = stepper.evaluate({ ...doc, shapes: doc.shapes.slice(0, i + 1) });
    const after = step.region.length ? regionMoments(step.region).m00 : 0;
    const change = after - before;
    before = after;
    const changeText = area(change) === '0' ? '0' : `${change > 0 ? '+' : '−'}${area(Math.abs(change))}`;
    const it = items[i];
    const where = sched.where.get(i);
    const geometry = where ? `${paramsText(it.params)}; ${it.table && it.table.rows.length > 40 ? `${listingSummary(it, size)}; ` : ''}listed in ${where}` : paramsText(it.params);
    return (
      `<tr><td class="num">${i + 1}</td><td data-shape-name>${escapeHtml(it.name)}</td><td>${escapeHtml(it.kind)}</td><td>${escapeHtml(it.operation)}</td>` +
      `<td>${escapeHtml(geometry)}</td><td class="num">${escapeHtml(own)}</td><td class="num">${escapeHtml(changeText)}</td></tr>`
    );
  });
  const html =
    `<section class="shapes-list"><h2>Input shapes and geometry schedule</h2>` +
    `<p class="small">Applied in this order to an empty section. Lengths in ${escapeHtml(units)} to ${GEOMETRY_SIGFIGS} significant figures, angles in degrees (+ counter-clockwise), ` +
    `areas in ${escapeHtml(unitText(units, 2))}: each shape's own, and the change it makes (the changes add up to the total area). ` +
    `An arc runs from the previous point through its through-point to its end.</p>` +
    `<table class="shapes"><thead><tr><th>#</th><th>Name</th><th>Kind</th><th>Operation</th><th>Geometry</th><th>Own area</th><th>Area change</th></tr></thead>` +
    `<tbody>${rows.join('')}</tbody></table>` +
    frameNotes(items).map((n) => `<p class="small frame-note">${escapeHtml(n)}</p>`).join('') +
    `</section>` +
    sched.tables;
  return { html, appendix: sched.appendix };
}

/** The regions of the shapes subtracted from the section (for dimensioning notches). */
function subtractedRegions(input: ReportInput): Region[] {
  return input.doc.shapes.flatMap((s, i) => {
    const r = input.evaluation.shapes[i];
    return s.op === 'subtract' && r && !r.error && r.region.length > 0 ? [r.region] : [];
  });
}

export function renderReportHtml(input: ReportInput): string {
  const { doc, evaluation } = input;
  const props = evaluation.props;
  const units = doc.units;
  const cut = input.cut && Number.isFinite(input.cut.at) && (input.cut.axis === 'x' || input.cut.axis === 'y') ? input.cut : null;
  const heading = doc.name ?? doc.title?.section ?? 'Section';

  const size = sectionSize(props?.bounds ?? null);
  const fig = props ? renderSectionFigure(evaluation.region, props, units, { maxWidthMm: 180, maxHeightMm: 150, cut, cuts: subtractedRegions(input), shearCentre: input.torsion?.ok ? input.torsion.result.shearCentre : null }) : null;
  let sectionBlock: string;
  if (fig && props) {
    const shown = (key: string) => formatProperty(PROPERTY_CATALOG.find((i) => i.key === key)!, props, units).text;
    const captionBits = [
      `Section to scale ${fig.scale.label} on the printed page (print at 100 %, A4 or US Letter). Dimensions in ${units}.`,
      'Positions run from the leftmost and lowest points of the section (small circles = 0); Ø = diameter; plate thicknesses where two faces are parallel.',
    ];
    const left = fig.dimensions.omitted.length;
    if (left > 0) captionBits.push(`${left} dimension${left === 1 ? ' was' : 's were'} left off to keep the figure legible; the geometry schedule lists every coordinate.`);
    captionBits.push(`C = centroid (${shown('centroid.x')}, ${shown('centroid.y')}); 1, 2 = principal axes, θ = ${shown('theta')}°.`);
    if (input.torsion?.ok) {
      const sc = input.torsion.result.shearCentre;
      captionBits.push(`S = shear centre (${formatQuantity(sc.x, 1, size)}, ${formatQuantity(sc.y, 1, size)}), see Torsion.`);
    }
    captionBits.push(fig.originShown ? 'O = origin (0, 0).' : 'The origin (0, 0) lies outside the figure.');
    // The figure with its caption and the revision block beside it, as on a drawing sheet; the
    // side column wraps below the figure when the figure leaves no room for it.
    sectionBlock =
      `<section class="block"><h2>Section</h2><div class="fig-row"><div class="figure">${fig.svg}</div>` +
      `<div class="fig-side"><p class="caption" data-scale="${escapeHtml(fig.scale.label)}">${escapeHtml(captionBits.join(' '))}</p>${renderCheckerBlock(checkerFields(doc))}</div></div></section>`;
  } else {
    // Nothing to draw: say so in words, never a drawing of nothing.
    const why =
      evaluation.lines.length > 0 && doc.shapes.every((s) => kindOf(s).line)
        ? 'The document holds line elements only: there is no area, so the area properties are absent (this is not an error). The line groups, with their own figure and table, follow.'
        : emptySectionText(doc.shapes.length, evaluation.message);
    sectionBlock = `<section class="block empty-section" data-empty="true"><h2>Section</h2><p class="empty-message">${escapeHtml(why)}</p></section>`;
  }

  const notes = evaluation.warnings.map((w) => `<li>${escapeHtml(formatShapeIssue(w, doc.shapes))}</li>`);
  const shapes = shapeTable(input, size);
  const body: string[] = [`<h1>Section properties: ${escapeHtml(heading)}</h1>`, titleBlock(doc), sectionBlock, shapes.html];
  if (notes.length > 0) body.push(`<section class="block"><h2>Notes from the evaluation</h2><ul class="small">${notes.join('')}</ul></section>`);
  if (props) body.push(propertyTable(input));
  if (props && cut) body.push(renderQbDiagram(evaluation.region, props, units, cut));
  if (props) body.push(renderMaterialsReport(input));
  if (props && input.torsion) body.push(renderTorsionSection(input.torsion, units, size, props.centroid));
  const lines = renderLineReport(input);
  if (lines) body.push(lines);
  // The caution closes the method block, so a page break never leaves it alone on a last page.
  body.push(
    `<section class="block method"><h2>Method</h2><div class="method-cols"><p class="small">${escapeHtml(METHOD_NOTE)}</p><p class="small">${escapeHtml(CONVENTIONS)}</p><p class="small" data-note="numbers">${escapeHtml(NUMBER_NOTE)}</p><p class="small">${escapeHtml(QB_NOTE)}</p></div>` +
      `<p class="caution">${escapeHtml(CAUTION_TEXT)}</p></section>`,
  );
  if (!fig) body.push(renderCheckerBlock(checkerFields(doc)));
  const proposal = doc.variants?.length ? reportProposal(doc, input.variant) : null;
  const cmp = proposal ? renderComparisonSection(doc, evaluation, proposal) : null;
  if (cmp) {
    body.splice(1, 0, cmp.intro);
    body.push(cmp.html);
  }
  if (shapes.appendix) body.push(shapes.appendix);

  return (
    `<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8">` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">` +
    `<title>${escapeHtml(`Section properties: ${heading}`)}</title><style>${pageCss(`Section properties: ${heading}${input.generated ? ` · generated ${input.generated}` : ''}`, input.paper)}${CSS}${MATERIALS_CSS}${cmp ? COMPARISON_CSS : ''}</style></head>` +
    `<body>${body.join('\n')}</body></html>\n`
  );
}
