/**
 * The cutout check's figure: the baseline and the proposal in one drawing, to a standard scale on
 * the printed page. The proposal is filled; the material it removes (baseline − proposal) is
 * hatched amber and the material it adds is green, both exact regions; the baseline's outline is
 * dashed over them; the net-section lines are drawn and labelled L1, L2, ...; each caution has a
 * numbered marker (a triangle for a warning, a circle for a note) matching the report's list.
 * Outlines are exact SVG arcs; one SVG unit is one paper millimetre.
 */
import type { Caution } from '../cautions/types';
import type { NetLine } from '../document/net-lines';
import { UNIT_IN_METRES, type Units } from '../document/types';
import { regionPathData } from '../exchange/svg-export';
import { regionBounds, type Region } from '../geometry/contour';
import { formatNumber } from '../properties/catalog';
import { escapeHtml } from './escape';
import { chooseScale, type DrawingScale } from './scale';

export interface ComparisonFigureInput {
  baseline: Region;
  proposal: Region;
  removed: Region;
  added: Region;
  units: Units;
  netLines: readonly NetLine[];
  /** Cautions in the report's numbering; `faint` ones are the baseline's own. */
  markers: readonly { caution: Caution; number: number; faint: boolean }[];
  maxWidthMm: number;
  maxHeightMm: number;
}

export interface ComparisonFigure {
  svg: string;
  scale: DrawingScale;
}

const PAD = 6;
const FONT = 2.6;
const f = (v: number) => (Math.round(v * 1000) / 1000).toString();
/** Six significant figures, for scale factors and widths in drawing units (any size). */
const g = (v: number) => String(+v.toPrecision(6));

function scaleBarLength(k: number): number {
  const target = 25 / k;
  const p = Math.pow(10, Math.floor(Math.log10(target)));
  let best = p;
  for (const m of [1, 2, 5, 10]) if (Math.abs(m * p * k - 25) < Math.abs(best * k - 25)) best = m * p;
  return best;
}

/** The figure, or null when neither section has an outline. */
export function renderComparisonFigure(input: ComparisonFigureInput): ComparisonFigure | null {
  const boxes = [regionBounds(input.baseline), regionBounds(input.proposal)].filter((b): b is NonNullable<typeof b> => b !== null);
  if (!boxes.length) return null;
  const b = {
    xmin: Math.min(...boxes.map((x) => x.xmin)),
    xmax: Math.max(...boxes.map((x) => x.xmax)),
    ymin: Math.min(...boxes.map((x) => x.ymin)),
    ymax: Math.max(...boxes.map((x) => x.ymax)),
  };
  // The net-section lines are part of the drawing: widen the frame to hold them.
  for (const l of input.netLines) {
    for (const p of [l.from, l.to]) {
      b.xmin = Math.min(b.xmin, p[0]);
      b.xmax = Math.max(b.xmax, p[0]);
      b.ymin = Math.min(b.ymin, p[1]);
      b.ymax = Math.max(b.ymax, p[1]);
    }
  }
  const w = b.xmax - b.xmin, h = b.ymax - b.ymin;
  if (!(Math.max(w, h) > 0)) return null;
  const unitMm = UNIT_IN_METRES[input.units] * 1000;
  const scale = chooseScale(w * unitMm, h * unitMm, input.maxWidthMm - 2 * PAD, input.maxHeightMm - 2 * PAD - 4);
  const k = scale.ratio * unitMm;
  const W = w * k + 2 * PAD, H = h * k + 2 * PAD + 4;
  const X = (x: number) => PAD + (x - b.xmin) * k;
  const Y = (y: number) => PAD + (b.ymax - y) * k;
  const m = `matrix(${g(k)} 0 0 ${g(k)} ${f(PAD - b.xmin * k)} ${f(PAD + b.ymax * k)})`;
  // Stroke widths and dashes are given in drawing units, so they print at the stated paper size.
  const path = (r: Region, cls: string, widthMm = 0.3, dashMm = '') =>
    r.length ? `<path class="${cls}" transform="${m}" d="${regionPathData(r)}" stroke-width="${g(widthMm / k)}"${dashMm ? ` stroke-dasharray="${dashMm.split(' ').map((d) => g(Number(d) / k)).join(' ')}"` : ''}/>` : '';
  const parts: string[] = [
    `<defs><pattern id="kern-removed-hatch" patternUnits="userSpaceOnUse" width="1.2" height="1.2" patternTransform="scale(${+(1 / k).toPrecision(9)}) rotate(-45)">` +
      `<rect width="1.2" height="1.2" fill="#f3c89a"/><path d="M0 0.6 H1.2" stroke="#b35f00" stroke-width="0.3"/></pattern></defs>`,
    path(input.proposal, 'proposal'),
    path(input.removed, 'removed', 0.18),
    path(input.added, 'added', 0.18),
    path(input.baseline, 'baseline', 0.25, '1.6 0.9'),
  ];
  input.netLines.forEach((l, i) => {
    const x1 = X(l.from[0]), y1 = Y(l.from[1]), x2 = X(l.to[0]), y2 = Y(l.to[1]);
    parts.push(`<path class="net" d="M${f(x1)} ${f(y1)} L${f(x2)} ${f(y2)}"/><text class="net-label" x="${f(x1)}" y="${f(y1 - 1)}">L${i + 1}</text>`);
  });
  for (const { caution, number, faint } of input.markers) {
    const x = X(caution.at.x), y = Y(caution.at.y), r = faint ? 1.5 : 1.9;
    const shape = caution.severity === 'warning'
      ? `<path d="M${f(x)} ${f(y - r * 1.1)} L${f(x + r)} ${f(y + r * 0.75)} L${f(x - r)} ${f(y + r * 0.75)} Z"/>`
      : `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r * 0.85)}"/>`;
    parts.push(
      `<g class="marker ${caution.severity}${faint ? ' faint' : ''}" data-caution="${number}">${shape}` +
        `<text x="${f(x)}" y="${f(y + (caution.severity === 'warning' ? 0.75 : 0.6))}" text-anchor="middle">${number}</text></g>`,
    );
  }
  const bar = scaleBarLength(k);
  const by = H - 1.5;
  const barText = `${formatNumber(bar)} ${input.units} (scale ${scale.label})`;
  parts.push(
    `<path class="ink" d="M2 ${f(by - 1)} h${f(bar * k)} v1 h${f(-bar * k)} Z"/>` +
      `<text x="${f(2 + bar * k + 1.5)}" y="${f(by)}">${escapeHtml(barText)}</text>`,
  );
  // The scale bar's text may reach past a narrow section: widen the drawing to hold it (about 0.55 of the font size per character).
  const Wt = Math.max(W, 2 + bar * k + 1.5 + barText.length * FONT * 0.55 + 1);
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(Wt)}mm" height="${f(H)}mm" viewBox="0 0 ${f(Wt)} ${f(H)}" data-scale="${scale.label}" role="img" aria-label="Baseline and proposal to scale ${scale.label}">` +
    `<style>text{font:${FONT}px sans-serif;fill:#111}.proposal{fill:#c9d6e2;stroke:#111;fill-rule:nonzero}` +
    `.removed{fill:url(#kern-removed-hatch);stroke:#b35f00;fill-rule:nonzero}.added{fill:#9fd8bf;stroke:#1f7a58;fill-rule:nonzero}` +
    `.baseline{fill:none;stroke:#4c5c56;fill-rule:nonzero}` +
    `.net{stroke:#3f3d9e;stroke-width:0.35;stroke-dasharray:2 0.8}.net-label{fill:#3f3d9e;font-weight:bold}.ink{fill:#111}` +
    `.marker path,.marker circle{stroke:#fff;stroke-width:0.25}.marker.warning path{fill:#a3231a}.marker.note circle{fill:#3d5a6c}` +
    `.marker text{fill:#fff;font-size:1.9px;font-weight:bold}.marker.faint{opacity:0.5}</style>` +
    parts.join('') +
    `</svg>`;
  return { svg, scale };
}
