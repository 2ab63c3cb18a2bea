/**
 * The Q/b diagram for a cut: Q (first moment, about the centroidal axis, of the part beyond the
 * cut) divided by the cut width b, across the section. With the shear formula τ = VQ/(Ib)
 * (Gere & Goodno, Mechanics of Materials, "shear stresses in beams") this is the shape of the
 * shear-stress distribution.
 *
 * - Sampling: evenly spaced cuts plus every level where the boundary has a vertex or an arc's
 *   extreme, so the steps at a flange–web junction are drawn where they are. Where a straight edge
 *   lies on the level the width jumps; both one-sided values are plotted at that level (a
 *   vertical step), since Q is the same from either side (src/moments/width.ts).
 * - Gaps: where b = 0 (between parts) Q/b is undefined and the curve is broken.
 * - Off scale: next to the edge of a hole or notch that nearly closes the section, b tends to 0
 *   while Q does not, so Q/b grows without bound over a tiny depth. The scale is capped at
 *   CAP_FACTOR × the 90th percentile of the sampled values; values above the cap are drawn on the
 *   cap line and marked with a triangle, and the largest is written out. The cap and the rule are
 *   stated under the diagram.
 * - Caution: when the principal axes are turned from x and y (caution.ts), Q/b does not give
 *   the shear stress; the caution is printed with the diagram.
 */
import type { Region } from '../geometry/contour';
import type { Units } from '../document/types';
import { cutSection, type SectionProperties } from '../properties/section';
import { oneSidedWidths } from '../moments/width';
import { cutWithSides } from '../properties/cut-sides';
import { formatNumber, formatQuantity, sectionSize, unitText } from '../properties/catalog';
import { shearFormulaCaution } from './caution';
import { escapeHtml } from './escape';

const f = (v: number) => (Math.round(v * 1000) / 1000).toString();

/** The scale is capped at this many times the 90th percentile of |Q/b| (common practice, no source). */
export const CAP_FACTOR = 2;
/** Evenly spaced cut positions of the diagram (plus the boundary's levels). */
export const QB_SAMPLES = 121;

/** 1, 2 or 5 × 10^n: a tick step giving about `count` intervals over `range`. */
function niceStep(range: number, count: number): number {
  const raw = range / count;
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = Math.pow(10, Math.floor(Math.log10(raw)));
  for (const m of [1, 2, 5, 10]) if (m * p >= raw) return m * p;
  return 10 * p;
}

export interface QbPoint {
  at: number;
  /** Q/b, NaN where b = 0. */
  value: number;
}

/**
 * Levels where the boundary turns: every vertex, and every highest or lowest point of an arc,
 * along the cut direction (y for axis 'y', x for axis 'x').
 */
function boundaryLevels(region: Region, axis: 'x' | 'y'): number[] {
  const out: number[] = [];
  const k = axis === 'y' ? 1 : 0;
  for (const c of region) {
    const n = c.xy.length >> 1;
    for (let i = 0; i < n; i++) {
      out.push(c.xy[2 * i + k]);
      const bulge = c.bulge ? c.bulge[i] : 0;
      if (bulge === 0) continue;
      const j = (i + 1) % n;
      // The arc's centre and its extremes along the axis, where inside the sweep.
      const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
      const phi = 4 * Math.atan(bulge);
      const L = Math.hypot(bx - ax, by - ay);
      const r = L / (2 * Math.sin(Math.abs(phi) / 2));
      const s = phi > 0 ? 1 : -1;
      const d = r * Math.cos(Math.abs(phi) / 2);
      const cx = (ax + bx) / 2 - ((s * (by - ay)) / L) * d, cy = (ay + by) / 2 - ((-s * (bx - ax)) / L) * d;
      const t0 = Math.atan2(ay - cy, ax - cx);
      for (const t of axis === 'y' ? [Math.PI / 2, -Math.PI / 2] : [0, Math.PI]) {
        let dt = phi > 0 ? t - t0 : t0 - t;
        dt = ((dt % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
        if (dt > 0 && dt < Math.abs(phi)) out.push(axis === 'y' ? cy + r * Math.sin(t) : cx + r * Math.cos(t));
      }
    }
  }
  return out;
}

/** The points of the diagram, in order along the cut direction; a jump gives two points at one level. */
export function qbCurve(region: Region, axis: 'x' | 'y', props: SectionProperties, samples = QB_SAMPLES): QbPoint[] {
  const lo = axis === 'y' ? props.bounds.ymin : props.bounds.xmin;
  const hi = axis === 'y' ? props.bounds.ymax : props.bounds.xmax;
  const levels = new Set<number>();
  const n = Math.max(2, Math.floor(samples));
  for (let k = 0; k < n; k++) levels.add(lo + ((hi - lo) * k) / (n - 1));
  for (const v of boundaryLevels(region, axis)) if (v >= lo && v <= hi) levels.add(v);
  const out: QbPoint[] = [];
  for (const at of [...levels].sort((p, q) => p - q)) {
    const Q = cutSection(region, axis, at, props).Q;
    const w = oneSidedWidths(region, axis, at);
    const val = (b: number) => (b > 0 ? Q / b : NaN);
    if (w.onEdge && w.above !== w.below) out.push({ at, value: val(w.below) }, { at, value: val(w.above) });
    else out.push({ at, value: val(w.above) });
  }
  return out;
}

/** The q-th quantile (0..1) of the values, by sorting (values are few). */
function quantile(vals: number[], q: number): number {
  if (vals.length === 0) return 0;
  const s = [...vals].sort((a, b) => a - b);
  const i = Math.min(s.length - 1, Math.max(0, Math.round(q * (s.length - 1))));
  return s[i];
}

/** The plotted range: the values' range, capped at CAP_FACTOR × the 90th percentile of |Q/b|. */
export function qbScale(values: readonly number[]): { vmin: number; vmax: number; cap: number | null } {
  const fin = values.filter(Number.isFinite);
  const lo = Math.min(0, ...fin), hi = Math.max(0, ...fin);
  const ref = quantile(fin.map(Math.abs), 0.9);
  const limit = CAP_FACTOR * ref;
  const clipHi = ref > 0 && hi > limit;
  const clipLo = ref > 0 && -lo > limit;
  return { vmin: clipLo ? -limit : lo, vmax: clipHi ? limit : hi, cap: clipHi || clipLo ? limit : null };
}

export function renderQbDiagram(region: Region, props: SectionProperties, units: Units, cut: { axis: 'x' | 'y'; at: number }): string {
  const size = sectionSize(props.bounds);
  const curve = qbCurve(region, cut.axis, props);
  const here = cutWithSides(region, cut.axis, cut.at, props);
  const hereQb = here.qOverB;
  const values = curve.map((p) => p.value);
  if (Number.isFinite(hereQb)) values.push(hereQb);
  const { vmin, vmax, cap } = qbScale(values);
  const lo = axis0(props, cut.axis), hi = axis1(props, cut.axis);

  // Chart frame in paper mm.
  const W = 170, H = 40, L = 20, R = 6, T = 4, B = 9;
  const pw = W - L - R, ph = H - T - B;
  const span = vmax - vmin || 1;
  const X = (at: number) => L + ((at - lo) / (hi - lo || 1)) * pw;
  const clip = (v: number) => Math.min(vmax, Math.max(vmin, v));
  const Y = (v: number) => T + ((vmax - clip(v)) / span) * ph;
  const parts: string[] = [];
  const tick = (v: number, sig = 4) => formatNumber(v, sig, Math.max(Math.abs(vmax), Math.abs(vmin)));
  const sx = niceStep(hi - lo, 6), sy = niceStep(span, 4);
  for (let v = Math.ceil(lo / sx) * sx; v <= hi + 1e-9 * sx; v += sx) {
    parts.push(`<path class="grid" d="M${f(X(v))} ${T} V${T + ph}"/><text x="${f(X(v))}" y="${f(T + ph + 4)}" text-anchor="middle">${tick(v)}</text>`);
  }
  for (let v = Math.ceil(vmin / sy) * sy; v <= vmax + 1e-9 * sy; v += sy) {
    parts.push(`<path class="grid" d="M${L} ${f(Y(v))} H${L + pw}"/><text x="${L - 1.2}" y="${f(Y(v) + 1)}" text-anchor="end">${tick(v)}</text>`);
  }
  // The curve, broken where b = 0; values beyond the cap are drawn on it.
  let d = '';
  let pen = false;
  for (const p of curve) {
    if (!Number.isFinite(p.value)) {
      pen = false;
      continue;
    }
    d += `${pen ? 'L' : 'M'}${f(X(p.at))} ${f(Y(p.value))} `;
    pen = true;
  }
  parts.push(`<path class="curve" d="${d.trim()}"/>`);
  // Off-scale runs: one triangle each, at its largest value, pointing off the chart.
  let worst: QbPoint | null = null;
  if (cap !== null) {
    let run: QbPoint[] = [];
    const flush = () => {
      if (run.length === 0) return;
      const peak = run.reduce((a, b) => (Math.abs(b.value) > Math.abs(a.value) ? b : a));
      if (!worst || Math.abs(peak.value) > Math.abs(worst.value)) worst = peak;
      const x = X(peak.at), up = peak.value > 0, y = up ? T : T + ph;
      parts.push(`<path class="off" data-off-scale="${peak.at}" d="M${f(x)} ${f(y + (up ? -2.2 : 2.2))} L${f(x - 1.1)} ${f(y)} L${f(x + 1.1)} ${f(y)} Z"/>`);
      run = [];
    };
    for (const p of curve) {
      if (Number.isFinite(p.value) && Math.abs(p.value) > cap) run.push(p);
      else flush();
    }
    flush();
    parts.push(`<path class="capline" d="M${L} ${f(Y(vmax))} H${L + pw}"/>`);
  }
  parts.push(`<path class="frame" d="M${L} ${T} V${T + ph} H${L + pw}"/>`);
  if (cut.at >= lo && cut.at <= hi) {
    parts.push(`<path class="cut" d="M${f(X(cut.at))} ${T} V${T + ph}"/>`);
    if (Number.isFinite(hereQb)) parts.push(`<circle cx="${f(X(cut.at))}" cy="${f(Y(hereQb))}" r="0.9" class="dot"/>`);
  }
  const pos = cut.axis === 'y' ? 'y' : 'x';
  parts.push(`<text x="${L + pw / 2}" y="${H - 1}" text-anchor="middle">cut position ${pos} (${units})</text>`);
  parts.push(`<text x="3" y="${T + ph / 2}" text-anchor="middle" transform="rotate(-90 3 ${T + ph / 2})">Q/b (${unitText(units, 2)})</text>`);

  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${W}mm" height="${H}mm" viewBox="0 0 ${W} ${H}" role="img" aria-label="Q/b diagram">` +
    `<style>text{font:2.6px sans-serif;fill:#111}.grid{stroke:#ccc;stroke-width:0.12}.frame{fill:none;stroke:#111;stroke-width:0.2}` +
    `.curve{fill:none;stroke:#1c4f8a;stroke-width:0.35}.cut{stroke:#8a1c1c;stroke-width:0.25;stroke-dasharray:1.5 0.8}.dot{fill:#8a1c1c}` +
    `.off{fill:#8a1c1c}.capline{stroke:#8a1c1c;stroke-width:0.15;stroke-dasharray:0.6 0.6}</style>` +
    parts.join('') +
    `</svg>`;

  const len = (v: number) => formatQuantity(v, 1, size);
  const beyond = cut.axis === 'y' ? 'above' : 'right of';
  const side = `${beyond} ${pos} = ${len(cut.at)} ${units}`;
  const [plus, minus] = cut.axis === 'y' ? ['just above', 'just below'] : ['just right of', 'just left of'];
  const usedSide = here.qbSide === 'above' ? plus : minus;
  const rows: [string, string, string][] = [];
  if (here.onEdge && here.widthAbove !== here.widthBelow) {
    rows.push([`Cut width b ${plus} the cut`, len(here.widthAbove), unitText(units, 1)]);
    rows.push([`Cut width b ${minus} the cut`, len(here.widthBelow), unitText(units, 1)]);
  } else rows.push(['Cut width b', len(here.widthAbove), unitText(units, 1)]);
  rows.push(['Area beyond the cut', formatQuantity(here.area, 2, size), unitText(units, 2)]);
  rows.push(['First moment Q of that area about the centroidal axis', formatQuantity(here.Q, 3, size), unitText(units, 3)]);
  const qbText = Number.isFinite(hereQb) ? formatQuantity(hereQb, 2, size) : '— (b = 0)';
  rows.push([here.onEdge && here.widthAbove !== here.widthBelow ? `Q/b, with b ${usedSide} the cut (the smaller width)` : 'Q/b', qbText, unitText(units, 2)]);

  const notes: string[] = [`Part of the section ${escapeHtml(side)}. Q/b across the section at ${curve.length} cut positions (the boundary's corner levels among them); dashed: the cut.`];
  if (here.onEdge && here.widthAbove !== here.widthBelow) {
    notes.push(
      `An edge lies on this cut line, so the width jumps here: b ${plus} and ${minus} the cut are both given; Q is the same from either side, ` +
        `and Q/b uses the smaller non-zero width (${usedSide} the cut), the side where the shear stress is larger.`,
    );
  }
  if (cap !== null) {
    const w = worst as QbPoint | null;
    notes.push(
      `Off scale: near the edge of a hole or notch the width b tends to 0 while Q does not, so Q/b grows without bound there. The scale is capped at ${CAP_FACTOR} × the 90th percentile of the plotted values (${escapeHtml(formatQuantity(cap, 2, size))} ${escapeHtml(unitText(units, 2))}); ` +
        `larger values are drawn on the cap line and marked ▲${w ? `, the largest plotted being ${escapeHtml(formatQuantity(w.value, 2, size))} ${escapeHtml(unitText(units, 2))} at ${pos} = ${escapeHtml(len(w.at))}` : ''}.`,
    );
  }
  const caution = shearFormulaCaution(props);
  return (
    `<section class="block qb"><h2>Q/b diagram</h2>` +
    `<p class="small">${notes[0]}</p>` +
    (caution ? `<p class="qb-caution" data-caution="principal-axes">${escapeHtml(caution)}</p>` : '') +
    `<div class="figure">${svg}</div>` +
    valuesTable(rows) +
    notes.slice(1).map((n) => `<p class="small qb-note">${n}</p>`).join('') +
    `</section>`
  );
}

/** The cut's values in two columns of label, value and unit, to keep the block short. */
function valuesTable(rows: [string, string, string][]): string {
  const cell = (r: [string, string, string] | undefined) =>
    r ? `<td>${escapeHtml(r[0])}</td><td class="num">${escapeHtml(r[1])}</td><td>${escapeHtml(r[2])}</td>` : '<td></td><td></td><td></td>';
  const half = Math.ceil(rows.length / 2);
  const body: string[] = [];
  for (let i = 0; i < half; i++) body.push(`<tr>${cell(rows[i])}${cell(rows[half + i])}</tr>`);
  return `<table class="values"><tbody>${body.join('')}</tbody></table>`;
}

function axis0(p: SectionProperties, axis: 'x' | 'y'): number {
  return axis === 'y' ? p.bounds.ymin : p.bounds.xmin;
}
function axis1(p: SectionProperties, axis: 'x' | 'y'): number {
  return axis === 'y' ? p.bounds.ymax : p.bounds.xmax;
}

