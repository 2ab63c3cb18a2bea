/**
 * Canvas helpers without a browser: exact snap points and intersections, picking, the grid
 * sequence and the view transform. Intersections are checked against hand-solvable cases
 * (3-4-5 right triangles, Pythagoras); view checks are invariants of the transform itself.
 */
import { describe, expect, it } from 'vitest';
import { circleContour, polygonContour, regionSegments, segmentIntersections, shapeToRegion, type Shape } from '../src';
import { pickShape } from '../app/geometry/pick';
import { snapPointer, snapPoints } from '../app/geometry/snap';
import { fitBounds, gridStep, toScreen, toWorld, zoomAt } from '../app/view';

const settings = { grid: true, vertex: true, midpoint: true, centre: true, intersection: true, ortho: false };
const shapesOf = (list: Shape[]) => list.map((s) => ({ id: s.id, region: shapeToRegion(s) }));

describe('exact intersections', () => {
  it('line with line', () => {
    const [a] = regionSegments([polygonContour([[-2, 0], [2, 0], [2, 1]])]);
    const [b] = regionSegments([polygonContour([[1, -1], [1, 1], [0, 5]])]);
    expect(segmentIntersections(a, b)).toEqual([[1, 0]]);
  });
  it('line with arc: y = 3 meets the circle of radius 5 at x = ±4 (3-4-5 triangle)', () => {
    const arcs = regionSegments([circleContour(0, 0, 5)]);
    const [line] = regionSegments([polygonContour([[-10, 3], [10, 3], [0, 20]])]);
    const pts = arcs.flatMap((g) => segmentIntersections(line, g)).sort((p, q) => p[0] - q[0]);
    expect(pts).toHaveLength(2);
    expect(pts[0][0]).toBeCloseTo(-4, 12);
    expect(pts[1][0]).toBeCloseTo(4, 12);
    expect(pts[0][1]).toBeCloseTo(3, 12);
  });
  it('arc with arc: circles r = 5 at (0,0) and (8,0) cross at (4, ±3) (Pythagoras)', () => {
    const a = regionSegments([circleContour(0, 0, 5)]);
    const b = regionSegments([circleContour(8, 0, 5)]);
    const pts = a.flatMap((p) => b.flatMap((q) => segmentIntersections(p, q))).sort((p, q) => p[1] - q[1]);
    expect(pts).toHaveLength(2);
    expect(pts[0][0]).toBeCloseTo(4, 12);
    expect(pts[0][1]).toBeCloseTo(-3, 12);
    expect(pts[1][1]).toBeCloseTo(3, 12);
  });
});

describe('snapping', () => {
  const shapes = shapesOf([
    { id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 60 },
    { id: 'c', type: 'circle', center: [200, 0], radius: 30 },
  ]);
  it('offers vertices, midpoints and arc centres', () => {
    const pts = snapPoints(shapes, false);
    expect(pts.some((p) => p.kind === 'vertex' && p.x === 100 && p.y === 60)).toBe(true);
    expect(pts.some((p) => p.kind === 'midpoint' && p.x === 50 && p.y === 0)).toBe(true);
    expect(pts.some((p) => p.kind === 'centre' && Math.abs(p.x - 200) < 1e-12 && Math.abs(p.y) < 1e-12)).toBe(true);
  });
  it('prefers a vertex within the radius, else the grid, and obeys the orthogonal mode', () => {
    // 2 px per unit: the snap radius is 5 units; the grid step is 10 units.
    const near = snapPointer([101.5, 58.9], { shapes, scale: 2, settings });
    expect(near).toEqual({ p: [100, 60], kind: 'vertex', ortho: false });
    const grid = snapPointer([123.4, 87.6], { shapes, scale: 2, settings });
    expect(grid.kind).toBe('grid');
    expect(grid.p).toEqual([120, 90]);
    const free = snapPointer([123.4, 87.6], { shapes, scale: 2, settings: { ...settings, grid: false } });
    expect(free).toEqual({ p: [123.4, 87.6], kind: 'free', ortho: false });
    const ortho = snapPointer([143, 7], { shapes, scale: 2, settings: { ...settings, grid: false, ortho: true }, from: [120, 90] });
    expect(ortho.p).toEqual([120, 7]); // |dy| > |dx|: vertical from the previous point
    expect(ortho.ortho).toBe(true);
  });
  it('ignores the shape being edited', () => {
    const r = snapPointer([101, 59], { shapes, scale: 2, settings: { ...settings, grid: false }, exclude: new Set(['r']) });
    expect(r.kind).toBe('free');
  });
});

describe('picking', () => {
  it('picks the topmost shape and not the hole of a tube', () => {
    const shapes = shapesOf([
      { id: 'plate', type: 'rectangle', at: [-100, -100], width: 50, height: 50 },
      { id: 'tube', type: 'round-tube', at: [0, 0], outerDiameter: 100, wall: 10 },
    ]);
    expect(pickShape(shapes, 45, 0, 0.01, 0.5)).toBe('tube'); // in the wall (40 < r < 50)
    expect(pickShape(shapes, 0, 0, 0.01, 0.5)).toBeNull(); // in the bore
    expect(pickShape(shapes, -75, -75, 0.01, 0.5)).toBe('plate');
  });
});

describe('view', () => {
  it('grid steps follow 1, 2, 5 × 10^k and keep at least the minimum spacing', () => {
    for (const scale of [0.013, 0.7, 1, 2, 3.3, 17, 250]) {
      const { minor, major } = gridStep(scale);
      expect(minor * scale).toBeGreaterThanOrEqual(14 - 1e-9);
      const m = minor / Math.pow(10, Math.floor(Math.log10(minor) + 1e-9));
      expect([1, 2, 5].some((f) => Math.abs(m - f) < 1e-9)).toBe(true);
      expect(major / minor === 5 || major / minor === 10).toBe(true);
    }
  });
  it('zoom keeps the world point under the pointer; screen and world are inverse', () => {
    const v = { scale: 2, ox: 150, oy: 600 };
    const w = toWorld(v, 333, 222);
    const z = zoomAt(v, 333, 222, 1.7);
    const s = toScreen(z, w[0], w[1]);
    expect(s[0]).toBeCloseTo(333, 9);
    expect(s[1]).toBeCloseTo(222, 9);
    expect(toWorld(v, ...toScreen(v, 12.5, -7))).toEqual([12.5, -7]);
  });
  it('fit centres the bounds in the viewport', () => {
    const v = fitBounds({ xmin: 0, xmax: 100, ymin: 0, ymax: 60 }, 800, 600);
    const c = toScreen(v, 50, 30);
    expect(c[0]).toBeCloseTo(400, 9);
    expect(c[1]).toBeCloseTo(300, 9);
  });
});
