/**
 * The printable report: one self-contained HTML document (inline CSS and SVG, no scripts, no
 * external resources) that prints on A4 and US Letter. Every number comes from the same
 * formatter as the panel (formatProperty / formatNumber), and every string taken from the
 * document is escaped, so a name is always shown as text.
 */
import type { SectionDocument } from '../document/types';
import { createEvaluator, type Evaluation } from '../evaluate';
import { formatIssue } from '../document/validate';
import { regionMoments } from '../moments/kernel';
import { PROPERTY_CATALOG, formatNumber, formatProperty, unitText, type PropertyInfo } from '../properties/catalog';
import { CAUTION_TEXT } from './caution';
import { escapeHtml } from './escape';
import { renderSectionFigure } from './figure';
import { renderQbDiagram } from './qb-chart';
import { shapeDimensions, shapeKind, shapeOperation } from './shape-list';

export interface ReportInput {
  doc: SectionDocument;
  evaluation: Evaluation;
  cut?: { axis: 'x' | 'y'; at: number } | null;
  /** Shown in the footer when given (e.g. an ISO time stamp); never invented. */
  generated?: string;
  /** Paper size for printing; the browser's default when absent. */
  paper?: 'A4' | 'Letter';
}

export const METHOD_NOTE =
  'Properties are computed by exact boundary integration (Green’s theorem) over the straight lines and circular arcs ' +
  'that bound the section; arcs are not replaced by chords. Shapes are combined in list order (add, subtract, intersect). ' +
  'For the booleans, clipper-lib decides the topology on a fine chord approximation, then each arc and each intersection ' +
  'point is restored exactly before integration.';

const CONVENTIONS =
  'Axes: x to the right, y up, origin O. Second moments Ix, Iy and the product Ixy = ∫(x − x̄)(y − ȳ) dA are about axes ' +
  'through the centroid C. θ is measured counter-clockwise from +x to the major principal axis 1. Elastic moduli are ' +
  'I divided by the distance from the centroid to the extreme fibre; plastic moduli are about the equal-area axes. ' +
  'Values are shown to 6 significant figures.';

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
h2 { font-size: 10pt; margin: 4mm 0 1.5mm; border-bottom: 0.3mm solid #111; padding-bottom: 0.5mm; }
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
.caution { border: 0.4mm solid #111; padding: 1.5mm 2.5mm; font-weight: 600; margin: 3mm 0; break-inside: avoid; }
.block { break-inside: avoid; page-break-inside: avoid; }
.values { width: auto; min-width: 110mm; }
.props td:nth-child(2) { white-space: nowrap; }
.cols { display: flex; gap: 4mm; align-items: flex-start; }
.cols > table { flex: 1 1 0; }
.props th, .props td { padding: 0.35mm 1.2mm; }
footer { font-size: 7.5pt; color: #555; margin-top: 3mm; }
@media screen { body { padding: 10mm; background: #fff; } }
@media print { body { padding: 0; max-width: none; } }
`;

function titleBlock(doc: SectionDocument): string {
  const t = doc.title ?? {};
  const cell = (label: string, value: string | undefined) =>
    `<td><span class="label">${escapeHtml(label)}</span><span class="value" data-field="${escapeHtml(label.toLowerCase())}">${escapeHtml(value ?? '')}</span></td>`;
  return (
    `<table class="titleblock block"><tbody>` +
    `<tr>${cell('Project', t.project)}${cell('Section', t.section ?? doc.name)}${cell('Units', doc.units)}${cell('Revision', t.revision)}</tr>` +
    `<tr>${cell('Author', t.author)}${cell('Checker', t.checker)}${cell('Date', t.date)}<td><span class="label">Signature</span><span class="value"></span></td></tr>` +
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

function shapeTable(input: ReportInput): string {
  const { doc, evaluation } = input;
  const units = doc.units;
  // What each shape changes: the section's area after it minus before it, in list order, so the
  // column adds up to the final area and a checker can follow every step.
  const stepper = createEvaluator();
  let before = 0;
  const rows = doc.shapes.map((s, i) => {
    const res = evaluation.shapes.find((r) => r.id === s.id);
    let area = '—';
    if (res?.error) area = `error: ${res.error}`;
    else if (res && res.region.length > 0) area = formatNumber(Math.abs(regionMoments(res.region).m00));
    const step = stepper.evaluate({ ...doc, shapes: doc.shapes.slice(0, i + 1) });
    const after = step.region.length ? regionMoments(step.region).m00 : 0;
    const change = after - before;
    before = after;
    const changeText = Math.abs(change) < 1e-12 * Math.max(after, 1e-300) ? '0' : `${change > 0 ? '+' : '−'}${formatNumber(Math.abs(change))}`;
    const name = s.name ? `${s.name} (${s.id})` : s.id;
    return (
      `<tr><td class="num">${i + 1}</td><td>${escapeHtml(name)}</td><td>${escapeHtml(shapeKind(s))}</td><td>${escapeHtml(shapeOperation(s))}</td>` +
      `<td>${escapeHtml(shapeDimensions(s))}</td><td class="num">${escapeHtml(area)}</td><td class="num">${escapeHtml(changeText)}</td></tr>`
    );
  });
  return (
    `<section class="block"><h2>Input shapes</h2>` +
    `<p class="small">Applied in this order to an empty section. Dimensions and coordinates in ${escapeHtml(units)}; areas in ${escapeHtml(unitText(units, 2))}: each shape on its own, and the change it makes to the section (these changes add up to the total area).</p>` +
    `<table class="shapes"><thead><tr><th>#</th><th>Name (id)</th><th>Kind</th><th>Operation</th><th>Dimensions and placement</th><th>Own area</th><th>Area change</th></tr></thead>` +
    `<tbody>${rows.join('')}</tbody></table></section>`
  );
}

export function renderReportHtml(input: ReportInput): string {
  const { doc, evaluation } = input;
  const props = evaluation.props;
  const units = doc.units;
  const cut = input.cut && Number.isFinite(input.cut.at) && (input.cut.axis === 'x' || input.cut.axis === 'y') ? input.cut : null;
  const heading = doc.name ?? doc.title?.section ?? 'Section';

  const fig = renderSectionFigure(evaluation.region, props, units, { maxWidthMm: 180, maxHeightMm: 150, cut });
  const captionBits = [`Section to scale ${fig.scale.label} on the printed page (print at 100 %, A4 or US Letter). Dimensions in ${units}.`];
  if (props) {
    const shown = (key: string) => formatProperty(PROPERTY_CATALOG.find((i) => i.key === key)!, props, units).text;
    captionBits.push(`C = centroid (${shown('centroid.x')}, ${shown('centroid.y')}); 1, 2 = principal axes, θ = ${shown('theta')}°.`);
  }
  captionBits.push(fig.originShown ? 'O = origin (0, 0).' : 'The origin (0, 0) lies outside the figure.');

  const notes = evaluation.warnings.map((w) => `<li>${escapeHtml(formatIssue(w))}</li>`);
  const body: string[] = [
    `<h1>Section properties: ${escapeHtml(heading)}</h1>`,
    titleBlock(doc),
    `<section class="block"><h2>Section</h2><div class="figure">${fig.svg}</div><p class="caption" data-scale="${escapeHtml(fig.scale.label)}">${escapeHtml(captionBits.join(' '))}</p></section>`,
    shapeTable(input),
  ];
  if (notes.length > 0) body.push(`<section class="block"><h2>Notes from the evaluation</h2><ul class="small">${notes.join('')}</ul></section>`);
  if (props) body.push(propertyTable(input));
  else body.push(`<section class="block"><h2>Section properties</h2><p>${escapeHtml(evaluation.message ?? 'The section has no area, so it has no properties.')}</p></section>`);
  if (props && cut) body.push(renderQbDiagram(evaluation.region, props, units, cut));
  body.push(
    `<section class="block"><h2>Method</h2><p class="small">${escapeHtml(METHOD_NOTE)}</p><p class="small">${escapeHtml(CONVENTIONS)}</p></section>`,
    `<p class="caution">${escapeHtml(CAUTION_TEXT)}</p>`,
  );

  return (
    `<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8">` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">` +
    `<title>${escapeHtml(`Section properties: ${heading}`)}</title><style>${pageCss(`Section properties: ${heading}${input.generated ? ` · generated ${input.generated}` : ''}`, input.paper)}${CSS}</style></head>` +
    `<body>${body.join('\n')}</body></html>\n`
  );
}
