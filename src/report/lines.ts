/**
 * The report's part for line elements and strips:
 * - the line groups: a figure to a standard scale (the section faint for context, the line
 *   elements as strokes, exact SVG arcs, each group's centroid G, each weld load's force and the
 *   most stressed points), then one table with a column per group (length, centroid, second
 *   moments, polar moment, principal values, line section moduli, per unit thickness) and the
 *   line-group caution;
 * - the weld checks: per load, the load, the moment about the group's centroid, the direct part,
 *   the largest force per unit length and where it acts, with the elastic-method caution;
 * - the strips: each strip on its own, exact values of its outline against the thin-wall values
 *   of its centreline × t and their difference, with the thin-wall caution.
 * Every number comes from the one formatter; every string from the document is escaped.
 */
import type { SectionDocument, StripShape, Units } from '../document/types';
import type { Evaluation } from '../evaluate';
import type { Bounds, Region } from '../geometry/contour';
import { regionBounds } from '../geometry/contour';
import { unionBounds } from '../geometry/bounds';
import { UNIT_IN_METRES } from '../units';
import { chainFromPath, chainSegment, segmentCount, type LineChain } from '../lines/chain';
import { groupBoundsAbout } from '../lines/chain-bounds';
import { LINE_GROUP_CAUTION, THIN_WALL_CAUTION, WELD_GROUP_CAUTION } from '../lines/cautions';
import { formatLineProperty, LINE_PROPERTY_CATALOG } from '../lines/line-catalog';
import { thinWallComparison } from '../lines/thin-wall';
import { formatNumber, formatQuantity, GEOMETRY_SIGFIGS, sectionSize, unitText } from '../properties/catalog';
import { regionPathData } from '../exchange/svg-export';
import { shapeDisplayName } from '../shapes/ops';
import { shapeToRegion } from '../shapes/ops';
import type { WeldResult } from '../weld-results';
import { escapeHtml } from './escape';
import { chooseScale, type DrawingScale } from './scale';

export interface LineReportInput {
  doc: SectionDocument;
  evaluation: Evaluation;
}

const f = (v: number) => (Math.round(v * 1000) / 1000).toString();

/** Path data of an open or closed chain in SVG's y-down axes: exact lines and arcs. */
export function chainPathData(c: LineChain, num: (v: number) => string = f): string {
  const m = segmentCount(c);
  if (m === 0) return '';
  const parts = [`M${num(c.xy[0])} ${num(-c.xy[1])}`];
  for (let i = 0; i < m; i++) {
    const s = chainSegment(c, i);
    if (s.sweep === 0) parts.push(`L${num(s.bx)} ${num(-s.by)}`);
    else {
      const r = Math.hypot(s.bx - s.ax, s.by - s.ay) / (2 * Math.sin(Math.abs(s.sweep) / 2));
      parts.push(`A${num(r)} ${num(r)} 0 ${Math.abs(s.sweep) > Math.PI ? 1 : 0} ${s.sweep > 0 ? 0 : 1} ${num(s.bx)} ${num(-s.by)}`);
    }
  }
  if (c.closed) parts.push('Z');
  return parts.join(' ');
}

const PAD = 8; // paper mm around the drawing, for labels
const FONT = 2.8;

/** The figure of the line groups (with the section faint behind them), or null when nothing has extent. */
export function renderLineFigure(region: Region, ev: Evaluation, units: Units, maxW = 180, maxH = 120): { svg: string; scale: DrawingScale } | null {
  let b: Bounds | null = regionBounds(region);
  for (const g of ev.lines) b = unionBounds(b, groupBoundsAbout(g.chains, 0, 0));
  for (const w of ev.welds) b = unionBounds(b, { xmin: w.load.at[0], xmax: w.load.at[0], ymin: w.load.at[1], ymax: w.load.at[1] });
  if (!b) return null;
  const w = b.xmax - b.xmin, h = b.ymax - b.ymin;
  if (!(Math.max(w, h) > 0)) return null;
  const unitMm = UNIT_IN_METRES[units] * 1000;
  const scale = chooseScale(w * unitMm, h * unitMm, maxW - 2 * PAD, maxH - 2 * PAD);
  const k = scale.ratio * unitMm; // paper mm per drawing unit
  const W = w * k + 2 * PAD, H = h * k + 2 * PAD;
  const X = (x: number) => PAD + (x - b!.xmin) * k;
  const Y = (y: number) => PAD + (b!.ymax - y) * k;
  const tx = PAD - b.xmin * k, ty = PAD + b.ymax * k;
  const world = `transform="matrix(${f(k)} 0 0 ${f(k)} ${f(tx)} ${f(ty)})"`;
  const parts: string[] = [];
  if (region.length) parts.push(`<path class="area" ${world} d="${regionPathData(region)}" stroke-width="${0.2 / k}"/>`);
  for (const g of ev.lines) for (const c of g.chains) parts.push(`<path class="weld" ${world} d="${chainPathData(c, String)}" stroke-width="${0.7 / k}" data-line-group="${escapeHtml(g.group)}"/>`);
  for (const g of ev.lines) {
    if (!g.props) continue;
    const cx = X(g.props.centroid.x), cy = Y(g.props.centroid.y);
    parts.push(`<g class="gmark"><circle cx="${f(cx)}" cy="${f(cy)}" r="1.2" class="thin"/><path class="thin" d="M${f(cx - 2)} ${f(cy)} H${f(cx + 2)} M${f(cx)} ${f(cy - 2)} V${f(cy + 2)}"/></g><text x="${f(cx + 1.8)}" y="${f(cy + 3.6)}" class="gtext">G</text>`);
  }
  const head = (x: number, y: number, ux: number, uy: number, cls: string) =>
    `<path class="${cls}" d="M${f(x)} ${f(y)} L${f(x - 2.2 * ux - 0.8 * uy)} ${f(y - 2.2 * uy + 0.8 * ux)} L${f(x - 2.2 * ux + 0.8 * uy)} ${f(y - 2.2 * uy - 0.8 * ux)} Z"/>`;
  for (const wr of ev.welds) {
    const r = wr.result;
    if (r && r.critical.f > 0) {
      for (const p of [r.critical, ...r.alsoCritical]) {
        const px = X(p.x), py = Y(p.y);
        const ux = p.fx / p.f, uy = -p.fy / p.f;
        parts.push(`<circle cx="${f(px)}" cy="${f(py)}" r="1.6" class="crit-ring"/><path class="crit" d="M${f(px)} ${f(py)} L${f(px + 7 * ux)} ${f(py + 7 * uy)}"/>` + head(px + 7 * ux, py + 7 * uy, ux, uy, 'crit-fill'));
        const anchor = ux > 0.3 ? 'end' : ux < -0.3 ? 'start' : 'middle';
        const lx = px - 2.5 * Math.sign(ux) * (Math.abs(ux) > 0.3 ? 1 : 0), ly = py + (uy > 0.3 ? -2.2 : 4.2);
        parts.push(`<text x="${f(lx)}" y="${f(ly)}" text-anchor="${anchor}" class="crit-text">f max ${escapeHtml(formatNumber(r.critical.f))} ${escapeHtml(wr.units.perLength)}</text>`);
      }
    }
    const F = Math.hypot(wr.load.Fx, wr.load.Fy);
    const ax = X(wr.load.at[0]), ay = Y(wr.load.at[1]);
    if (F > 0) {
      const ux = wr.load.Fx / F, uy = -wr.load.Fy / F;
      parts.push(`<path class="load" d="M${f(ax - 12 * ux)} ${f(ay - 12 * uy)} L${f(ax)} ${f(ay)}"/>` + head(ax, ay, ux, uy, 'load-fill'));
    }
    parts.push(`<circle cx="${f(ax)}" cy="${f(ay)}" r="0.8" class="load-fill"/><text x="${f(ax + 1.5)}" y="${f(ay - 1.5)}" class="load-text">F${wr.index + 1}</text>`);
  }
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(W)}mm" height="${f(H)}mm" viewBox="0 0 ${f(W)} ${f(H)}" data-scale="${scale.label}" role="img" aria-label="Line groups drawn to scale ${scale.label}">` +
    `<style>text{font:${FONT}px sans-serif;fill:#111}.area{fill:#e6ecf1;stroke:#777}.weld{fill:none;stroke:#7a4e12;stroke-linecap:round;stroke-linejoin:round}` +
    `.thin{fill:none;stroke:#7a4e12;stroke-width:0.2}.gtext{fill:#7a4e12}.crit-ring{fill:none;stroke:#b3261e;stroke-width:0.35}.crit{stroke:#b3261e;stroke-width:0.3}.crit-fill{fill:#b3261e}.crit-text{fill:#b3261e}` +
    `.load{stroke:#1f5f8b;stroke-width:0.35}.load-fill{fill:#1f5f8b}.load-text{fill:#1f5f8b}</style>` +
    parts.join('') +
    `</svg>`;
  return { svg, scale };
}

function groupTable(ev: Evaluation, units: Units): string {
  const groups = ev.lines;
  const head = `<tr><th>Property</th><th>Symbol</th>${groups.map((g) => `<th>“${escapeHtml(g.group)}”</th>`).join('')}<th>Unit</th></tr>`;
  const rows: string[] = [];
  rows.push(`<tr><td>Line elements</td><td></td>${groups.map((g) => `<td class="num">${g.ids.length}</td>`).join('')}<td></td></tr>`);
  let grp = '';
  for (const info of LINE_PROPERTY_CATALOG) {
    if (info.group !== grp) {
      grp = info.group;
      rows.push(`<tr class="group"><th colspan="${groups.length + 3}">${escapeHtml(grp)}</th></tr>`);
    }
    const cells = groups.map((g) => {
      if (!g.props) return `<td class="num">—</td>`;
      const v = formatLineProperty(info, g.props, units);
      return `<td class="num" data-line="${escapeHtml(`${g.group}.${info.key}`)}">${escapeHtml(v.text)}</td>`;
    });
    rows.push(`<tr><td>${escapeHtml(info.label)}</td><td>${escapeHtml(info.symbol)}</td>${cells.join('')}<td>${escapeHtml(unitText(units, info.power, info.unit))}</td></tr>`);
  }
  const messages = groups.filter((g) => !g.props).map((g) => `<p class="small">“${escapeHtml(g.group)}”: ${escapeHtml(g.message ?? '')}</p>`);
  return `<table class="props line-props"><thead>${head}</thead><tbody>${rows.join('')}</tbody></table>${messages.join('')}`;
}

function weldBlock(w: WeldResult, units: Units): string {
  const u = w.units;
  const name = w.load.name ? ` · ${escapeHtml(w.load.name)}` : '';
  const title = `<h3>Weld load F${w.index + 1}${name} on “${escapeHtml(w.group)}”</h3>`;
  const loadText = `F = (${formatNumber(w.load.Fx)}, ${formatNumber(w.load.Fy)}) ${u.force} at (${formatNumber(w.load.at[0], GEOMETRY_SIGFIGS)}, ${formatNumber(w.load.at[1], GEOMETRY_SIGFIGS)}) ${units}` + (w.load.M ? `, added moment M = ${formatNumber(w.load.M)} ${u.moment} (+ counter-clockwise)` : '');
  if (!w.result) return `<div class="block weld">${title}<p class="small">${escapeHtml(loadText)}</p><p class="small">${escapeHtml(w.message ?? '')}</p></div>`;
  const r = w.result;
  const size = sectionSize(r.properties.bounds);
  const pt = (p: { x: number; y: number }) => `(${formatQuantity(p.x, 1, size, GEOMETRY_SIGFIGS)}, ${formatQuantity(p.y, 1, size, GEOMETRY_SIGFIGS)}) ${units}`;
  const row = (label: string, value: string, unit: string, key?: string) => `<tr${key ? ` data-weld="${key}"` : ''}><td>${escapeHtml(label)}</td><td class="num">${escapeHtml(value)}</td><td>${escapeHtml(unit)}</td></tr>`;
  const rows = [
    row('Load', loadText, ''),
    row('Length of the group L', formatQuantity(r.properties.length, 1, size), units),
    row('Centroid G of the group', pt(r.properties.centroid), ''),
    row('Polar moment J about G (per unit throat)', formatQuantity(r.properties.J, 3, size), unitText(units, 3)),
    row('Moment about G, M = M0 + (P − G) × F (+ counter-clockwise)', formatNumber(w.moment!), u.moment, 'M'),
    row('Direct part F / L', `(${formatNumber(r.direct.fx)}, ${formatNumber(r.direct.fy)})`, u.perLength),
    row('Largest force per unit length, f = |F/L + (M/J) k × r|', formatNumber(r.critical.f), u.perLength, 'f'),
    row('… at', pt(r.critical), '', 'at'),
    ...r.alsoCritical.map((p) => row('… and equally at', pt(p), '')),
    row('… its components (fx, fy)', `(${formatNumber(r.critical.fx)}, ${formatNumber(r.critical.fy)})`, u.perLength),
  ];
  const uniform = r.uniform ? '<p class="small">The force passes through the centroid of the group: every point carries F / L.</p>' : '';
  return `<div class="block weld">${title}<table class="props weld-table"><tbody>${rows.join('')}</tbody></table>${uniform}</div>`;
}

function stripBlock(doc: SectionDocument, s: StripShape, index: number): string {
  const name = shapeDisplayName(s, index);
  let cmp;
  try {
    cmp = thinWallComparison(chainFromPath(s.start, s.segments), s.thickness, shapeToRegion(s));
  } catch (e) {
    return `<p class="small">${escapeHtml(name)}: ${escapeHtml((e as Error).message)}</p>`;
  }
  const size = sectionSize(cmp.line.bounds) + s.thickness;
  const rows = (['area', 'Ix', 'Iy', 'Ixy'] as const).map((k) => {
    const p = k === 'area' ? 2 : 4;
    const pc = cmp.percent[k];
    const diff = pc === null ? formatQuantity(cmp.difference[k], p, size) : `${formatNumber(pc, 2)} %`;
    return `<tr data-thin-wall="${k}"><td>${k === 'area' ? 'Area A' : k}</td><td class="num">${escapeHtml(formatQuantity(cmp.exact[k], p, size))}</td><td class="num">${escapeHtml(formatQuantity(cmp.thinWall[k], p, size))}</td><td class="num">${escapeHtml(diff)}</td><td>${escapeHtml(unitText(doc.units, p))}</td></tr>`;
  });
  rows.push(`<tr data-thin-wall="centroid"><td>Centroid shift</td><td class="num" colspan="2"></td><td class="num">${escapeHtml(formatQuantity(cmp.difference.centroid, 1, size))}</td><td>${escapeHtml(doc.units)}</td></tr>`);
  return (
    `<div class="block strip"><h3>${escapeHtml(name)}: t = ${escapeHtml(formatNumber(s.thickness, GEOMETRY_SIGFIGS))} ${escapeHtml(doc.units)}, ${escapeHtml(s.corners ?? 'mitre')} corners</h3>` +
    `<table class="props thin-wall"><thead><tr><th></th><th>Exact (outline)</th><th>Thin wall (centreline × t)</th><th>Difference</th><th>Unit</th></tr></thead><tbody>${rows.join('')}</tbody></table></div>`
  );
}

/** The line groups, weld checks and strips of the report ('' when the document has none). */
export function renderLineReport(input: LineReportInput): string {
  const { doc, evaluation: ev } = input;
  const out: string[] = [];
  if (ev.lines.length) {
    const fig = renderLineFigure(ev.region, ev, doc.units);
    const figure = fig
      ? `<div class="figure">${fig.svg}</div><p class="caption" data-scale="${escapeHtml(fig.scale.label)}">${escapeHtml(
          `Line elements to scale ${fig.scale.label} (print at 100 %), drawn as strokes over the section (faint). G = centroid of a line group. ` +
            (ev.welds.length ? 'F = weld load (its force arrow ends where it acts); ringed: the most stressed points, with the force per unit length there.' : ''),
        )}</p>`
      : '';
    out.push(`<section class="block lines"><h2>Line groups (weld groups per unit throat, centrelines per unit thickness)</h2>${figure}${groupTable(ev, doc.units)}<p class="small">${escapeHtml(LINE_GROUP_CAUTION)}</p></section>`);
  }
  if (ev.welds.length) {
    // The heading and its note stay on the page of the first load.
    const [first, ...rest] = ev.welds.map((w) => weldBlock(w, doc.units));
    out.push(
      `<section class="welds"><div class="block"><h2>Weld check by the elastic method</h2>` +
        `<p class="small">The force F acting at P is moved to the centroid G of the weld group: the direct part F / L is the same at every point, and the moment M about G adds (M / J) k × r at a point r from G, perpendicular to r. The largest resultant is found exactly (at the ends of straight welds, or where it is stationary along an arc).</p>` +
        first +
        `</div>` +
        rest.join('') +
        `<p class="caution">${escapeHtml(WELD_GROUP_CAUTION)}</p></section>`,
    );
  }
  const strips = doc.shapes.map((s, i) => ({ s, i })).filter((x): x is { s: StripShape; i: number } => x.s.type === 'strip');
  if (strips.length) {
    const [first, ...rest] = strips.map(({ s, i }) => stripBlock(doc, s, i));
    out.push(
      `<section class="strips"><div class="block"><h2>Strips: exact against thin wall</h2>` +
        `<p class="small">Each strip on its own (before it is combined with other shapes): the exact values of its outline, the thin-wall values of its centreline times the thickness, and the difference (thin wall − exact) in per cent of the exact value, or in units where the exact value is zero.</p>` +
        first +
        `</div>` +
        rest.join('') +
        `<p class="caution">${escapeHtml(THIN_WALL_CAUTION)}</p></section>`,
    );
  }
  return out.join('\n');
}
