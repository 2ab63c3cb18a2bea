/**
 * Dimensions for a drawing of the section, placed: `layoutDimensions(features, region, { mm })`
 * takes what dimension-features.ts found and lays it out for a drawing in which `mm` world units
 * make one millimetre of paper (or of screen, for the canvas). Pure data in world coordinates (y
 * up): lines, arrowheads, texts and origin circles.
 * - The overall width below and height to the right, values on their lines, shifted along them
 *   when a mark is in the way.
 * - Positions of holes, openings and notches as running dimensions from the section's left and
 *   bottom extremes (ISO 129-1 superimposed running dimensions: one line from an origin circle, a
 *   value at each arrowhead), x below the width and y on the left.
 * - Diameters inside the hole on a diameter line, or on a leader; openings' sizes inside them;
 *   plate thicknesses across the plate with the value outside.
 * Every text is checked against the section, the texts and lines already placed and any marks
 * passed in `avoid` (the figure's axes and cut line). A dimension that finds no free place, or an
 * arrowhead that would run into another, is left off and listed in `omitted` with the reason; at
 * most `maxThickness` thicknesses are drawn (distinct values first). A busy section thins out
 * instead of cluttering, and nothing is dropped silently.
 *
 * The report's figure draws the result as SVG (figure.ts); the editor can draw the same
 * primitives on its canvas.
 */
import type { Bounds, Region } from '../geometry/contour';
import { contourPolyline, regionBounds } from '../geometry/contour';
import { formatQuantity, GEOMETRY_SIGFIGS } from '../properties/catalog';
import { inside, type DimensionFeature, type Hole, type Plate } from './dimension-features';

export { findDimensionFeatures, loopCircle, MAX_EDGES_FOR_PLATES, type DimensionFeature } from './dimension-features';

export interface DimLine {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** 'dim' dimension line, 'ext' extension line or leader, 'centre' centre mark. */
  style: 'dim' | 'ext' | 'centre';
}

/** A filled arrowhead with its tip at (x, y), pointing along the unit vector (dx, dy). */
export interface DimArrow {
  x: number;
  y: number;
  dx: number;
  dy: number;
}

/** A dimension value, centred at (x, y), turned `rotate` degrees counter-clockwise. */
export interface DimText {
  x: number;
  y: number;
  text: string;
  rotate: 0 | 90;
  /** 'width', 'height', 'x-position', 'y-position', 'diameter', 'thickness' or 'opening'. */
  role: string;
  /** The value written, at full precision. */
  value: number;
  /** The box the text is taken to fill (world units), as used for the overlap tests. */
  box: Bounds;
}

export interface OmittedDimension {
  feature: DimensionFeature | { kind: 'position'; axis: 'x' | 'y'; at: number };
  reason: string;
}

export interface DimensionLayout {
  lines: DimLine[];
  arrows: DimArrow[];
  texts: DimText[];
  /** The origin (0) of each running dimension, drawn as a small open circle. */
  origins: { x: number; y: number }[];
  /** Extent of everything drawn, the section included (world units). */
  extent: Bounds;
  omitted: OmittedDimension[];
  /** Sizes in world units: text height, arrowhead length and width, origin circle radius. */
  style: { text: number; arrow: number; arrowWidth: number; origin: number };
}

export interface LayoutOptions {
  /** World units per millimetre of paper (or screen): every spacing is set in millimetres. */
  mm: number;
  /** Text height in millimetres (2.8 on the report). */
  textMm?: number;
  /** Most plate thicknesses drawn, distinct values first (default 6). */
  maxThickness?: number;
  /** Draw the overall width and height (default true). */
  overall?: boolean;
  /** Other things drawn that texts must keep clear of (world units): lines [x1, y1, x2, y2] and boxes. */
  avoid?: { lines?: readonly (readonly [number, number, number, number])[]; boxes?: readonly Bounds[] };
}

// Spacings in millimetres.
/** Distance of the overall width and height lines from the section. */
export const FIRST_LANE_MM = 8;
const LANE_STEP = 7; // the running x dimension, below the overall width
const EXT_GAP = 1; // gap between the object and an extension line
const EXT_OVER = 1.5; // extension line beyond the dimension line
const ARROW = 2.4;
const ARROW_W = 0.9;
const CHAR_W = 0.56; // mean width of a digit, in text heights (sans-serif)

function segmentHitsBox(x0: number, y0: number, x1: number, y1: number, b: Bounds): boolean {
  // Liang–Barsky clipping against the open box.
  let t0 = 0, t1 = 1;
  const dx = x1 - x0, dy = y1 - y0;
  const p = [-dx, dx, -dy, dy];
  const q = [x0 - b.xmin, b.xmax - x0, y0 - b.ymin, b.ymax - y0];
  for (let i = 0; i < 4; i++) {
    if (p[i] === 0) {
      if (q[i] <= 0) return false;
    } else {
      const r = q[i] / p[i];
      if (p[i] < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
      if (t0 >= t1) return false;
    }
  }
  return true;
}

/**
 * The lowest (dir −1) or highest y of the outline on the vertical line x = at (axis 'x'), or the
 * leftmost / rightmost x on the horizontal line y = at (axis 'y'), from the drawing polylines;
 * `fallback` when the line misses the outline. For drawing only.
 */
function extremeAlong(polys: readonly number[][], axis: 'x' | 'y', at: number, dir: 1 | -1, fallback: number, tol: number): number {
  let best = NaN;
  const take = (v: number) => {
    if (Number.isNaN(best) || (dir < 0 ? v < best : v > best)) best = v;
  };
  const [u, v] = axis === 'x' ? [0, 1] : [1, 0];
  for (const p of polys) {
    const n = p.length >> 1;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const a = p[2 * i + u], b = p[2 * j + u];
      if (Math.abs(a - at) <= tol) take(p[2 * i + v]);
      if ((a - at) * (b - at) < 0) take(p[2 * i + v] + ((at - a) / (b - a)) * (p[2 * j + v] - p[2 * i + v]));
    }
  }
  return Number.isNaN(best) ? fallback : best;
}

const boxesMeet = (a: Bounds, b: Bounds, pad = 0) => a.xmin - pad < b.xmax && a.xmax + pad > b.xmin && a.ymin - pad < b.ymax && a.ymax + pad > b.ymin;

/** What a new text must keep clear of: the section, the texts and the lines placed so far. */
class Obstacles {
  readonly boxes: Bounds[] = [];
  readonly segs: [number, number, number, number][] = [];
  constructor(
    readonly polys: readonly number[][],
    private readonly b: Bounds,
  ) {}

  free(box: Bounds, avoidSection: boolean): boolean {
    if (this.boxes.some((o) => boxesMeet(box, o))) return false;
    if (this.segs.some((s) => segmentHitsBox(s[0], s[1], s[2], s[3], box))) return false;
    if (!avoidSection || !boxesMeet(box, this.b)) return true;
    const cx = (box.xmin + box.xmax) / 2, cy = (box.ymin + box.ymax) / 2;
    for (const [x, y] of [[cx, cy], [box.xmin, box.ymin], [box.xmax, box.ymin], [box.xmin, box.ymax], [box.xmax, box.ymax]]) if (inside(this.polys, x, y)) return false;
    for (const p of this.polys) {
      const n = p.length >> 1;
      for (let i = 0; i < n; i++) {
        const j = (i + 1) % n;
        if (segmentHitsBox(p[2 * i], p[2 * i + 1], p[2 * j], p[2 * j + 1], box)) return false;
      }
    }
    return true;
  }

  /** True when the segment passes through no text placed so far. */
  clearOfTexts(x0: number, y0: number, x1: number, y1: number): boolean {
    return !this.boxes.some((o) => segmentHitsBox(x0, y0, x1, y1, o));
  }
}

/**
 * Place the dimensions of `features` around `region`. Pure: the same input gives the same
 * drawing. See the header for the rules.
 */
export function layoutDimensions(features: readonly DimensionFeature[], region: Region, opts: LayoutOptions): DimensionLayout {
  const b = regionBounds(region);
  const mm = opts.mm;
  const th = (opts.textMm ?? 2.8) * mm;
  const out: DimensionLayout = {
    lines: [],
    arrows: [],
    texts: [],
    origins: [],
    extent: b ?? { xmin: 0, xmax: 0, ymin: 0, ymax: 0 },
    omitted: [],
    style: { text: th, arrow: ARROW * mm, arrowWidth: ARROW_W * mm, origin: 0.9 * mm },
  };
  if (!b || !(mm > 0) || !Number.isFinite(mm)) return out;
  const size = Math.max(b.xmax - b.xmin, b.ymax - b.ymin);
  const fmt = (v: number) => formatQuantity(v, 1, size, GEOMETRY_SIGFIGS);
  const obs = new Obstacles(
    region.map((c) => contourPolyline(c, Math.min(1e-3 * size, 0.05 * mm))),
    b,
  );
  for (const l of opts.avoid?.lines ?? []) obs.segs.push([l[0], l[1], l[2], l[3]]);
  for (const bx of opts.avoid?.boxes ?? []) obs.boxes.push(bx);
  const widthOf = (s: string) => [...s].length * CHAR_W * th + 0.6 * mm;
  const textBox = (x: number, y: number, s: string, rotate: 0 | 90): Bounds => {
    const w = widthOf(s), h = th * 1.1;
    return rotate === 0 ? { xmin: x - w / 2, xmax: x + w / 2, ymin: y - h / 2, ymax: y + h / 2 } : { xmin: x - h / 2, xmax: x + h / 2, ymin: y - w / 2, ymax: y + w / 2 };
  };
  const line = (x1: number, y1: number, x2: number, y2: number, style: DimLine['style']) => {
    out.lines.push({ x1, y1, x2, y2, style });
    if (style !== 'centre') obs.segs.push([x1, y1, x2, y2]);
  };
  const arrow = (x: number, y: number, dx: number, dy: number) => out.arrows.push({ x, y, dx, dy });
  const text = (x: number, y: number, s: string, rotate: 0 | 90, role: string, value: number) => {
    const box = textBox(x, y, s, rotate);
    out.texts.push({ x, y, text: s, rotate, role, value, box });
    obs.boxes.push(box);
  };

  // Where an extension line starts: the section's point nearest the dimension line along it.
  const polys = obs.polys;
  const lowestAt = (x: number) => extremeAlong(polys, 'x', x, -1, b.ymin, 1e-6 * size);
  const leftmostAt = (y: number) => extremeAlong(polys, 'y', y, -1, b.xmin, 1e-6 * size);
  const rightmostAt = (y: number) => extremeAlong(polys, 'y', y, 1, b.xmax, 1e-6 * size);

  // Overall width (below) and height (right): first, so nothing else takes their place.
  if (opts.overall !== false) {
    const yd = b.ymin - FIRST_LANE_MM * mm;
    line(b.xmin, lowestAt(b.xmin) - EXT_GAP * mm, b.xmin, yd - EXT_OVER * mm, 'ext');
    line(b.xmax, lowestAt(b.xmax) - EXT_GAP * mm, b.xmax, yd - EXT_OVER * mm, 'ext');
    line(b.xmin, yd, b.xmax, yd, 'dim');
    arrow(b.xmin, yd, -1, 0);
    arrow(b.xmax, yd, 1, 0);
    const ws = fmt(b.xmax - b.xmin);
    const wx = alongLine((b.xmin + b.xmax) / 2, b.xmax - b.xmin, widthOf(ws), (x) => textBox(x, yd + 1 * mm + th / 2, ws, 0));
    text(wx, yd + 1 * mm + th / 2, ws, 0, 'width', b.xmax - b.xmin);
    const xd = b.xmax + FIRST_LANE_MM * mm;
    line(rightmostAt(b.ymin) + EXT_GAP * mm, b.ymin, xd + EXT_OVER * mm, b.ymin, 'ext');
    line(rightmostAt(b.ymax) + EXT_GAP * mm, b.ymax, xd + EXT_OVER * mm, b.ymax, 'ext');
    line(xd, b.ymin, xd, b.ymax, 'dim');
    arrow(xd, b.ymax, 0, 1);
    arrow(xd, b.ymin, 0, -1);
    const hs = fmt(b.ymax - b.ymin);
    const hy = alongLine((b.ymin + b.ymax) / 2, b.ymax - b.ymin, widthOf(hs), (y) => textBox(xd - 1 * mm - th / 2, y, hs, 90));
    text(xd - 1 * mm - th / 2, hy, hs, 90, 'height', b.ymax - b.ymin);
  }

  /**
   * Where along a dimension line of length `len` centred at `mid` its value goes: the middle, or
   * the nearest shift (in steps of the text's length) that clears the marks already drawn; the
   * middle when none does.
   */
  function alongLine(mid: number, len: number, w: number, boxAt: (pos: number) => Bounds): number {
    const room = Math.max(0, (len - w) / 2 - ARROW * mm);
    for (let k = 0; k <= 6; k++) {
      for (const sg of k === 0 ? [0] : [1, -1]) {
        const o = (sg * k * (w + 1 * mm)) / 2;
        if (Math.abs(o) > room) continue;
        if (obs.free(boxAt(mid + o), false)) return mid + o;
      }
    }
    return mid;
  }

  // Centre marks, then the positions (running dimensions), then diameters, openings, plates.
  const holes = features.filter((f): f is Hole => f.kind === 'hole');
  for (const f of holes) {
    const r = f.diameter / 2;
    const m = r + Math.min(r, 1.5 * mm);
    line(f.cx - m, f.cy, f.cx + m, f.cy, 'centre');
    line(f.cx, f.cy - m, f.cx, f.cy + m, 'centre');
  }

  const xs: { at: number; rank: number; from: number }[] = [], ys: { at: number; rank: number; from: number }[] = [];
  for (const f of features) {
    if (f.kind === 'hole') {
      xs.push({ at: f.cx, rank: 0, from: f.cy - f.diameter / 2 });
      ys.push({ at: f.cy, rank: 0, from: f.cx - f.diameter / 2 });
    } else if (f.kind === 'opening' || f.kind === 'notch') {
      const rank = f.kind === 'opening' ? 1 : 2;
      const px = f.kind === 'opening' ? [f.xmin, f.xmax] : f.x;
      const py = f.kind === 'opening' ? [f.ymin, f.ymax] : f.y;
      for (const x of px) xs.push({ at: x, rank, from: Math.max(f.ymin, b.ymin) });
      for (const y of py) ys.push({ at: y, rank, from: Math.max(f.xmin, b.xmin) });
    }
  }
  runningDimension('x', xs, b.ymin - (FIRST_LANE_MM + LANE_STEP) * mm);
  runningDimension('y', ys, b.xmin - FIRST_LANE_MM * mm);

  function runningDimension(axis: 'x' | 'y', items: { at: number; rank: number; from: number }[], lane: number): void {
    const datum = axis === 'x' ? b!.xmin : b!.ymin;
    const tol = 1e-9 * size;
    // One entry per distinct position, keeping the most important reason and the nearest start.
    const uniq: { at: number; rank: number; from: number }[] = [];
    for (const it of [...items].sort((p, q) => p.at - q.at || p.rank - q.rank)) {
      const last = uniq[uniq.length - 1];
      if (last && Math.abs(last.at - it.at) <= tol) {
        last.from = Math.min(last.from, it.from);
        continue;
      }
      if (Math.abs(it.at - datum) > tol) uniq.push({ ...it });
    }
    if (uniq.length === 0) return;
    // Values at the arrowheads, beyond the line; a value that would touch a kept one is left off.
    const kept: { at: number; from: number; box: Bounds; s: string }[] = [];
    for (const it of [...uniq].sort((p, q) => p.rank - q.rank || p.at - q.at)) {
      // Arrowheads may not run into each other: a position closer than one arrow to a kept one
      // is left off (the schedule has it).
      if (kept.some((k) => Math.abs(k.at - it.at) < (ARROW + 0.4) * mm)) {
        out.omitted.push({ feature: { kind: 'position', axis, at: it.at }, reason: 'too close to another position to draw its arrow' });
        continue;
      }
      const s = fmt(it.at - datum);
      const w = widthOf(s);
      // Beside the extension line at the arrowhead, beyond the dimension line; else on its other
      // side (between the line and the section); before or after the extension line.
      let placed = false;
      for (const [sd, across] of [[-1, -1], [1, -1], [-1, 1], [1, 1]]) {
        const off = sd * (0.4 * mm + th / 2);
        const deep = lane + across * (1 * mm + w / 2);
        const box = axis === 'x' ? textBox(it.at + off, deep, s, 90) : textBox(deep, it.at - off, s, 0);
        if (kept.some((k) => boxesMeet(box, k.box, 0.4 * mm)) || !obs.free(box, true)) continue;
        kept.push({ at: it.at, from: it.from, box, s });
        placed = true;
        break;
      }
      if (!placed) out.omitted.push({ feature: { kind: 'position', axis, at: it.at }, reason: 'too close to another position to write its value' });
    }
    if (kept.length === 0) return;
    const far = Math.max(...kept.map((k) => k.at));
    if (axis === 'x') {
      out.origins.push({ x: datum, y: lane });
      line(datum, lowestAt(datum) - EXT_GAP * mm, datum, lane - EXT_OVER * mm, 'ext');
      line(datum, lane, far, lane, 'dim');
      for (const k of kept) {
        line(k.at, k.from - EXT_GAP * mm, k.at, lane - EXT_OVER * mm, 'ext');
        arrow(k.at, lane, 1, 0);
        text((k.box.xmin + k.box.xmax) / 2, (k.box.ymin + k.box.ymax) / 2, k.s, 90, 'x-position', k.at - datum);
      }
    } else {
      out.origins.push({ x: lane, y: datum });
      line(leftmostAt(datum) - EXT_GAP * mm, datum, lane - EXT_OVER * mm, datum, 'ext');
      line(lane, datum, lane, far, 'dim');
      for (const k of kept) {
        line(k.from - EXT_GAP * mm, k.at, lane - EXT_OVER * mm, k.at, 'ext');
        arrow(lane, k.at, 0, 1);
        text((k.box.xmin + k.box.xmax) / 2, (k.box.ymin + k.box.ymax) / 2, k.s, 0, 'y-position', k.at - datum);
      }
    }
  }

  for (const f of holes) placeDiameter(f);

  function placeDiameter(f: Hole): void {
    const r = f.diameter / 2;
    const s = `Ø${fmt(f.diameter)}`;
    const w = widthOf(s);
    // Inside the hole: a diameter line through the centre, arrows at the circle, the value beside
    // it (left or right of the centre, above or below the line), when the place is empty: a round
    // cut that breaks an edge may hold material there, and the section's axes often cross the centre.
    if (2 * r > w + 2 * ARROW * mm + 2 * mm && r > 1.5 * th) {
      const near = w / 2 + 1 * mm, far = Math.max(near, r - w / 2 - ARROW * mm - 0.5 * mm);
      for (const [along, side] of [[-near, 1], [near, 1], [-near, -1], [near, -1], [-far, 1], [far, 1], [-far, -1], [far, -1]]) {
        const tx = f.cx + along, ty = f.cy + side * (0.5 * mm + th * 0.55);
        const box = textBox(tx, ty, s, 0);
        if (Math.hypot(Math.max(Math.abs(box.xmin - f.cx), Math.abs(box.xmax - f.cx)), Math.max(Math.abs(box.ymin - f.cy), Math.abs(box.ymax - f.cy))) > r) continue;
        if (!obs.free(box, true)) continue;
        line(f.cx - r, f.cy, f.cx + r, f.cy, 'dim');
        arrow(f.cx - r, f.cy, -1, 0);
        arrow(f.cx + r, f.cy, 1, 0);
        text(tx, ty, s, 0, 'diameter', f.diameter);
        return;
      }
    }
    // Otherwise on a leader pointing at the centre, from outside, with the value on its shoulder.
    for (const reach of [6, 11, 16]) {
      for (const deg of [45, 135, -45, -135, 90, -90, 0, 180]) {
        const a = (deg * Math.PI) / 180, ux = Math.cos(a), uy = Math.sin(a);
        const px = f.cx + r * ux, py = f.cy + r * uy;
        const kx = px + reach * mm * ux, ky = py + reach * mm * uy;
        const dir = ux >= -1e-9 ? 1 : -1;
        const sx = kx + dir * 1.5 * mm;
        const tx = sx + (dir * w) / 2, ty = ky + 0.5 * mm + th / 2;
        if (!obs.free(textBox(tx, ty, s, 0), true)) continue;
        if (!obs.clearOfTexts(px + 0.3 * mm * ux, py + 0.3 * mm * uy, kx, ky)) continue;
        line(px, py, kx, ky, 'ext');
        line(kx, ky, sx + dir * w, ky, 'ext');
        arrow(px, py, -ux, -uy);
        text(tx, ty, s, 0, 'diameter', f.diameter);
        return;
      }
    }
    out.omitted.push({ feature: f, reason: 'no free place for the diameter' });
  }

  // Openings that are not round: width × height written inside, when it fits.
  for (const f of features) {
    if (f.kind !== 'opening') continue;
    const s = `${fmt(f.xmax - f.xmin)} × ${fmt(f.ymax - f.ymin)}`;
    const cx = (f.xmin + f.xmax) / 2, cy = (f.ymin + f.ymax) / 2;
    const box = textBox(cx, cy, s, 0);
    if (box.xmax - box.xmin < f.xmax - f.xmin && box.ymax - box.ymin < f.ymax - f.ymin && obs.free(box, false)) text(cx, cy, s, 0, 'opening', f.xmax - f.xmin);
    else out.omitted.push({ feature: f, reason: 'too small to write its size in' });
  }

  // Plate thicknesses: one of each value first, then repeats, at most maxThickness.
  const plates = features.filter((f): f is Plate => f.kind === 'thickness');
  const values = new Set<string>();
  const firsts = plates.filter((p) => !values.has(fmt(p.t)) && !!values.add(fmt(p.t)));
  const maxT = opts.maxThickness ?? 6;
  let drawn = 0;
  for (const p of [...firsts, ...plates.filter((p) => !firsts.includes(p))]) {
    if (drawn >= maxT) out.omitted.push({ feature: p, reason: 'thinned out: enough thicknesses are shown' });
    else if (placeThickness(p)) drawn++;
    else out.omitted.push({ feature: p, reason: 'no free place for the value' });
  }

  function placeThickness(plate: Plate): boolean {
    for (const [ax, ay, bx, by] of [[plate.ax, plate.ay, plate.bx, plate.by], ...plate.alternatives]) {
      if (placeThicknessAt({ ...plate, ax, ay, bx, by })) return true;
    }
    return false;
  }

  function placeThicknessAt(p: Plate): boolean {
    const ux = (p.bx - p.ax) / p.t, uy = (p.by - p.ay) / p.t;
    const s = fmt(p.t);
    const over = 4 * mm;
    const from = { x: p.ax - ux * over, y: p.ay - uy * over }, to = { x: p.bx + ux * over, y: p.by + uy * over };
    const w = widthOf(s), h = th * 1.1;
    // Arrows outside the plate pointing in; the value beyond one face, reading horizontally.
    for (const side of [1, -1]) {
      const end = side === 1 ? to : from;
      const ox = side * ux, oy = side * uy;
      const reach = Math.abs(ox) * (w / 2) + Math.abs(oy) * (h / 2) + 0.6 * mm;
      const tx = end.x + ox * reach, ty = end.y + oy * reach;
      if (!obs.free(textBox(tx, ty, s, 0), true)) continue;
      if (!obs.clearOfTexts(from.x, from.y, to.x, to.y)) continue;
      line(from.x, from.y, to.x, to.y, 'dim');
      arrow(p.ax, p.ay, ux, uy);
      arrow(p.bx, p.by, -ux, -uy);
      text(tx, ty, s, 0, 'thickness', p.t);
      return true;
    }
    return false;
  }

  // Extent of everything drawn.
  const e = { ...b };
  const take = (x: number, y: number) => {
    e.xmin = Math.min(e.xmin, x);
    e.xmax = Math.max(e.xmax, x);
    e.ymin = Math.min(e.ymin, y);
    e.ymax = Math.max(e.ymax, y);
  };
  for (const l of out.lines) {
    take(l.x1, l.y1);
    take(l.x2, l.y2);
  }
  for (const t of out.texts) {
    take(t.box.xmin, t.box.ymin);
    take(t.box.xmax, t.box.ymax);
  }
  for (const o of out.origins) {
    take(o.x - out.style.origin, o.y - out.style.origin);
    take(o.x + out.style.origin, o.y + out.style.origin);
  }
  out.extent = e;
  return out;
}
