/**
 * Mirror symmetry: a section symmetric about a vertical or horizontal line through the centre of
 * its bounding box (the local frame's axes) is meshed on one side only and the mesh mirrored.
 *
 * Then the mesh, and so the discrete problem, has the symmetry exactly (mirrored coordinates are
 * exact negations in floating point), and the warping function, which is odd under a mirror, can
 * be made exactly odd after the iterative solve (warping.ts). A doubly symmetric section thus has
 * its shear centre at the centroid to round-off, and a singly symmetric one on its axis, instead
 * of within the discretization error of an unsymmetric mesh. Half (or a quarter) of the section
 * is also half (a quarter) of the meshing work.
 *
 * Detection is exact on the edge table: every edge must have a mirror edge with the same sweep
 * magnitude and the same piece on the mirrored side. The half section is cut out with the
 * engine's own booleans; the cut edges on the axis are flagged (they are not walls) and vanish
 * again when the mesh is mirrored.
 */
import { booleanRegions } from '../boolean';
import { polygonContour, transformContour, type Region } from '../geometry/contour';
import type { ExactBoundary } from './boundary-edges';
import type { EdgeShape } from './edge-geometry';
import type { QuadMesh } from './quad-mesh';
import type { LinearMesh } from './refine';

/** 'x': the mirror x → −x (axis: the line x = 0); 'y': y → −y. */
export type Axis = 'x' | 'y';

/** The mirror axes of the section in its local frame (tolerance: 10 snap distances). */
export function mirrorAxes(b: ExactBoundary): Axis[] {
  return (['x', 'y'] as const).filter((axis) => isMirrored(b, axis));
}

function isMirrored(b: ExactBoundary, axis: Axis): boolean {
  const { xy, edges } = b;
  const nv = xy.length >> 1;
  const tol = 10 * b.snap;
  // Vertex mirror map through a grid of cell size tol.
  const cells = new Map<string, number[]>();
  const key = (x: number, y: number) => `${Math.floor(x / tol)},${Math.floor(y / tol)}`;
  for (let v = 0; v < nv; v++) {
    const k = key(xy[2 * v], xy[2 * v + 1]);
    (cells.get(k) ?? cells.set(k, []).get(k)!).push(v);
  }
  const mirror = new Int32Array(nv).fill(-1);
  for (let v = 0; v < nv; v++) {
    const mx = axis === 'x' ? -xy[2 * v] : xy[2 * v], my = axis === 'y' ? -xy[2 * v + 1] : xy[2 * v + 1];
    const ix = Math.floor(mx / tol), iy = Math.floor(my / tol);
    for (let dx = -1; dx <= 1 && mirror[v] < 0; dx++)
      for (let dy = -1; dy <= 1 && mirror[v] < 0; dy++)
        for (const w of cells.get(`${ix + dx},${iy + dy}`) ?? [])
          if (Math.hypot(xy[2 * w] - mx, xy[2 * w + 1] - my) <= tol) {
            mirror[v] = w;
            break;
          }
    if (mirror[v] < 0) return false;
  }
  const byPair = new Map<string, number[]>();
  edges.forEach((e, k) => {
    const p = e.a < e.b ? `${e.a},${e.b}` : `${e.b},${e.a}`;
    (byPair.get(p) ?? byPair.set(p, []).get(p)!).push(k);
  });
  for (const e of edges) {
    const a = mirror[e.a], bb = mirror[e.b];
    const L = Math.hypot(xy[2 * e.b] - xy[2 * e.a], xy[2 * e.b + 1] - xy[2 * e.a + 1]);
    const same = (s: number, t: number) => Math.abs(s - t) * L <= 8 * tol;
    // The mirror image runs a'→b' with sweep −s and the pieces swapped side for side.
    const found = (byPair.get(a < bb ? `${a},${bb}` : `${bb},${a}`) ?? []).some((k) => {
      const f = edges[k];
      if (f.a === a && f.b === bb) return same(f.sweep, -e.sweep) && f.left === e.right && f.right === e.left;
      return same(f.sweep, e.sweep) && f.left === e.left && f.right === e.right;
    });
    if (!found) return false;
  }
  return true;
}

/**
 * The part of each region on the positive side of the given axes (local frame), with vertices
 * that the boolean left within `snap` of an axis put exactly on it.
 */
export function cutToPositiveSide(regions: readonly Region[], axes: readonly Axis[], size: number, snap: number): Region[] {
  const big = 4 * size;
  const x0 = axes.includes('x') ? 0 : -big, y0 = axes.includes('y') ? 0 : -big;
  const keep: Region = [
    polygonContour([
      [x0, y0],
      [big, y0],
      [big, big],
      [x0, big],
    ]),
  ];
  return regions.map((r) =>
    booleanRegions(r, [keep], 'intersection').map((c) => {
      const xy = Float64Array.from(c.xy);
      for (let i = 0; i < xy.length; i += 2) {
        if (axes.includes('x') && Math.abs(xy[i]) <= snap) xy[i] = 0;
        if (axes.includes('y') && Math.abs(xy[i + 1]) <= snap) xy[i + 1] = 0;
      }
      return { xy, bulge: c.bulge };
    }),
  );
}

/** Regions moved into the local frame (world − origin). */
export function toLocal(regions: readonly Region[], ox: number, oy: number): Region[] {
  return regions.map((r) => r.map((c) => transformContour(c, 1, 0, 0, 1, -ox, -oy)));
}

/** Flag the straight edges lying on a mirror axis as cuts. */
export function flagCuts(b: ExactBoundary, axes: readonly Axis[]): void {
  const { xy } = b;
  for (const e of b.edges) {
    if (e.sweep !== 0) continue;
    const onX = axes.includes('x') && xy[2 * e.a] === 0 && xy[2 * e.b] === 0;
    const onY = axes.includes('y') && xy[2 * e.a + 1] === 0 && xy[2 * e.b + 1] === 0;
    if (onX || onY) e.cut = true;
  }
}

/**
 * The mesh and its mirror image joined along the axis: points on the axis are shared, triangles
 * are mirrored with their order reversed (to stay counter-clockwise), boundary chords are mirrored
 * onto mirrored copies of their exact edges, and the cut chords on this axis disappear (cuts on
 * the other axis stay, for its own mirror). `cut` flags the cut exact edges; the result carries
 * the flags of the doubled edge list.
 */
export function mirrorMesh(m: LinearMesh, axis: Axis, cut: Uint8Array): { mesh: LinearMesh; cut: Uint8Array } {
  const n = m.x.length;
  const onAxis = (i: number) => (axis === 'x' ? m.x[i] === 0 : m.y[i] === 0);
  const image = new Int32Array(n);
  let count = n;
  for (let i = 0; i < n; i++) image[i] = onAxis(i) ? i : count++;
  const x = new Float64Array(count), y = new Float64Array(count);
  x.set(m.x);
  y.set(m.y);
  for (let i = 0; i < n; i++) {
    if (image[i] === i) continue;
    x[image[i]] = axis === 'x' ? -m.x[i] : m.x[i];
    y[image[i]] = axis === 'y' ? -m.y[i] : m.y[i];
  }
  const nt = m.tri.length / 3;
  const tri = new Uint32Array(6 * nt);
  tri.set(m.tri);
  for (let t = 0; t < nt; t++) {
    tri[3 * (nt + t)] = image[m.tri[3 * t]];
    tri[3 * (nt + t) + 1] = image[m.tri[3 * t + 2]];
    tri[3 * (nt + t) + 2] = image[m.tri[3 * t + 1]];
  }
  const piece = new Int32Array(2 * nt);
  piece.set(m.piece);
  piece.set(m.piece, nt);
  const ns = m.shapes.length;
  const shapes: EdgeShape[] = [...m.shapes, ...m.shapes.map((g) => mirrorShape(g, axis))];
  const keep: number[] = [];
  for (let i = 0; i < m.chordA.length; i++) if (!(cut[m.chordEdge[i]] && onAxis(m.chordA[i]) && onAxis(m.chordB[i]))) keep.push(i);
  const nc = keep.length;
  const chordA = new Int32Array(2 * nc), chordB = new Int32Array(2 * nc), chordEdge = new Int32Array(2 * nc);
  const chordT0 = new Float64Array(2 * nc), chordT1 = new Float64Array(2 * nc);
  keep.forEach((i, k) => {
    for (const [j, a, b, edge] of [
      [k, m.chordA[i], m.chordB[i], m.chordEdge[i]],
      [nc + k, image[m.chordA[i]], image[m.chordB[i]], ns + m.chordEdge[i]],
    ]) {
      chordA[j] = a;
      chordB[j] = b;
      chordEdge[j] = edge;
      chordT0[j] = m.chordT0[i];
      chordT1[j] = m.chordT1[i];
    }
  });
  const cut2 = new Uint8Array(2 * ns);
  cut2.set(cut);
  cut2.set(cut, ns);
  return { mesh: { x, y, tri, piece, chordA, chordB, chordEdge, chordT0, chordT1, shapes, warnings: m.warnings }, cut: cut2 };
}

/** The mirror image of an exact edge: same parameter, negated sweep. */
function mirrorShape(g: EdgeShape, axis: Axis): EdgeShape {
  return axis === 'x'
    ? { ax: -g.ax, ay: g.ay, bx: -g.bx, by: g.by, sweep: -g.sweep }
    : { ax: g.ax, ay: -g.ay, bx: g.bx, by: -g.by, sweep: -g.sweep };
}

/**
 * The mirror partner of every node of a mesh built from a mirrored mesh (its coordinates are
 * exact negations, so they match exactly), or null if some node has none.
 */
export function nodeMirror(m: QuadMesh, axis: Axis): Int32Array | null {
  const n = m.x.length;
  const at = new Map<string, number>();
  for (let i = 0; i < n; i++) at.set(`${m.x[i]},${m.y[i]}`, i);
  const out = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const j = axis === 'x' ? at.get(`${-m.x[i]},${m.y[i]}`) : at.get(`${m.x[i]},${-m.y[i]}`);
    if (j === undefined) return null;
    out[i] = j;
  }
  return out;
}
