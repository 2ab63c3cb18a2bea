/**
 * The dimensions drawn on the canvas: the report figure's own (src/report/dimension-features.ts
 * finds the holes, openings, notches and plate thicknesses; src/report/dimensions.ts places them)
 * laid out for the screen, where one millimetre is PX_PER_MM CSS pixels, so spacings and text
 * read the same at any zoom. The layout keeps clear of the principal axes and the centroid mark
 * when they are shown, leaves off what has no room and says so (`omitted`). It does not dodge the
 * cut line: that line is dragged, and values that jumped about as it passed would be harder to read
 * than a value the line crosses.
 *
 * Both steps are memoised by the data they read: the features by the region (and the subtracted
 * shapes), the layout by the features, the zoom and the overlays; panning moves nothing. The
 * painter and the caption under the canvas ask for the same layout and share it.
 */
import type { Region, SectionProperties, ShapeResult, Shape } from '../../src';
import { findDimensionFeatures, layoutDimensions, type DimensionFeature, type DimensionLayout } from '../../src/report/dimensions';

/** CSS pixels per millimetre (CSS defines 96 px per inch). */
export const PX_PER_MM = 96 / 25.4;
/** Text height on screen in millimetres: about 11 px, the size of the canvas's other labels. */
export const TEXT_MM = 2.9;

export interface DimensionInput {
  region: Region;
  /** Each shape's own result and record, in order (for the subtracted shapes, i.e. notches). */
  shapes: readonly ShapeResult[];
  records: readonly Shape[];
  props: SectionProperties;
  /** Pixels per world unit. */
  scale: number;
  /** The other overlays shown, which the texts keep clear of. */
  principal: boolean;
  centroid: boolean;
}

const featureCache = new WeakMap<Region, { cuts: Region[]; features: DimensionFeature[] }>();
const layoutCache = new WeakMap<DimensionFeature[], { key: string; layout: DimensionLayout }>();

/** The regions of the subtracted shapes (a notch is dimensioned from the cut that made it). */
function cutRegions(shapes: readonly ShapeResult[], records: readonly Shape[]): Region[] {
  const out: Region[] = [];
  shapes.forEach((s, i) => {
    if (records[i]?.op === 'subtract' && !s.error && s.region.length > 0) out.push(s.region);
  });
  return out;
}

function features(region: Region, cuts: Region[]): DimensionFeature[] {
  const hit = featureCache.get(region);
  if (hit && hit.cuts.length === cuts.length && hit.cuts.every((c, k) => c === cuts[k])) return hit.features;
  const features = findDimensionFeatures(region, cuts);
  featureCache.set(region, { cuts, features });
  return features;
}

/** The other marks the dimension texts keep clear of (world units; `mm` world units per screen millimetre). */
function marks(inp: DimensionInput, mm: number) {
  const p = inp.props;
  const lines: [number, number, number, number][] = [];
  const boxes: { xmin: number; xmax: number; ymin: number; ymax: number }[] = [];
  const b = p.bounds;
  const far = 4 * Math.max(b.xmax - b.xmin, b.ymax - b.ymin) + 200 * mm;
  const { x, y } = p.centroid;
  if (inp.principal) {
    const t = (p.theta * Math.PI) / 180;
    for (const a of [t, t + Math.PI / 2]) lines.push([x - far * Math.cos(a), y - far * Math.sin(a), x + far * Math.cos(a), y + far * Math.sin(a)]);
  }
  // The centroid symbol and its "C" (app/canvas/layers/Centroid.tsx draws them within ~16 px).
  if (inp.centroid) boxes.push({ xmin: x - 3 * mm, xmax: x + 5 * mm, ymin: y - 3 * mm, ymax: y + 5 * mm });
  return { lines, boxes };
}

/** The dimensions for the screen, or null when there is nothing to dimension. */
export function canvasDimensions(inp: DimensionInput): DimensionLayout | null {
  if (inp.region.length === 0 || !(inp.scale > 0) || !Number.isFinite(inp.scale)) return null;
  const f = features(inp.region, cutRegions(inp.shapes, inp.records));
  const mm = PX_PER_MM / inp.scale;
  const key = [inp.scale, inp.principal, inp.centroid, inp.props.centroid.x, inp.props.centroid.y, inp.props.theta].join('|');
  const hit = layoutCache.get(f);
  if (hit && hit.key === key) return hit.layout;
  const layout = layoutDimensions(f, inp.region, { mm, textMm: TEXT_MM, avoid: marks(inp, mm) });
  layoutCache.set(f, { key, layout });
  return layout;
}
