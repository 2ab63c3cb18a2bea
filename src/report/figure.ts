/**
 * The report's figure: the section drawn to a standard scale on the printed page, with its
 * dimensions (overall size, holes, openings, notches and plate thicknesses, placed by
 * dimensions.ts), the origin, the centroid, the principal axes, the cut (if any) and a scale bar.
 * The SVG is sized in millimetres and its user unit is one paper millimetre, so printing at 100 %
 * gives the stated scale. Outlines are exact (SVG arcs), never sampled. An empty region has no
 * figure (null): the report says so in words instead.
 */
import type { Region } from '../geometry/contour';
import { regionBounds } from '../geometry/contour';
import type { Units } from '../document/types';
import { UNIT_IN_METRES } from '../document/types';
import type { SectionProperties } from '../properties/section';
import { formatNumber } from '../properties/catalog';
import { regionPathData } from '../exchange/svg-export';
import { escapeHtml } from './escape';
import { findDimensionFeatures, layoutDimensions, type DimensionFeature, type DimensionLayout } from './dimensions';
import { STANDARD_SCALES, chooseScale, type DrawingScale } from './scale';

export interface FigureOptions {
  /** Largest printed size of the whole figure (mm). */
  maxWidthMm: number;
  maxHeightMm: number;
  cut?: { axis: 'x' | 'y'; at: number } | null;
  /** Regions of the shapes subtracted from the section, so notches can be dimensioned. */
  cuts?: readonly Region[];
  /** Dimension holes, openings, notches and plates (default true); the overall size always is. */
  dimensions?: boolean;
  /** The shear centre, marked S (from the torsion analysis, when the report has one). */
  shearCentre?: { x: number; y: number } | null;
}

export interface Figure {
  svg: string;
  scale: DrawingScale;
  /** True when the origin lies inside the drawn frame (and is marked). */
  originShown: boolean;
  /** The dimensions as placed (world units), including what was left off and why. */
  dimensions: DimensionLayout;
}

// Room around the drawn things (paper mm): axis labels right and top, the scale bar below.
const PAD_L = 4, PAD_R = 6, PAD_T = 4, PAD_B = 6;
const FONT = 2.8;
/** The origin marker's arrows (paper mm). */
const ORIGIN_ARM = 8;

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

/** The drawn frame (world units) for a layout: the layout's extent plus the origin marker when near. */
function frameFor(layout: DimensionLayout, near: boolean, k: number, mark?: { x: number; y: number } | null) {
  const e = layout.extent;
  const arm = (ORIGIN_ARM + 3) / k;
  const fr = {
    x0: near ? Math.min(e.xmin, -3.5 / k) : e.xmin,
    x1: near ? Math.max(e.xmax, arm) : e.xmax,
    y0: near ? Math.min(e.ymin, -3.5 / k) : e.ymin,
    y1: near ? Math.max(e.ymax, arm) : e.ymax,
  };
  // A shear centre outside the section (a channel's) stays inside the frame with its label.
  if (mark) {
    const b = shearCentreBox(mark, 1 / k);
    fr.x0 = Math.min(fr.x0, b.xmin);
    fr.x1 = Math.max(fr.x1, b.xmax);
    fr.y0 = Math.min(fr.y0, b.ymin);
    fr.y1 = Math.max(fr.y1, b.ymax);
  }
  return fr;
}

/**
 * The figure's other marks, for the dimension layout to keep its texts clear of: the principal
 * axes, the cut line, the centroid symbol and its label, and the origin marker (world units;
 * `mm` world units per paper millimetre).
 */
function drawnMarks(props: SectionProperties | null, cut: FigureOptions['cut'], near: boolean, ext: number, mm: number) {
  const lines: [number, number, number, number][] = [];
  const boxes: { xmin: number; xmax: number; ymin: number; ymax: number }[] = [];
  const far = 4 * ext + 200 * mm;
  if (props) {
    const { x, y } = props.centroid;
    const t = (props.theta * Math.PI) / 180;
    for (const a of [t, t + Math.PI / 2]) lines.push([x - far * Math.cos(a), y - far * Math.sin(a), x + far * Math.cos(a), y + far * Math.sin(a)]);
    boxes.push({ xmin: x - 2 * mm, xmax: x + 5 * mm, ymin: y - 5 * mm, ymax: y + 2 * mm });
  }
  if (cut && Number.isFinite(cut.at)) {
    if (cut.axis === 'y') lines.push([-far, cut.at, far, cut.at]);
    else lines.push([cut.at, -far, cut.at, far]);
  }
  if (near) {
    boxes.push({ xmin: -4.5 * mm, xmax: (ORIGIN_ARM + 2.5) * mm, ymin: -4 * mm, ymax: 1 * mm });
    boxes.push({ xmin: -2 * mm, xmax: 1 * mm, ymin: -1 * mm, ymax: (ORIGIN_ARM + 2.5) * mm });
  }
  return { lines, boxes };
}

/** The room the shear-centre mark and its label take (world units; `mm` world units per paper millimetre). */
function shearCentreBox(s: { x: number; y: number }, mm: number) {
  return { xmin: s.x - 2 * mm, xmax: s.x + 5 * mm, ymin: s.y - 2 * mm, ymax: s.y + 5 * mm };
}

/** The shear-centre mark at paper (x, y): an open diamond with a dot, labelled S (the centroid is a quartered circle). */
function shearCentreMark(x: number, y: number): string {
  const r = 1.9;
  return (
    `<g class="shear-centre"><path d="M${f(x - r)} ${f(y)} L${f(x)} ${f(y - r)} L${f(x + r)} ${f(y)} L${f(x)} ${f(y + r)} Z" class="thin" fill="#fff"/>` +
    `<circle cx="${f(x)}" cy="${f(y)}" r="0.5" class="ink"/></g><text x="${f(x + 2.3)}" y="${f(y - 1.6)}">S</text>`
  );
}

export function renderSectionFigure(region: Region, props: SectionProperties | null, units: Units, opts: FigureOptions): Figure | null {
  const b = regionBounds(region);
  if (!b) return null;
  const w = b.xmax - b.xmin, h = b.ymax - b.ymin;
  const ext = Math.max(w, h);
  if (!(ext > 0)) return null;
  // Show the origin when it is near the section (within a quarter of its size).
  const near = 0 >= b.xmin - 0.25 * ext && 0 <= b.xmax + 0.25 * ext && 0 >= b.ymin - 0.25 * ext && 0 <= b.ymax + 0.25 * ext;
  const unitMm = UNIT_IN_METRES[units] * 1000;
  const features: DimensionFeature[] = opts.dimensions === false ? [] : findDimensionFeatures(region, opts.cuts ?? []);
  // The largest standard scale at which the section with its dimensions fits: the dimensions take
  // a fixed room in paper millimetres, so each candidate scale is laid out and measured.
  const boxW = opts.maxWidthMm - PAD_L - PAD_R, boxH = opts.maxHeightMm - PAD_T - PAD_B;
  const first = chooseScale(w * unitMm, h * unitMm, boxW, boxH);
  let scale = first;
  let layout: DimensionLayout | null = null;
  for (let i = STANDARD_SCALES.indexOf(first); i < STANDARD_SCALES.length; i++) {
    scale = STANDARD_SCALES[Math.max(0, i)];
    const k = scale.ratio * unitMm;
    const avoid = drawnMarks(props, opts.cut ?? null, near, ext, 1 / k);
    if (opts.shearCentre) avoid.boxes.push(shearCentreBox(opts.shearCentre, 1 / k));
    layout = layoutDimensions(features, region, { mm: 1 / k, textMm: FONT, avoid });
    const fr = frameFor(layout, near, k, opts.shearCentre);
    if ((fr.x1 - fr.x0) * k <= boxW && (fr.y1 - fr.y0) * k <= boxH) break;
  }
  const dims = layout!;
  const k = scale.ratio * unitMm; // paper mm per drawing unit
  const fr = frameFor(dims, near, k, opts.shearCentre);
  const fx0 = fr.x0, fx1 = fr.x1, fy0 = fr.y0, fy1 = fr.y1;
  const LEFT = PAD_L, RIGHT = PAD_R, TOP = PAD_T, BOTTOM = PAD_B;
  const W = (fx1 - fx0) * k + LEFT + RIGHT, H = (fy1 - fy0) * k + TOP + BOTTOM;
  const X = (x: number) => LEFT + (x - fx0) * k;
  const Y = (y: number) => TOP + (fy1 - y) * k;
  const parts: string[] = [];

  // The section, exact: path data in drawing units (y already flipped) mapped by one matrix.
  const tx = LEFT - fx0 * k, ty = TOP + fy1 * k;
  parts.push(
    `<path class="section" transform="matrix(${f(k)} 0 0 ${f(k)} ${f(tx)} ${f(ty)})" d="${regionPathData(region)}" stroke-width="${0.3 / k}"/>`,
  );

  // Dimensions, as placed in world units.
  for (const l of dims.lines) parts.push(`<path class="${l.style === 'centre' ? 'centre' : 'thin'}" d="M${f(X(l.x1))} ${f(Y(l.y1))} L${f(X(l.x2))} ${f(Y(l.y2))}"/>`);
  for (const a of dims.arrows) parts.push(arrowHead(X(a.x), Y(a.y), a.dx, -a.dy));
  // A round cut that breaks an edge: its whole circle, thin and dashed, so the diameter reads.
  for (const h of features) if (h.kind === 'hole' && h.notch) parts.push(`<circle class="cutout" cx="${f(X(h.cx))}" cy="${f(Y(h.cy))}" r="${f((h.diameter / 2) * k)}"/>`);
  for (const o of dims.origins) parts.push(`<circle cx="${f(X(o.x))}" cy="${f(Y(o.y))}" r="${f(dims.style.origin * k)}" class="thin" fill="#fff"/>`);
  for (const t of dims.texts) {
    // (x, y) is the text's centre; the baseline sits 0.35 text heights below it (digits are
    // about 0.7 high), measured in the text's own frame, so a turned text keeps it too.
    const x = f(X(t.x)), y = f(Y(t.y));
    const turn = t.rotate ? ` transform="rotate(-${t.rotate} ${x} ${y})"` : '';
    parts.push(`<text x="${x}" y="${f(Y(t.y) + 0.35 * FONT)}" text-anchor="middle"${turn} data-dim="${t.role}">${escapeHtml(t.text)}</text>`);
  }

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

  if (opts.shearCentre) parts.push(shearCentreMark(X(opts.shearCentre.x), Y(opts.shearCentre.y)));

  // Origin.
  if (near) {
    const ox = X(0), oy = Y(0);
    parts.push(`<path class="thin" d="M${f(ox)} ${f(oy)} H${f(ox + 8)} M${f(ox)} ${f(oy)} V${f(oy - 8)}"/>`);
    parts.push(arrowHead(ox + 8, oy, 1, 0), arrowHead(ox, oy - 8, 0, -1));
    parts.push(`<text x="${f(ox + 8.5)}" y="${f(oy + 1)}">x</text><text x="${f(ox - 0.9)}" y="${f(oy - 9)}">y</text><text x="${f(ox - 3.2)}" y="${f(oy + 3.2)}">O</text>`);
  }

  // Scale bar, bottom left, below everything else.
  const bar = scaleBarLength(k);
  const by = H - 1.2, bx = 2;
  parts.push(
    `<path class="ink" d="M${f(bx)} ${f(by - 1)} h${f(bar * k)} v1 h${f(-bar * k)} Z"/>` +
      `<path class="thin" d="M${f(bx)} ${f(by - 2.2)} v2.2 M${f(bx + bar * k)} ${f(by - 2.2)} v2.2"/>` +
      `<text x="${f(bx + bar * k + 1.5)}" y="${f(by)}">${formatNumber(bar)} ${units} (scale ${scale.label})</text>`,
  );

  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(W)}mm" height="${f(H)}mm" viewBox="0 0 ${f(W)} ${f(H)}" data-scale="${scale.label}" role="img" aria-label="Section drawn to scale ${scale.label}">` +
    `<style>text{font:${FONT}px sans-serif;fill:#111}.section{fill:#c9d6e2;stroke:#111;fill-rule:nonzero}.thin{fill:none;stroke:#111;stroke-width:0.18}` +
    `.ink{fill:#111;stroke:none}.axis{fill:none;stroke:#8a1c1c;stroke-width:0.25;stroke-dasharray:4 1 0.6 1}.axis-label{fill:#8a1c1c;font-weight:bold}` +
    `.cut{fill:none;stroke:#1c4f8a;stroke-width:0.3;stroke-dasharray:2 1}.centre{fill:none;stroke:#111;stroke-width:0.13;stroke-dasharray:3 0.8 0.5 0.8}.cutout{fill:none;stroke:#555;stroke-width:0.15;stroke-dasharray:1 0.7}</style>` +
    parts.join('') +
    `</svg>`;
  return { svg, scale, originShown: near, dimensions: dims };
}
