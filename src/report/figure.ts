/**
 * The report's figure: the section drawn to a standard scale on the printed page, with its
 * overall dimensions, the origin, the centroid, the principal axes, the cut (if any) and a scale
 * bar. The SVG is sized in millimetres and its user unit is one paper millimetre, so printing at
 * 100 % gives the stated scale. Outlines are exact (SVG arcs), never sampled.
 */
import type { Region } from '../geometry/contour';
import { regionBounds } from '../geometry/contour';
import type { Units } from '../document/types';
import { UNIT_IN_METRES } from '../document/types';
import type { SectionProperties } from '../properties/section';
import { formatNumber } from '../properties/catalog';
import { regionPathData } from '../exchange/svg-export';
import { chooseScale, type DrawingScale } from './scale';

export interface FigureOptions {
  /** Largest printed size of the whole figure (mm). */
  maxWidthMm: number;
  maxHeightMm: number;
  cut?: { axis: 'x' | 'y'; at: number } | null;
}

export interface Figure {
  svg: string;
  scale: DrawingScale;
  /** True when the origin lies inside the drawn frame (and is marked). */
  originShown: boolean;
}

// Margins around the section for dimensions and labels (paper mm).
const LEFT = 12, RIGHT = 24, TOP = 7, BOTTOM = 16;
const FONT = 2.8;

const f = (v: number) => (Math.round(v * 1000) / 1000).toString();

/** A round length (1, 2 or 5 × 10^n drawing units) whose printed length is 15–40 mm. */
function scaleBarLength(k: number): number {
  const target = 25 / k;
  const p = Math.pow(10, Math.floor(Math.log10(target)));
  let best = p;
  for (const m of [1, 2, 5, 10]) if (Math.abs(m * p * k - 25) < Math.abs(best * k - 25)) best = m * p;
  return best;
}

function arrowHead(x: number, y: number, dx: number, dy: number): string {
  // Filled arrowhead with its tip at (x, y) pointing along (dx, dy): 2.4 mm long, 0.9 mm wide.
  const L = Math.hypot(dx, dy) || 1;
  const ux = dx / L, uy = dy / L;
  const bx = x - 2.4 * ux, by = y - 2.4 * uy;
  return `<path d="M${f(x)} ${f(y)} L${f(bx - 0.45 * uy)} ${f(by + 0.45 * ux)} L${f(bx + 0.45 * uy)} ${f(by - 0.45 * ux)} Z" class="ink"/>`;
}

export function renderSectionFigure(region: Region, props: SectionProperties | null, units: Units, opts: FigureOptions): Figure {
  const b = regionBounds(region) ?? { xmin: 0, xmax: 1, ymin: 0, ymax: 1 };
  const w = b.xmax - b.xmin, h = b.ymax - b.ymin;
  const ext = Math.max(w, h) || 1;
  // Show the origin when it is near the section (within a quarter of its size).
  const near = 0 >= b.xmin - 0.25 * ext && 0 <= b.xmax + 0.25 * ext && 0 >= b.ymin - 0.25 * ext && 0 <= b.ymax + 0.25 * ext;
  const fx0 = near ? Math.min(b.xmin, 0) : b.xmin, fx1 = near ? Math.max(b.xmax, 0) : b.xmax;
  const fy0 = near ? Math.min(b.ymin, 0) : b.ymin, fy1 = near ? Math.max(b.ymax, 0) : b.ymax;
  const unitMm = UNIT_IN_METRES[units] * 1000;
  const scale = chooseScale((fx1 - fx0) * unitMm, (fy1 - fy0) * unitMm, opts.maxWidthMm - LEFT - RIGHT, opts.maxHeightMm - TOP - BOTTOM);
  const k = scale.ratio * unitMm; // paper mm per drawing unit
  const W = (fx1 - fx0) * k + LEFT + RIGHT, H = (fy1 - fy0) * k + TOP + BOTTOM;
  const X = (x: number) => LEFT + (x - fx0) * k;
  const Y = (y: number) => TOP + (fy1 - y) * k;
  const parts: string[] = [];

  // The section, exact: path data in drawing units (y already flipped) mapped by one matrix.
  const tx = LEFT - fx0 * k, ty = TOP + fy1 * k;
  parts.push(
    `<path class="section" transform="matrix(${f(k)} 0 0 ${f(k)} ${f(tx)} ${f(ty)})" d="${regionPathData(region)}" stroke-width="${0.3 / k}"/>`,
  );

  // Overall width (below) and height (right).
  const dimY = Y(b.ymin) + 8;
  parts.push(`<path class="thin" d="M${f(X(b.xmin))} ${f(Y(b.ymin) + 1)} V${f(dimY + 1.5)} M${f(X(b.xmax))} ${f(Y(b.ymin) + 1)} V${f(dimY + 1.5)} M${f(X(b.xmin))} ${f(dimY)} H${f(X(b.xmax))}"/>`);
  parts.push(arrowHead(X(b.xmin), dimY, -1, 0), arrowHead(X(b.xmax), dimY, 1, 0));
  parts.push(`<text x="${f((X(b.xmin) + X(b.xmax)) / 2)}" y="${f(dimY - 1)}" text-anchor="middle" data-dim="width">${formatNumber(w)}</text>`);
  const dimX = X(b.xmax) + 8;
  parts.push(`<path class="thin" d="M${f(X(b.xmax) + 1)} ${f(Y(b.ymin))} H${f(dimX + 1.5)} M${f(X(b.xmax) + 1)} ${f(Y(b.ymax))} H${f(dimX + 1.5)} M${f(dimX)} ${f(Y(b.ymin))} V${f(Y(b.ymax))}"/>`);
  parts.push(arrowHead(dimX, Y(b.ymax), 0, -1), arrowHead(dimX, Y(b.ymin), 0, 1));
  const hy = (Y(b.ymin) + Y(b.ymax)) / 2;
  parts.push(`<text x="${f(dimX - 1)}" y="${f(hy)}" text-anchor="middle" transform="rotate(-90 ${f(dimX - 1)} ${f(hy)})" data-dim="height">${formatNumber(h)}</text>`);

  // Cut line.
  if (opts.cut && Number.isFinite(opts.cut.at)) {
    const at = opts.cut.at;
    if (opts.cut.axis === 'y') parts.push(`<path class="cut" d="M${f(X(fx0) - 4)} ${f(Y(at))} H${f(X(fx1) + 4)}"/><text x="${f(X(fx0) - 4)}" y="${f(Y(at) - 1)}">cut</text>`);
    else parts.push(`<path class="cut" d="M${f(X(at))} ${f(Y(fy1) - 4)} V${f(Y(fy0) + 4)}"/><text x="${f(X(at) + 1)}" y="${f(Y(fy1) - 4)}">cut</text>`);
  }

  // Principal axes through the centroid, then the centroid symbol.
  if (props) {
    const cx = X(props.centroid.x), cy = Y(props.centroid.y);
    const t = (props.theta * Math.PI) / 180;
    // Each axis runs through C to the edges of the drawing frame (plus a little), labelled at its end.
    const bx0 = LEFT - 6, bx1 = W - RIGHT + 4, by0 = TOP - 3, by1 = H - BOTTOM + 4;
    const reach = (dx: number, dy: number) => {
      let t = Infinity;
      if (dx > 1e-12) t = Math.min(t, (bx1 - cx) / dx);
      if (dx < -1e-12) t = Math.min(t, (bx0 - cx) / dx);
      if (dy > 1e-12) t = Math.min(t, (by1 - cy) / dy);
      if (dy < -1e-12) t = Math.min(t, (by0 - cy) / dy);
      return Math.max(0, t);
    };
    const axes: [number, string][] = [
      [t, '1'],
      [t + Math.PI / 2, '2'],
    ];
    for (const [a, label] of axes) {
      const dx = Math.cos(a), dy = -Math.sin(a); // paper y runs down
      const tp = reach(dx, dy), tm = reach(-dx, -dy);
      parts.push(`<path class="axis" d="M${f(cx - tm * dx)} ${f(cy - tm * dy)} L${f(cx + tp * dx)} ${f(cy + tp * dy)}"/>`);
      // Label beside the positive end, offset sideways so it never sits on the line.
      const lx = cx + tp * dx + 1.6 * -dy + (dx > 0.5 ? 1 : 0), ly = cy + tp * dy + 1.6 * dx + 1;
      parts.push(`<text x="${f(lx)}" y="${f(ly)}" text-anchor="middle" class="axis-label">${label}</text>`);
    }
    const r = 1.6;
    parts.push(
      `<g class="centroid"><circle cx="${f(cx)}" cy="${f(cy)}" r="${r}" class="thin" fill="#fff"/>` +
        `<path d="M${f(cx)} ${f(cy)} H${f(cx + r)} A${r} ${r} 0 0 0 ${f(cx)} ${f(cy - r)} Z M${f(cx)} ${f(cy)} H${f(cx - r)} A${r} ${r} 0 0 0 ${f(cx)} ${f(cy + r)} Z" class="ink"/></g>`,
      `<text x="${f(cx + 2.4)}" y="${f(cy + 3.6)}">C</text>`,
    );
  }

  // Origin.
  if (near) {
    const ox = X(0), oy = Y(0);
    parts.push(`<path class="thin" d="M${f(ox)} ${f(oy)} H${f(ox + 8)} M${f(ox)} ${f(oy)} V${f(oy - 8)}"/>`);
    parts.push(arrowHead(ox + 8, oy, 1, 0), arrowHead(ox, oy - 8, 0, -1));
    parts.push(`<text x="${f(ox + 8.5)}" y="${f(oy + 1)}">x</text><text x="${f(ox - 0.9)}" y="${f(oy - 9)}">y</text><text x="${f(ox - 3.2)}" y="${f(oy + 3.2)}">O</text>`);
  }

  // Scale bar, bottom left, level with the width dimension.
  const bar = scaleBarLength(k);
  const by = H - 2, bx = 2;
  parts.push(
    `<path class="ink" d="M${f(bx)} ${f(by - 1)} h${f(bar * k)} v1 h${f(-bar * k)} Z"/>` +
      `<path class="thin" d="M${f(bx)} ${f(by - 2.2)} v2.2 M${f(bx + bar * k)} ${f(by - 2.2)} v2.2"/>` +
      `<text x="${f(bx + bar * k + 1.5)}" y="${f(by)}">${formatNumber(bar)} ${units} (scale ${scale.label})</text>`,
  );

  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(W)}mm" height="${f(H)}mm" viewBox="0 0 ${f(W)} ${f(H)}" data-scale="${scale.label}" role="img" aria-label="Section drawn to scale ${scale.label}">` +
    `<style>text{font:${FONT}px sans-serif;fill:#111}.section{fill:#c9d6e2;stroke:#111;fill-rule:nonzero}.thin{fill:none;stroke:#111;stroke-width:0.18}` +
    `.ink{fill:#111;stroke:none}.axis{fill:none;stroke:#8a1c1c;stroke-width:0.25;stroke-dasharray:4 1 0.6 1}.axis-label{fill:#8a1c1c;font-weight:bold}` +
    `.cut{fill:none;stroke:#1c4f8a;stroke-width:0.3;stroke-dasharray:2 1}</style>` +
    parts.join('') +
    `</svg>`;
  return { svg, scale, originShown: near };
}
