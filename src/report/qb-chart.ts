/**
 * The Q/b diagram for a cut: Q (first moment, about the centroidal axis, of the part beyond the
 * cut) divided by the cut width b, across the section. With the shear formula τ = VQ/(Ib)
 * (Gere & Goodno, Mechanics of Materials, "shear stresses in beams") this is the shape of the
 * shear-stress distribution. Where b = 0 (a gap between parts) Q/b is undefined and not drawn.
 */
import type { Region } from '../geometry/contour';
import type { Units } from '../document/types';
import { cutDiagram, cutSection, type SectionProperties } from '../properties/section';
import { formatNumber, unitText } from '../properties/catalog';
import { escapeHtml } from './escape';

const f = (v: number) => (Math.round(v * 1000) / 1000).toString();

/** 1, 2 or 5 × 10^n: a tick step giving about `count` intervals over `range`. */
function niceStep(range: number, count: number): number {
  const raw = range / count;
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = Math.pow(10, Math.floor(Math.log10(raw)));
  for (const m of [1, 2, 5, 10]) if (m * p >= raw) return m * p;
  return 10 * p;
}

export function renderQbDiagram(region: Region, props: SectionProperties, units: Units, cut: { axis: 'x' | 'y'; at: number }): string {
  const samples = cutDiagram(region, cut.axis, props, 121);
  const here = cutSection(region, cut.axis, cut.at, props);
  const qb = (s: { width: number; Q: number }) => (s.width > 0 ? s.Q / s.width : NaN);
  const values = samples.map(qb).filter(Number.isFinite);
  const hereQb = qb(here);
  if (Number.isFinite(hereQb)) values.push(hereQb);
  const vmax = Math.max(0, ...values), vmin = Math.min(0, ...values);
  const lo = samples[0].at, hi = samples[samples.length - 1].at;

  // Chart frame in paper mm.
  const W = 170, H = 50, L = 20, R = 6, T = 4, B = 10;
  const pw = W - L - R, ph = H - T - B;
  const span = vmax - vmin || 1;
  const X = (at: number) => L + ((at - lo) / (hi - lo || 1)) * pw;
  const Y = (v: number) => T + ((vmax - v) / span) * ph;
  const parts: string[] = [];
  // Grid and ticks.
  const sx = niceStep(hi - lo, 6), sy = niceStep(span, 4);
  for (let v = Math.ceil(lo / sx) * sx; v <= hi + 1e-9 * sx; v += sx) {
    parts.push(`<path class="grid" d="M${f(X(v))} ${T} V${T + ph}"/><text x="${f(X(v))}" y="${f(T + ph + 4)}" text-anchor="middle">${formatNumber(v, 4)}</text>`);
  }
  for (let v = Math.ceil(vmin / sy) * sy; v <= vmax + 1e-9 * sy; v += sy) {
    parts.push(`<path class="grid" d="M${L} ${f(Y(v))} H${L + pw}"/><text x="${L - 1.2}" y="${f(Y(v) + 1)}" text-anchor="end">${formatNumber(v, 4)}</text>`);
  }
  // The curve, broken where b = 0.
  let d = '';
  let pen = false;
  for (const s of samples) {
    const v = qb(s);
    if (!Number.isFinite(v)) {
      pen = false;
      continue;
    }
    d += `${pen ? 'L' : 'M'}${f(X(s.at))} ${f(Y(v))} `;
    pen = true;
  }
  parts.push(`<path class="curve" d="${d.trim()}"/>`);
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
    `.curve{fill:none;stroke:#1c4f8a;stroke-width:0.35}.cut{stroke:#8a1c1c;stroke-width:0.25;stroke-dasharray:1.5 0.8}.dot{fill:#8a1c1c}</style>` +
    parts.join('') +
    `</svg>`;

  const side = cut.axis === 'y' ? `above y = ${formatNumber(cut.at)} ${units}` : `right of x = ${formatNumber(cut.at)} ${units}`;
  const rows: [string, string, string][] = [
    ['Cut width b', formatNumber(here.width), unitText(units, 1)],
    ['Area beyond the cut', formatNumber(here.area), unitText(units, 2)],
    ['First moment Q of that area about the centroidal axis', formatNumber(here.Q), unitText(units, 3)],
    ['Q/b', Number.isFinite(hereQb) ? formatNumber(hereQb) : '— (b = 0)', unitText(units, 2)],
  ];
  return (
    `<section class="block qb"><h2>Q/b diagram</h2>` +
    `<p class="small">Part of the section ${escapeHtml(side)}. Q/b across the section (${samples.length} cut positions); the dashed line marks the cut.</p>` +
    `<div class="figure">${svg}</div>` +
    `<table class="values"><tbody>${rows.map(([a, v, u]) => `<tr><td>${escapeHtml(a)}</td><td class="num">${escapeHtml(v)}</td><td>${escapeHtml(u)}</td></tr>`).join('')}</tbody></table>` +
    `</section>`
  );
}
