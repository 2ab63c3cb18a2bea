/**
 * SVG export of a region with exact arcs: every arc segment becomes an SVG elliptical-arc command
 * `A r r 0 large-arc sweep x y` with equal radii, so nothing is sampled.
 *
 * SVG is y-down, the engine y-up: points are written as (x, −y). The flip turns counter-clockwise
 * into clockwise on screen, so a positive bulge (a CCW arc) has SVG sweep-flag 0 ("negative
 * angle direction" in SVG's own axes). Outer loops run CCW and holes CW, so winding numbers are 1
 * in material and 0 in holes: fill-rule nonzero draws exactly the region.
 *
 * Source: W3C SVG 1.1, section 8.3.8 "The elliptical arc curve commands" and F.6 "Elliptical arc
 * implementation notes" (sweep-flag 1 = positive-angle direction; large-arc-flag 1 = sweep > 180°).
 */
import type { Region } from '../geometry/contour';
import { regionBounds } from '../geometry/contour';
import type { Units } from '../document/types';
import { UNIT_IN_METRES } from '../document/types';

/** Shortest text that reads back as the same double. */
export function svgNumber(v: number): string {
  if (v === 0 || Object.is(v, -0)) return '0';
  return String(v);
}

/** Path data of a region in SVG's y-down axes: M, L, A and Z commands, exact. */
export function regionPathData(region: Region, num: (v: number) => string = svgNumber): string {
  const parts: string[] = [];
  for (const c of region) {
    const n = c.xy.length >> 1;
    if (n < 2) continue;
    parts.push(`M${num(c.xy[0])} ${num(-c.xy[1])}`);
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
      const b = c.bulge ? c.bulge[i] : 0;
      if (b === 0) {
        if (j !== 0) parts.push(`L${num(bx)} ${num(-by)}`);
        continue;
      }
      const phi = 4 * Math.atan(b);
      const L = Math.hypot(bx - ax, by - ay);
      const r = L / (2 * Math.sin(Math.abs(phi) / 2));
      const large = Math.abs(phi) > Math.PI ? 1 : 0;
      const sweep = phi > 0 ? 0 : 1;
      parts.push(`A${num(r)} ${num(r)} 0 ${large} ${sweep} ${num(bx)} ${num(-by)}`);
    }
    parts.push('Z');
  }
  return parts.join(' ');
}

export interface SvgExportOptions {
  /** Document units; with `scale`, the SVG gets a physical size in millimetres. */
  units?: Units;
  /** Paper length over real length (0.5 for 1:2); needs `units`. Default: 1 drawing unit = 1 px. */
  scale?: number;
  /** Margin around the section in drawing units; default 2 % of the larger extent. */
  padding?: number;
  fill?: string;
  stroke?: string;
  /** Stroke width in drawing units; default 0.2 % of the larger extent. */
  strokeWidth?: number;
  /** Optional title (escaped). */
  title?: string;
}

export function escapeXml(s: string): string {
  return s.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);
}

/** A standalone SVG document of the region (viewBox in drawing units, y flipped). */
export function exportSvg(region: Region, opts: SvgExportOptions = {}): string {
  const b = regionBounds(region) ?? { xmin: 0, xmax: 1, ymin: 0, ymax: 1 };
  const ext = Math.max(b.xmax - b.xmin, b.ymax - b.ymin) || 1;
  const pad = opts.padding !== undefined && Number.isFinite(opts.padding) && opts.padding >= 0 ? opts.padding : 0.02 * ext;
  const x0 = b.xmin - pad, y0 = -b.ymax - pad;
  const w = b.xmax - b.xmin + 2 * pad, h = b.ymax - b.ymin + 2 * pad;
  let size = `width="${svgNumber(w)}" height="${svgNumber(h)}"`;
  if (opts.units && opts.scale && Number.isFinite(opts.scale) && opts.scale > 0) {
    const mmPerUnit = UNIT_IN_METRES[opts.units] * 1000 * opts.scale;
    size = `width="${svgNumber(w * mmPerUnit)}mm" height="${svgNumber(h * mmPerUnit)}mm"`;
  }
  const fill = escapeXml(opts.fill ?? '#9db4c8');
  const stroke = escapeXml(opts.stroke ?? '#1d2b36');
  const sw = opts.strokeWidth !== undefined && opts.strokeWidth > 0 ? opts.strokeWidth : 0.002 * ext;
  const title = opts.title ? `<title>${escapeXml(opts.title)}</title>` : '';
  return (
    `<?xml version="1.0" encoding="UTF-8"?>\n` +
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" viewBox="${svgNumber(x0)} ${svgNumber(y0)} ${svgNumber(w)} ${svgNumber(h)}" ${size}>` +
    title +
    `<path d="${regionPathData(region)}" fill="${fill}" fill-rule="nonzero" stroke="${stroke}" stroke-width="${svgNumber(sw)}" stroke-linejoin="round"/>` +
    `</svg>\n`
  );
}
