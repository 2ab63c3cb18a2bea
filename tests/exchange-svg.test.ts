/**
 * SVG export: arcs leave as SVG elliptical-arc commands and the path data reads back into the
 * same section. The read-back follows the W3C SVG 1.1 specification, Appendix F.6.5
 * ("Conversion from endpoint to center parameterization"), written out here independently of
 * the exporter.
 */
import { describe, expect, test } from 'vitest';
import { exportSvg, regionPathData } from '../src/exchange/svg-export';
import { circleContour, contourFrom, DEMO_DOCUMENT, evaluateDocument, regionMoments, reverseContour, segmentArc, type Contour, type Region } from '../src';
import { rect, sector } from './helpers';

interface SvgArc {
  x0: number;
  y0: number;
  r: number;
  large: number;
  sweep: number;
  x: number;
  y: number;
}

/** Parse M/L/A/Z path data (absolute commands only, as the exporter writes). */
function parsePath(d: string): { contours: { start: [number, number]; segs: ({ kind: 'L'; x: number; y: number } | ({ kind: 'A' } & SvgArc))[] }[] } {
  const tokens = d.match(/[MLAZ]|-?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?/gi) ?? [];
  const contours: ReturnType<typeof parsePath>['contours'] = [];
  let i = 0, cx = 0, cy = 0;
  const num = () => {
    const v = Number(tokens[i++]);
    expect(Number.isFinite(v)).toBe(true);
    return v;
  };
  while (i < tokens.length) {
    const c = tokens[i++];
    if (c === 'M') {
      cx = num();
      cy = num();
      contours.push({ start: [cx, cy], segs: [] });
    } else if (c === 'L') {
      cx = num();
      cy = num();
      contours[contours.length - 1].segs.push({ kind: 'L', x: cx, y: cy });
    } else if (c === 'A') {
      const rx = num(), ry = num(), rot = num(), large = num(), sweep = num(), x = num(), y = num();
      expect(rx).toBe(ry); // circular arcs only
      expect(rot).toBe(0);
      contours[contours.length - 1].segs.push({ kind: 'A', x0: cx, y0: cy, r: rx, large, sweep, x, y });
      cx = x;
      cy = y;
    } else if (c === 'Z') {
      /* closes back to the start */
    } else throw new Error(`unexpected token ${c}`);
  }
  return { contours };
}

/** SVG 1.1 F.6.5: centre and sweep Δθ of an endpoint-parameterised circular arc (φ = 0). */
function svgArcCentre(a: SvgArc): { cx: number; cy: number; dtheta: number } {
  const x1p = (a.x0 - a.x) / 2, y1p = (a.y0 - a.y) / 2; // F.6.5.1 with φ = 0
  const r = a.r;
  const rad = Math.max(0, (r * r * r * r - r * r * y1p * y1p - r * r * x1p * x1p) / (r * r * y1p * y1p + r * r * x1p * x1p));
  const sign = a.large !== a.sweep ? 1 : -1; // F.6.5.2: + if fA ≠ fS
  const cxp = sign * Math.sqrt(rad) * y1p, cyp = -sign * Math.sqrt(rad) * x1p;
  const cx = cxp + (a.x0 + a.x) / 2, cy = cyp + (a.y0 + a.y) / 2; // F.6.5.3
  const ang = (ux: number, uy: number, vx: number, vy: number) => Math.sign(ux * vy - uy * vx || 1) * Math.acos(Math.max(-1, Math.min(1, (ux * vx + uy * vy) / (Math.hypot(ux, uy) * Math.hypot(vx, vy)))));
  let dtheta = ang((x1p - cxp) / r, (y1p - cyp) / r, (-x1p - cxp) / r, (-y1p - cyp) / r); // F.6.5.6
  if (a.sweep === 0 && dtheta > 0) dtheta -= 2 * Math.PI;
  else if (a.sweep === 1 && dtheta < 0) dtheta += 2 * Math.PI;
  return { cx, cy, dtheta };
}

/** Rebuild y-up contours from the parsed y-down path: flip y; an SVG sweep Δθ becomes −Δθ. */
function regionFromPath(d: string): Region {
  return parsePath(d).contours.map(({ start, segs }) => {
    const xy: number[] = [start[0], -start[1]];
    const bulge: number[] = [];
    for (const s of segs) {
      if (s.kind === 'L') bulge.push(0);
      else bulge.push(Math.tan(-svgArcCentre(s).dtheta / 4));
      xy.push(s.x, -s.y);
    }
    // The last command returns to the start: drop the repeated vertex; a final straight edge is the Z.
    const n = xy.length / 2;
    if (n > 1 && xy[2 * n - 2] === xy[0] && xy[2 * n - 1] === xy[1]) xy.length -= 2;
    else bulge.push(0);
    return contourFrom(xy, bulge);
  });
}

const REGIONS: [string, Region][] = [
  ['plate with a hole', [rect(0, 0, 100, 60), reverseContour(circleContour(30, 30, 12))]],
  ['sector (arc and two lines)', [sector(5, -3, 40, 0.7)]],
  ['demo section', evaluateDocument(DEMO_DOCUMENT).region],
];

describe('SVG path data', () => {
  for (const [name, region] of REGIONS) {
    test(`${name}: one A command per arc, and the numbers read back to the same moments`, () => {
      const d = regionPathData(region);
      const arcs = region.reduce((n, c: Contour) => n + (c.bulge ? c.bulge.filter((b) => b !== 0).length : 0), 0);
      expect((d.match(/A/g) ?? []).length).toBe(arcs);
      const back = regionFromPath(d);
      const m0 = regionMoments(region), m1 = regionMoments(back);
      const L = 200;
      for (const k of ['m00', 'm10', 'm01', 'm20', 'm02', 'm11'] as const) {
        const scale = Math.pow(L, k === 'm00' ? 2 : k.length === 3 && (k === 'm10' || k === 'm01') ? 3 : 4);
        // A moment that is zero by symmetry (the demo's m10 and m11) is the round-off of terms of
        // order A·L (about 1e-3 of L^k here), a few 1e-11: it is compared on that scale, not as 0.
        expect(Math.abs(m0[k] - m1[k]) / Math.max(Math.abs(m0[k]), scale * 1e-3), k).toBeLessThan(1e-12);
      }
    });
  }

  test('arc centres from the SVG data (F.6.5) are the engine arc centres, y flipped', () => {
    const region: Region = [sector(5, -3, 40, 0.7), reverseContour(circleContour(-50, 10, 7))];
    const parsed = parsePath(regionPathData(region));
    parsed.contours.forEach((pc, ci) => {
      const c = region[ci];
      let seg = 0;
      pc.segs.forEach((s, i) => {
        if (s.kind !== 'A') return;
        const engine = segmentArc(c, i);
        const svg = svgArcCentre(s);
        expect(Math.abs(svg.cx - engine.cx)).toBeLessThan(1e-9);
        expect(Math.abs(svg.cy - -engine.cy)).toBeLessThan(1e-9);
        expect(Math.abs(-svg.dtheta - engine.sweep)).toBeLessThan(1e-12);
        seg++;
      });
      expect(seg).toBeGreaterThan(0);
    });
  });
});

describe('SVG document', () => {
  test('fill-rule nonzero, a viewBox in drawing units with y flipped, physical size when a scale is given', () => {
    const region: Region = [rect(0, 0, 100, 60), reverseContour(circleContour(30, 30, 12))];
    const svg = exportSvg(region, { units: 'mm', scale: 0.5, padding: 0, title: '<b>&"x"' });
    expect(svg).toContain('fill-rule="nonzero"');
    expect(svg).toContain('viewBox="0 -60 100 60"');
    expect(svg).toContain('width="50mm" height="30mm"'); // 1:2 of 100 × 60 mm
    expect(svg).toContain('<title>&lt;b&gt;&amp;&quot;x&quot;</title>');
    expect(svg).not.toContain('<b>');
  });
});
