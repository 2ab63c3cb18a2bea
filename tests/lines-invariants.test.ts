/**
 * Exact identities of line properties on random chains of lines and arcs, with fast-check
 * (REFERENCES.md, "Exact identities that need no source"): translation, rotation (Mohr's
 * transformation, Gere & Goodno, Sec. 12.8, which holds for line moments as for area moments),
 * reversal of direction, and splitting a line or an arc in two.
 */
import fc from 'fast-check';
import { afterAll, describe, it } from 'vitest';
import { arcPointAtAngle } from '../src/geometry/contour';
import { chainFrom, chainSegment, reverseChain, segmentCount, transformChain, type LineChain } from '../src/lines/chain';
import { lineProperties, type LineProperties } from '../src/lines/line-properties';
import { close, worst } from './helpers';

/**
 * A random chain: 2 to 7 vertices in a 20 × 20 box around (cx, cy), each segment straight or an
 * arc of sweep up to ±300°; consecutive vertices at least 0.01 apart. Sometimes closed.
 */
const chainArb = fc
  .record({
    cx: fc.double({ min: -100, max: 100, noNaN: true }),
    cy: fc.double({ min: -100, max: 100, noNaN: true }),
    pts: fc.array(fc.tuple(fc.double({ min: -10, max: 10, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true })), { minLength: 2, maxLength: 7 }),
    sweeps: fc.array(fc.double({ min: -5.2, max: 5.2, noNaN: true }), { minLength: 7, maxLength: 7 }),
    arcs: fc.array(fc.boolean(), { minLength: 7, maxLength: 7 }),
    closed: fc.boolean(),
  })
  .map(({ cx, cy, pts, sweeps, arcs, closed }) => {
    const xy: number[] = [];
    for (const [x, y] of pts) {
      const n = xy.length;
      if (n >= 2 && Math.hypot(cx + x - xy[n - 2], cy + y - xy[n - 1]) < 0.01) continue;
      xy.push(cx + x, cy + y);
    }
    if (xy.length < 4) xy.push(xy[0] + 3, xy[1] + 1);
    const n = xy.length / 2;
    const isClosed = closed && n >= 3 && Math.hypot(xy[0] - xy[2 * n - 2], xy[1] - xy[2 * n - 1]) >= 0.01;
    const m = isClosed ? n : n - 1;
    const bulge = Array.from({ length: m }, (_, i) => (arcs[i] && Math.abs(sweeps[i]) > 1e-3 ? Math.tan(sweeps[i] / 4) : 0));
    return chainFrom(xy, bulge, isClosed);
  });

const groupArb = fc.array(chainArb, { minLength: 1, maxLength: 3 });

function expectSame(p: LineProperties, q: LineProperties, tol = 1e-11): void {
  const size = Math.sqrt(p.J / p.length);
  close(q.length, p.length, tol);
  close(q.centroid.x, p.centroid.x, tol, size + Math.abs(p.centroid.x));
  close(q.centroid.y, p.centroid.y, tol, size + Math.abs(p.centroid.y));
  for (const k of ['Ix', 'Iy', 'Ixy', 'J', 'I1', 'I2'] as const) close(q[k], p[k], tol, p.J);
  for (const k of ['top', 'bottom', 'left', 'right'] as const) close(q.fibres[k], p.fibres[k], tol, size);
}

/** Segment k split at fraction s of its length (a line at the point, an arc at the angle). */
function splitSegment(c: LineChain, k: number, s: number): LineChain {
  const m = segmentCount(c);
  const xy: number[] = [];
  const bulge: number[] = [];
  for (let i = 0; i < m; i++) {
    const g = chainSegment(c, i);
    xy.push(g.ax, g.ay);
    if (i !== k) {
      bulge.push(Math.tan(g.sweep / 4));
      continue;
    }
    const alpha = Math.abs(g.sweep) / 2;
    const [px, py] = g.sweep === 0 ? [g.ax + s * (g.bx - g.ax), g.ay + s * (g.by - g.ay)] : arcPointAtAngle(g.ax, g.ay, g.bx, g.by, g.sweep, -alpha + 2 * alpha * s);
    xy.push(px, py);
    bulge.push(Math.tan((g.sweep * s) / 4), Math.tan((g.sweep * (1 - s)) / 4));
  }
  if (!c.closed) xy.push(c.xy[c.xy.length - 2], c.xy[c.xy.length - 1]);
  return chainFrom(xy, bulge, c.closed);
}

describe('line properties: exact identities (fast-check)', () => {
  it('translation leaves them unchanged', () => {
    fc.assert(
      fc.property(groupArb, fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true }), (g, dx, dy) => {
        const p = lineProperties(g);
        const q = lineProperties(g.map((c) => transformChain(c, 1, 0, 0, 1, dx, dy)));
        close(q.length, p.length, 1e-11);
        for (const k of ['Ix', 'Iy', 'Ixy', 'J', 'I1', 'I2'] as const) close(q[k], p[k], 1e-10, p.J);
        close(q.centroid.x, p.centroid.x + dx, 1e-11, Math.abs(dx) + Math.abs(p.centroid.x) + 1);
        close(q.centroid.y, p.centroid.y + dy, 1e-11, Math.abs(dy) + Math.abs(p.centroid.y) + 1);
      }),
      { numRuns: 200 },
    );
  });

  it('rotation transforms them by Mohr (L, J, I1, I2 unchanged)', () => {
    fc.assert(
      fc.property(groupArb, fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), (g, th) => {
        const c = Math.cos(th), s = Math.sin(th);
        const p = lineProperties(g);
        const q = lineProperties(g.map((ch) => transformChain(ch, c, -s, s, c, 0, 0)));
        // Body turned by θ: Ix′ = c²Ix + s²Iy + 2sc·Ixy, Iy′ = s²Ix + c²Iy − 2sc·Ixy,
        // Ixy′ = sc(Iy − Ix) + (c² − s²)Ixy (Ix = ∫y², Iy = ∫x² about the centroid).
        close(q.length, p.length, 1e-12);
        close(q.J, p.J, 1e-11);
        close(q.I1, p.I1, 1e-11, p.J);
        close(q.I2, p.I2, 1e-11, p.J);
        close(q.Ix, c * c * p.Ix + s * s * p.Iy + 2 * s * c * p.Ixy, 1e-11, p.J);
        close(q.Iy, s * s * p.Ix + c * c * p.Iy - 2 * s * c * p.Ixy, 1e-11, p.J);
        close(q.Ixy, s * c * (p.Iy - p.Ix) + (c * c - s * s) * p.Ixy, 1e-11, p.J);
      }),
      { numRuns: 200 },
    );
  });

  it('reversing the direction of every line leaves them unchanged', () => {
    fc.assert(
      fc.property(groupArb, (g) => {
        expectSame(lineProperties(g), lineProperties(g.map(reverseChain)));
      }),
      { numRuns: 200 },
    );
  });

  it('splitting a line or an arc in two leaves them unchanged', () => {
    fc.assert(
      fc.property(chainArb, fc.nat(), fc.double({ min: 0.05, max: 0.95, noNaN: true }), (c, k, s) => {
        const seg = k % segmentCount(c);
        expectSame(lineProperties([c]), lineProperties([splitSegment(c, seg, s)]));
      }),
      { numRuns: 300 },
    );
  });

  it('a closed chain equals the open chain with its closing segment drawn', () => {
    fc.assert(
      fc.property(chainArb, (c) => {
        if (!c.closed) return;
        const n = c.xy.length / 2;
        const open = chainFrom([...c.xy, c.xy[0], c.xy[1]], Array.from({ length: n }, (_, i) => (c.bulge ? c.bulge[i] : 0)), false);
        expectSame(lineProperties([c]), lineProperties([open]), 1e-13);
      }),
      { numRuns: 100 },
    );
  });
});

afterAll(() => {
  console.log(`lines-invariants: largest relative error ${worst.value.toExponential(2)}`);
});
