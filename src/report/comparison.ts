/**
 * The report's cutout check, printed when the document has a proposal: the proposal against the
 * baseline on its own pages. In order: the caution that the verdict is a geometric screen, not a
 * design check; the verdict; both outlines in one figure with the removed material shaded; what
 * the proposal changes, shape by shape; every property before and after with its change, change
 * in per cent and limit flag, the centroid shift and the rotation of the principal axes; the
 * limits used; the net sections along the document's lines; and every caution, numbered as in the
 * figure, with the rules they use.
 *
 * Which proposal: the one asked for, else the document's active proposal, else its first. One
 * proposal per report; the report names the others.
 */
import { analyseCutouts, type CutoutFindings } from '../cautions/analyse';
import { HOLE_RULE_SETS } from '../cautions/hole-rules';
import { namedInputShapes } from '../cautions/input-shapes';
import { cautionsInOrder } from '../cautions/order';
import type { Caution } from '../cautions/types';
import { CUTOUT_CAUTION_TEXT, HOLE_CHECK_NOTE } from '../cautions/wording';
import { compareSections, type SectionComparison } from '../compare/compare';
import { EXAMPLE_LIMITS_NOTE, evaluateLimits, exampleLimits, overallVerdict, type LimitResult } from '../compare/limits';
import { materialChange } from '../compare/material-change';
import type { PropertyChange } from '../compare/property-change';
import type { NetLine } from '../document/net-lines';
import { UNIT_IN_METRES, type SectionDocument } from '../document/types';
import { findVariant, sectionOf, VariantError } from '../document/variants';
import { createEvaluator, type Evaluation } from '../evaluate';
import { describeGap, netSection, NET_SECTION_CAUTION, NET_SECTION_PURPOSE, type NetSection } from '../netsection/net-section';
import { formatNumber, formatQuantity, unitText } from '../properties/catalog';
import type { Shape } from '../shapes/shape';
import { CAUTION_TEXT } from './caution';
import { renderComparisonFigure } from './comparison-figure';
import { escapeHtml } from './escape';
import { paramsText, shapeSchedule } from './schedule';

/** The proposal the report compares: the one asked for, else the active one, else the first; null when there is none. */
export function reportProposal(doc: SectionDocument, requested?: string | null): string | null {
  if (requested === null) return null;
  if (requested !== undefined) return requested;
  return doc.activeVariant ?? doc.variants?.[0]?.name ?? null;
}

export const COMPARISON_CSS = `
.comparison { break-before: page; page-break-before: always; }
.comparison .verdict-line { font-size: 11pt; font-weight: 700; margin: 2mm 0; }
.comparison .verdict-line .within { color: #1f6b45; }
.comparison .verdict-line .beyond { color: #a3231a; }
table.cmp-table { font-size: 7.5pt; }
table.cmp-table th, table.cmp-table td { padding: 0.2mm 1.2mm; }
table.cmp-table tr.beyond td { background: #fbe4e1; }
table.cmp-table td.flag-beyond { font-weight: 700; color: #a3231a; }
table.cmp-table td.flag-within { color: #1f6b45; }
.cmp-split { break-inside: auto; page-break-inside: auto; }
.cmp-split tr { break-inside: avoid; page-break-inside: avoid; }
.legend-line { font-size: 8pt; margin: 1mm 0; }
.key { display: inline-block; width: 5mm; height: 2.6mm; vertical-align: -0.3mm; margin: 0 1mm 0 2.5mm; border: 0.2mm solid #111; }
.key.removed { background: repeating-linear-gradient(-45deg, #b35f00 0 0.3mm, #f3c89a 0.3mm 0.9mm); border-color: #b35f00; }
.key.added { background: #9fd8bf; border-color: #1f7a58; }
.key.proposal { background: #c9d6e2; }
.key.baseline { border: 0.3mm dashed #4c5c56; background: none; }
ol.caution-list { margin: 1mm 0; padding-left: 6mm; font-size: 8pt; }
ol.caution-list li { margin-bottom: 0.8mm; break-inside: avoid; }
ol.caution-list .src { color: #444; font-size: 7.5pt; }
.net-gaps { margin: 0.5mm 0 1mm; padding-left: 6mm; font-size: 7.5pt; }
`;

interface Side {
  doc: SectionDocument;
  ev: Evaluation;
}

const num = (v: number | null, fmt: (v: number) => string) => (v === null ? '—' : fmt(v));
const signed = (t: string) => (t === '0' || t === '—' || t.startsWith('−') || t.startsWith('-') ? t : `+${t}`);

function flagOf(results: readonly LimitResult[], key: string): 'within' | 'beyond' | '' {
  const hits = results.filter((r) => r.property === key && r.status !== 'not-applicable');
  if (!hits.length) return '';
  return hits.some((h) => h.status === 'beyond') ? 'beyond' : 'within';
}

function comparisonTable(c: SectionComparison, results: readonly LimitResult[], units: SectionDocument['units']): string {
  const size = c.extent;
  const rows: string[] = [];
  let group = '';
  const row = (r: PropertyChange) => {
    const fmt = (v: number) => (r.power === 0 ? formatNumber(v, 4, 90) : formatQuantity(v, r.power, size));
    const flag = flagOf(results, r.key);
    return (
      `<tr data-compare="${escapeHtml(r.key)}"${flag === 'beyond' ? ' class="beyond"' : ''}><td>${escapeHtml(r.label)}</td><td>${escapeHtml(r.symbol)}</td>` +
      `<td class="num">${escapeHtml(fmt(r.baseline))}</td><td class="num">${escapeHtml(fmt(r.proposal))}</td>` +
      `<td class="num">${escapeHtml(signed(num(r.change, fmt)))}</td><td class="num" data-value="${r.changePercent === null ? '' : String(r.changePercent)}">${escapeHtml(signed(num(r.changePercent, (v) => formatNumber(v, 4, 100))))}</td>` +
      `<td>${escapeHtml(unitText(units, r.power, r.unit))}</td><td class="flag-${flag}">${flag === 'beyond' ? 'BEYOND' : flag}</td></tr>`
    );
  };
  for (const r of c.rows) {
    if (r.group !== group) {
      group = r.group;
      rows.push(`<tr class="group"><th colspan="8">${escapeHtml(group)}</th></tr>`);
    }
    rows.push(row(r));
  }
  const s = c.centroidShift;
  const len = (v: number) => formatQuantity(v, 1, size);
  const cf = flagOf(results, 'centroid');
  rows.push(`<tr class="group"><th colspan="8">Centroid and principal axes</th></tr>`);
  rows.push(
    `<tr data-compare="centroid"${cf === 'beyond' ? ' class="beyond"' : ''}><td>Centroid shift (Δx ${escapeHtml(len(s.dx))}, Δy ${escapeHtml(len(s.dy))})</td><td>ΔC</td><td class="num"></td><td class="num"></td>` +
      `<td class="num">${escapeHtml(len(s.length))}</td><td class="num">—</td><td>${escapeHtml(units)}</td><td class="flag-${cf}">${cf === 'beyond' ? 'BEYOND' : cf}</td></tr>`,
  );
  const tf = flagOf(results, 'theta');
  rows.push(
    `<tr data-compare="rotation"${tf === 'beyond' ? ' class="beyond"' : ''}><td>Rotation of the principal axes</td><td>Δθ</td><td class="num"></td><td class="num"></td>` +
      `<td class="num">${c.rotation.degrees === null ? '—' : escapeHtml(signed(formatNumber(c.rotation.degrees, 4, 90)))}</td><td class="num">—</td><td>°</td><td class="flag-${tf}">${tf === 'beyond' ? 'BEYOND' : tf}</td></tr>`,
  );
  const notes = c.rotation.note ? `<p class="small">${escapeHtml(c.rotation.note)}</p>` : '';
  return (
    `<section><h2>Properties before and after</h2>` +
    `<table class="cmp-table cmp-split"><thead><tr><th>Property</th><th>Symbol</th><th>Baseline</th><th>Proposal</th><th>Change</th><th>Change %</th><th>Unit</th><th>Limit</th></tr></thead>` +
    `<tbody>${rows.join('')}</tbody></table>${notes}` +
    `<p class="small">Change = proposal − baseline; change % = 100 · change / |baseline|, given for sizes (area, second moments, radii, moduli), not for coordinates or first moments, which depend on the origin. ` +
    `Sx,min and Sy,min are the elastic moduli to the critical fibre, the smaller of each pair.</p></section>`
  );
}

const FIELD_TEXT: Record<LimitResult['field'], string> = { maxLossPercent: 'loss ≤', maxGainPercent: 'gain ≤', maxShift: 'shift ≤', maxRotation: 'rotation ≤' };

function limitsTable(results: readonly LimitResult[], examples: boolean, units: string): string {
  const unit = (f: LimitResult['field']) => (f === 'maxShift' ? ` ${units}` : f === 'maxRotation' ? '°' : ' %');
  const rows = results.map(
    (r) =>
      `<tr data-limit="${escapeHtml(r.property)}"${r.status === 'beyond' ? ' class="beyond"' : ''}><td>${escapeHtml(r.label)}</td><td>${escapeHtml(FIELD_TEXT[r.field])} ${escapeHtml(formatNumber(r.allowed))}${unit(r.field)}</td>` +
      `<td>${escapeHtml(r.status === 'beyond' ? 'BEYOND' : r.status === 'within' ? 'within' : 'does not apply')}</td><td>${escapeHtml(r.message)}</td></tr>`,
  );
  return (
    `<section class="block"><h2>Limits used</h2>` +
    `<p class="small">${escapeHtml(examples ? `The document sets no limits; these are Kern's example limits. ${EXAMPLE_LIMITS_NOTE}` : 'Limits set in the document by its author.')} ` +
    'A change exactly at a limit is within it. The verdict is beyond when any limit is beyond.</p>' +
    (rows.length
      ? `<table class="cmp-table"><thead><tr><th>Property</th><th>Allowed</th><th>Status</th><th>Measured</th></tr></thead><tbody>${rows.join('')}</tbody></table>`
      : '<p class="small">No limits are set, so the verdict rests on nothing: set the limits that apply.</p>') +
    `</section>`
  );
}

function netSectionsBlock(lines: readonly NetLine[], base: Side, prop: Side, units: string): string {
  if (!lines.length) return '';
  const one = (r: NetSection | string, L: number) => {
    if (typeof r === 'string') return `<td colspan="2">${escapeHtml(r)}</td>`;
    const f = (v: number) => formatNumber(v, 4, L);
    return `<td class="num">${escapeHtml(f(r.grossLength))}</td><td class="num">${escapeHtml(f(r.netLength))}</td>`;
  };
  const run = (region: Evaluation['region'], l: NetLine): NetSection | string => {
    try {
      return netSection(region, { x: l.from[0], y: l.from[1] }, { x: l.to[0], y: l.to[1] });
    } catch (e) {
      return e instanceof Error ? e.message : String(e);
    }
  };
  const rows: string[] = [];
  const gaps: string[] = [];
  lines.forEach((l, k) => {
    const L = Math.hypot(l.to[0] - l.from[0], l.to[1] - l.from[1]);
    const f = (v: number) => formatNumber(v, 6, L);
    const b = run(base.ev.region, l), p = run(prop.ev.region, l);
    const name = `L${k + 1}${l.name ? ` ${l.name}` : ''}`;
    rows.push(`<tr data-net-line="${k}"><td>${escapeHtml(name)}</td><td>(${escapeHtml(f(l.from[0]))}, ${escapeHtml(f(l.from[1]))}) → (${escapeHtml(f(l.to[0]))}, ${escapeHtml(f(l.to[1]))})</td>${one(b, L)}${one(p, L)}</tr>`);
    if (typeof p !== 'string' && p.gaps.length) {
      gaps.push(`<p class="small">${escapeHtml(name)}, proposal, gaps along the line (distances from its start):</p><ol class="net-gaps">${p.gaps.map((g) => `<li>${escapeHtml(describeGap(g, (v) => formatNumber(v, 4, L)))} ${escapeHtml(units)}</li>`).join('')}</ol>`);
    }
    for (const n of typeof p === 'string' ? [] : p.notes) gaps.push(`<p class="small">${escapeHtml(name)}: ${escapeHtml(n)}</p>`);
  });
  return (
    `<section class="block"><h2>Net section along the drawn lines</h2><p class="small">${escapeHtml(NET_SECTION_PURPOSE)} Lengths in ${escapeHtml(units)}.</p>` +
    `<table class="cmp-table"><thead><tr><th rowspan="2">Line</th><th rowspan="2">From → to</th><th colspan="2">Baseline</th><th colspan="2">Proposal</th></tr>` +
    `<tr><th>Gross</th><th>Net</th><th>Gross</th><th>Net</th></tr></thead><tbody>${rows.join('')}</tbody></table>${gaps.join('')}` +
    `<p class="qb-caution">${escapeHtml(NET_SECTION_CAUTION)}</p></section>`
  );
}

function cautionsBlock(mine: readonly Caution[], before: readonly Caution[], rules: (typeof HOLE_RULE_SETS)[keyof typeof HOLE_RULE_SETS], name: string): string {
  const item = (c: Caution, n: number) =>
    `<li value="${n}" data-caution-kind="${escapeHtml(c.kind)}"><b>${c.severity === 'warning' ? 'Warning' : 'Note'}.</b> ${escapeHtml(c.message)}${c.source ? ` <span class="src">[${escapeHtml(c.source)}]</span>` : ''}</li>`;
  const newList = mine.length
    ? `<ol class="caution-list">${mine.map((c, k) => item(c, k + 1)).join('')}</ol>`
    : `<p class="small">The proposal raises no new caution from the geometry.</p>`;
  const oldList = before.length
    ? `<h3>Already in the baseline</h3><ol class="caution-list">${before.map((c, k) => item(c, mine.length + k + 1)).join('')}</ol>`
    : '';
  return (
    `<section class="cautions"><h2>Cautions from the geometry</h2>` +
    `<p class="small">Numbered as in the figure. Hole distances against ${escapeHtml(rules.name)}. ${escapeHtml(HOLE_CHECK_NOTE)} ${escapeHtml(rules.notChecked)}</p>` +
    `<h3>New with “${escapeHtml(name)}”</h3>${newList}${oldList}</section>`
  );
}

/** The shapes a proposal adds, edits or removes, against the baseline. */
function shapeChanges(doc: SectionDocument, name: string, prop: Side, size: number): string {
  const v = findVariant(doc, name);
  if (!v) return '';
  const baseById = new Map(doc.shapes.map((s) => [s.id, s]));
  const mentioned = new Set(v.shapes.map((e) => (typeof e === 'string' ? e : e.id)));
  const rows: string[] = [];
  prop.doc.shapes.forEach((s: Shape, i: number) => {
    const entry = v.shapes[i];
    if (typeof entry === 'string') return;
    const it = shapeSchedule(s, i, size);
    const what = baseById.has(s.id) ? 'edited' : 'new';
    rows.push(`<tr><td class="num">${i + 1}</td><td>${escapeHtml(it.name)}</td><td>${what}</td><td>${escapeHtml(it.kind)}</td><td>${escapeHtml(it.operation)}</td><td>${escapeHtml(paramsText(it.params))}</td></tr>`);
  });
  doc.shapes.forEach((s, i) => {
    if (mentioned.has(s.id)) return;
    const it = shapeSchedule(s, i, size);
    rows.push(`<tr><td class="num">—</td><td>${escapeHtml(it.name)}</td><td>removed</td><td>${escapeHtml(it.kind)}</td><td>${escapeHtml(it.operation)}</td><td>${escapeHtml(paramsText(it.params))}</td></tr>`);
  });
  const kept = v.shapes.filter((e) => typeof e === 'string').length;
  return (
    `<section class="block"><h2>What the proposal changes</h2>` +
    `<p class="small">“${escapeHtml(name)}” keeps ${kept} shape${kept === 1 ? '' : 's'} of the baseline as they are; the rest are listed here (# = place in the proposal's order). Lengths in ${escapeHtml(doc.units)}.</p>` +
    (rows.length
      ? `<table class="shapes"><thead><tr><th>#</th><th>Name</th><th>Change</th><th>Kind</th><th>Operation</th><th>Geometry</th></tr></thead><tbody>${rows.join('')}</tbody></table>`
      : `<p class="small">None: the proposal is the baseline unchanged.</p>`) +
    `</section>`
  );
}

function problem(name: string, text: string): { intro: string; html: string } {
  return {
    intro: `<p class="small comparison-intro">This document holds proposals; the cutout check of “${escapeHtml(name)}” could not be made (see its page).</p>`,
    html: `<section class="comparison" data-comparison="${escapeHtml(name)}"><h1>Cutout check: “${escapeHtml(name)}”</h1><p class="empty-message">${escapeHtml(text)}</p><p class="caution">${escapeHtml(CUTOUT_CAUTION_TEXT)}</p></section>`,
  };
}

/**
 * The cutout check for proposal `name`, given the baseline's evaluation: `intro`, a line for the
 * top of the report, and `html`, the section itself (it starts a new page).
 */
export function renderComparisonSection(doc: SectionDocument, baseline: Evaluation, name: string): { intro: string; html: string } {
  let propDoc: SectionDocument;
  try {
    propDoc = sectionOf(doc, name);
  } catch (e) {
    if (e instanceof VariantError) return problem(name, `The proposal cannot be read: ${e.message}.`);
    throw e;
  }
  const baseDoc: SectionDocument = { ...doc, shapes: doc.shapes };
  delete baseDoc.variants;
  delete baseDoc.activeVariant;
  const base: Side = { doc: baseDoc, ev: baseline };
  const prop: Side = { doc: propDoc, ev: createEvaluator().evaluate(propDoc) };
  if (!base.ev.props) return problem(name, `The baseline has no area, so there is nothing to compare. ${base.ev.message ?? ''}`.trim());
  if (!prop.ev.props) return problem(name, `The proposal has no area, so there is nothing to compare. ${prop.ev.message ?? ''}`.trim());
  const units = doc.units;
  const c = compareSections(base.ev.props, prop.ev.props);
  const examples = !doc.limits;
  const limits = doc.limits ?? exampleLimits(UNIT_IN_METRES[units]);
  const results = evaluateLimits(c, limits, units);
  const verdict = overallVerdict(results);
  const change = materialChange(base.ev.region, prop.ev.region);
  const rules = HOLE_RULE_SETS[doc.holeRules ?? 'en1993'];
  const opts = { rules: rules.id, unitInMetres: UNIT_IN_METRES[units], units };
  const mineF: CutoutFindings = analyseCutouts({ result: prop.ev.region, baseline: base.ev.region, shapes: namedInputShapes(prop.doc.shapes, prop.ev.shapes) }, opts);
  const beforeF: CutoutFindings = analyseCutouts({ result: base.ev.region, shapes: namedInputShapes(base.doc.shapes, base.ev.shapes) }, opts);
  const mine = cautionsInOrder(mineF.cautions), before = cautionsInOrder(beforeF.cautions);
  const lines = doc.netLines ?? [];
  const fig = renderComparisonFigure({
    baseline: base.ev.region,
    proposal: prop.ev.region,
    removed: change.removed,
    added: change.added,
    units,
    netLines: lines,
    markers: [...mine.map((caution, k) => ({ caution, number: k + 1, faint: false })), ...before.map((caution, k) => ({ caution, number: mine.length + k + 1, faint: true }))],
    maxWidthMm: 180,
    maxHeightMm: 150,
  });
  const area = (v: number) => `${formatQuantity(v, 2, c.extent)} ${unitText(units, 2)}`;
  const beyond = results.filter((r) => r.status === 'beyond').length;
  const applied = results.filter((r) => r.status !== 'not-applicable').length;
  const others = (doc.variants ?? []).map((v) => v.name).filter((n) => n !== name);
  const legend =
    `<p class="legend-line"><span class="key proposal"></span>proposal <span class="key baseline"></span>baseline outline ` +
    `<span class="key removed"></span>material removed (${escapeHtml(area(change.removedArea))}) <span class="key added"></span>material added (${escapeHtml(area(change.addedArea))})` +
    `${lines.length ? '; L1, L2, … net-section lines' : ''}; numbered marks: cautions (triangle: warning, circle: note; faint: already in the baseline).</p>`;
  const html =
    `<section class="comparison" data-comparison="${escapeHtml(name)}">` +
    `<h1>Cutout check: “${escapeHtml(name)}” against the baseline</h1>` +
    `<p class="caution" data-caution="cutout">${escapeHtml(CUTOUT_CAUTION_TEXT)}</p>` +
    `<p class="verdict-line" data-verdict="${verdict}">Verdict: <span class="${verdict}">${verdict === 'within' ? 'WITHIN' : 'BEYOND'} the limits</span> ` +
    `<span class="small">(${applied === 0 ? 'no limit applies' : beyond ? `${beyond} of ${applied} limits beyond` : `all ${applied} limits met`}${examples ? '; example limits, not values from a design code' : ''})</span></p>` +
    (fig
      ? `<section class="block"><h2>Baseline and proposal</h2><div class="figure">${fig.svg}</div>${legend}<p class="caption">To scale ${escapeHtml(fig.scale.label)} on the printed page (print at 100 %). Removed and added material are the exact boolean differences of the two sections.</p></section>`
      : '') +
    shapeChanges(doc, name, prop, c.extent) +
    comparisonTable(c, results, units) +
    limitsTable(results, examples, units) +
    netSectionsBlock(lines, base, prop, units) +
    cautionsBlock(mine, before, rules, name) +
    (others.length ? `<p class="small">The document holds ${others.length === 1 ? 'another proposal' : `${others.length} other proposals`}: ${others.map((n) => `“${escapeHtml(n)}”`).join(', ')}. Each is printed in its own report.</p>` : '') +
    `<p class="caution">${escapeHtml(`${CUTOUT_CAUTION_TEXT} ${CAUTION_TEXT}`)}</p>` +
    `</section>`;
  const intro = `<p class="small comparison-intro">This page shows the baseline section. The document holds ${doc.variants!.length === 1 ? 'a proposal' : 'proposals'}; the cutout check of “${escapeHtml(name)}” against this baseline follows on its own pages (verdict: ${verdict}).</p>`;
  return { intro, html };
}
