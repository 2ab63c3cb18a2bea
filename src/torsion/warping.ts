/**
 * The Saint-Venant warping function ω on a quadratic mesh, and the integrals the results need.
 *
 * Free torsion at twist rate θ: u = −θzy, v = θzx, w = θω(x, y), so τxz = Gθ(∂ω/∂x − y) and
 * τyz = Gθ(∂ω/∂y + x). Equilibrium gives ∇·(G∇ω) = 0 in the section, and a traction-free
 * boundary gives ∂ω/∂n = y·nx − x·ny (Timoshenko & Goodier, Theory of Elasticity, §104). The weak
 * form needs no boundary integral and holds across pieces of different G unchanged:
 *
 *   ∫ G ∇ω·∇v dA = ∫ G (y, −x)·∇v dA   for every v,
 *
 * (the minimum of the strain energy ½∫G|∇ω − (y, −x)|²). Its finite-element form K ω = f is
 * singular by one constant per connected part; one node per part is held at ω = 0.
 *
 * The torque is T = θ ∫ G (x² + y² + x ∂ω/∂y − y ∂ω/∂x) dA = θ G_ref J. With the weak form
 * this is J = Ip − a(ω, ω), with Ip = ∫ g (x² + y²) dA and g = G/G_ref. The result uses the
 * stationary form J = Ip − (2 fᵀω − ωᵀKω), whose error is of second order in the solver error.
 *
 * Coordinates are taken from the G-weighted centroid of the mesh, where the shear-centre formulas
 * (shear-centre.ts) are written.
 */
import { Multigrid } from './multigrid';
import { conjugateGradients, type SolveReport } from './pcg';
import { ElementGeometry, NQ, QN, SUU, SUV, SVV } from './p2-element';
import { elementCount, linearEmbedding, type QuadMesh } from './quad-mesh';
import { elementPattern, multiply, slot, type CsrMatrix } from './sparse';

/** G-weighted properties of the meshed section, about its G-weighted centroid. */
export interface MeshSection {
  /** ∫ g dA (g = G/G_ref). */
  area: number;
  /** Centroid in the mesh frame. */
  cx: number;
  cy: number;
  Ixx: number;
  Iyy: number;
  Ixy: number;
  /** ∫ g x(x² + y²) dA and ∫ g y(x² + y²) dA. */
  X3: number;
  Y3: number;
  /** For each connected part: ∫ g dA, ∫ g x dA, ∫ g y dA (centroidal x, y). */
  partArea: Float64Array;
  partX: Float64Array;
  partY: Float64Array;
}

export interface WarpingSolution {
  section: MeshSection;
  /** ω at every node (about the centroid; an arbitrary constant per part). */
  omega: Float64Array;
  /** Torsion constant J = ∫ g (…) dA, relative to G_ref. */
  J: number;
  /** Integrals of ω over the section (centroidal x, y, g-weighted). */
  partOmega: Float64Array;
  Xw: number;
  Yw: number;
  /** ∫ g dα·∇ω and ∫ g dβ·∇ω (see shear-centre.ts). */
  Da: number;
  Db: number;
  solve: SolveReport;
  /** Unknowns on each multigrid level, finest first. */
  levels: number[];
}

/**
 * The section's G-weighted area, centroid, second and third moments on the mesh, in one pass:
 * moments about the mesh frame's origin (the bounding-box centre, close to the centroid), then
 * moved to the centroid.
 */
export function meshSectionProperties(m: QuadMesh, g: Float64Array, part: Int32Array, parts: number): MeshSection {
  const ne = elementCount(m);
  const G = new ElementGeometry();
  let A = 0, Sx = 0, Sy = 0, Sxx = 0, Syy = 0, Sxy = 0, Sxxx = 0, Sxxy = 0, Sxyy = 0, Syyy = 0;
  const pa = new Float64Array(parts), px = new Float64Array(parts), py = new Float64Array(parts);
  for (let e = 0; e < ne; e++) {
    G.load(m.x, m.y, m.elem, e, 0, 0);
    const ge = g[m.piece[e]];
    const k = part[m.elem[6 * e]];
    for (let q = 0; q < NQ; q++) {
      const w = ge * G.w[q], x = G.px[q], y = G.py[q];
      A += w;
      Sx += w * x;
      Sy += w * y;
      Sxx += w * x * x;
      Syy += w * y * y;
      Sxy += w * x * y;
      Sxxx += w * x * x * x;
      Sxxy += w * x * x * y;
      Sxyy += w * x * y * y;
      Syyy += w * y * y * y;
      pa[k] += w;
      px[k] += w * x;
      py[k] += w * y;
    }
  }
  const cx = Sx / A, cy = Sy / A;
  // With u = x − cx, v = y − cy: ∫u² = Sxx − A cx², ∫u³ = Sxxx − 3cx Sxx + 2A cx³,
  // ∫u v² = Sxyy − 2cy Sxy − cx Syy + 2A cx cy², and the same with x and y exchanged.
  const Iyy = Sxx - A * cx * cx, Ixx = Syy - A * cy * cy, Ixy = Sxy - A * cx * cy;
  const u3 = Sxxx - 3 * cx * Sxx + 2 * A * cx ** 3, v3 = Syyy - 3 * cy * Syy + 2 * A * cy ** 3;
  const uv2 = Sxyy - 2 * cy * Sxy - cx * Syy + 2 * A * cx * cy * cy;
  const vu2 = Sxxy - 2 * cx * Sxy - cy * Sxx + 2 * A * cy * cx * cx;
  for (let k = 0; k < parts; k++) {
    px[k] -= cx * pa[k];
    py[k] -= cy * pa[k];
  }
  return { area: A, cx, cy, Ixx, Iyy, Ixy, X3: u3 + uv2, Y3: v3 + vu2, partArea: pa, partX: px, partY: py };
}

/**
 * Stiffness K and load f of the warping problem about (cx, cy), and the stiffness of the same
 * problem with linear elements on the vertices, K1 = Pᵀ K P element by element (P the embedding
 * of linear into quadratic elements), which is the multigrid's first coarse level.
 */
export function assembleWarping(m: QuadMesh, g: Float64Array, cx: number, cy: number, vertexId: Int32Array, vertexCount: number) {
  const n = m.x.length;
  const ne = elementCount(m);
  const pattern = elementPattern(n, m.elem, 6);
  const vElem = new Uint32Array(3 * ne);
  for (let e = 0; e < ne; e++) for (let a = 0; a < 3; a++) vElem[3 * e + a] = vertexId[m.elem[6 * e + a]];
  const pattern1 = elementPattern(vertexCount, vElem, 3);
  const val = new Float64Array(pattern.col.length), val1 = new Float64Array(pattern1.col.length);
  const f = new Float64Array(n);
  const ke = new Float64Array(36), fe = new Float64Array(6), kp = new Float64Array(18);
  const G = new ElementGeometry();
  for (let e = 0; e < ne; e++) {
    G.load(m.x, m.y, m.elem, e, cx, cy);
    const ge = g[m.piece[e]];
    fe.fill(0);
    for (let q = 0; q < NQ; q++) {
      const w = ge * G.w[q], x = G.px[q], y = G.py[q];
      for (let a = 0; a < 6; a++) fe[a] += w * (y * G.gx[6 * q + a] - x * G.gy[6 * q + a]);
    }
    if (G.straight) {
      // Closed form: det J (Q11 Suu + Q12 Suv + Q22 Svv), Q = J⁻ᵀJ⁻¹ (p2-element.ts).
      const { j11, j12, j21, j22, det } = G;
      const c = ge / det;
      const q11 = c * (j21 * j21 + j22 * j22), q12 = -c * (j11 * j21 + j12 * j22), q22 = c * (j11 * j11 + j12 * j12);
      for (let a = 0; a < 6; a++) for (let b = a; b < 6; b++) ke[6 * a + b] = q11 * SUU[6 * a + b] + q12 * SUV[6 * a + b] + q22 * SVV[6 * a + b];
    } else {
      ke.fill(0);
      for (let q = 0; q < NQ; q++) {
        const w = ge * G.w[q];
        for (let a = 0; a < 6; a++) {
          const wa = w * G.gx[6 * q + a], wb = w * G.gy[6 * q + a];
          for (let b = a; b < 6; b++) ke[6 * a + b] += wa * G.gx[6 * q + b] + wb * G.gy[6 * q + b];
        }
      }
    }
    for (let a = 0; a < 6; a++) for (let b = 0; b < a; b++) ke[6 * a + b] = ke[6 * b + a];
    for (let a = 0; a < 6; a++) {
      const i = m.elem[6 * e + a];
      f[i] += fe[a];
      for (let b = 0; b < 6; b++) val[slot(pattern, i, m.elem[6 * e + b])] += ke[6 * a + b];
    }
    // K1 = Pᵀ K P with P: vertex c keeps its value, mid-side node 3+s takes half of each end of side s.
    for (let a = 0; a < 6; a++)
      for (let c = 0; c < 3; c++) kp[3 * a + c] = ke[6 * a + c] + 0.5 * (ke[6 * a + 3 + c] + ke[6 * a + 3 + ((c + 2) % 3)]);
    for (let c = 0; c < 3; c++) {
      const i = vElem[3 * e + c];
      for (let d = 0; d < 3; d++) {
        const v = kp[3 * c + d] + 0.5 * (kp[3 * (3 + c) + d] + kp[3 * (3 + ((c + 2) % 3)) + d]);
        val1[slot(pattern1, i, vElem[3 * e + d])] += v;
      }
    }
  }
  return { K: { ...pattern, val } as CsrMatrix, f, K1: { ...pattern1, val: val1 } as CsrMatrix };
}

/** Hold the marked nodes at zero: clear their rows and columns, keep the diagonal, zero the load. */
function holdAtZero(K: CsrMatrix, f: Float64Array | null, held: Uint8Array): void {
  const { n, rowPtr, col, val } = K;
  for (let i = 0; i < n; i++)
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) if ((held[i] || held[col[k]]) && col[k] !== i) val[k] = 0;
  if (f) for (let i = 0; i < n; i++) if (held[i]) f[i] = 0;
}

/**
 * One node per connected part is held at ω = 0: the vertex nearest the part's mean node position,
 * where the warping function is typically small, so that the solution carries no large constant.
 */
function heldNodes(m: QuadMesh, part: Int32Array, parts: number, vertexId: Int32Array): Uint8Array {
  const n = m.x.length;
  const sx = new Float64Array(parts), sy = new Float64Array(parts), cnt = new Float64Array(parts);
  for (let i = 0; i < n; i++) {
    sx[part[i]] += m.x[i];
    sy[part[i]] += m.y[i];
    cnt[part[i]]++;
  }
  const best = new Float64Array(parts).fill(Infinity), which = new Int32Array(parts).fill(-1);
  for (let i = 0; i < n; i++) {
    if (vertexId[i] < 0) continue;
    const k = part[i];
    const d = (m.x[i] - sx[k] / cnt[k]) ** 2 + (m.y[i] - sy[k] / cnt[k]) ** 2;
    if (d < best[k]) {
      best[k] = d;
      which[k] = i;
    }
  }
  const held = new Uint8Array(n);
  for (const i of which) if (i >= 0) held[i] = 1;
  return held;
}

export interface WarpingOptions {
  /** Relative residual the solver must reach. */
  tol: number;
  /** Starting guess (e.g. the coarse solution carried over), or null. */
  start: Float64Array | null;
  /** Mirror partner of each node, one map per mirror axis of an exactly symmetric mesh. */
  mirrors: readonly Int32Array[];
}

export function* solveWarping(
  m: QuadMesh,
  g: Float64Array,
  part: Int32Array,
  parts: number,
  opts: WarpingOptions,
): Generator<number, WarpingSolution> {
  const section = meshSectionProperties(m, g, part, parts);
  const n = m.x.length;
  const { P, vertexId, vertexCount } = linearEmbedding(m);
  const { K, f, K1 } = assembleWarping(m, g, section.cx, section.cy, vertexId, vertexCount);
  const held = heldNodes(m, part, parts, vertexId);
  holdAtZero(K, f, held);
  const held1 = new Uint8Array(vertexCount);
  for (let i = 0; i < n; i++) if (held[i]) held1[vertexId[i]] = 1;
  holdAtZero(K1, null, held1);
  const omega = new Float64Array(n);
  if (opts.start) {
    // The starting guess may carry other constants per part: shift each part to its held node.
    const ref = new Float64Array(parts);
    for (let i = 0; i < n; i++) if (held[i]) ref[part[i]] = opts.start[i];
    for (let i = 0; i < n; i++) omega[i] = held[i] ? 0 : opts.start[i] - ref[part[i]];
  }
  yield 0.02;
  const M = new Multigrid(K, { P, coarse: K1 });
  yield 0.05;
  const report = yield* scaleProgress(conjugateGradients(K, f, omega, M, opts.tol, 20 * n + 100), 0.05, 0.97);
  if (opts.mirrors.length) makeOdd(omega, opts.mirrors, held, part, parts);
  // J in the stationary form Ip − (2 fᵀω − ωᵀKω).
  const Kw = new Float64Array(n);
  multiply(K, omega, Kw);
  let fw = 0, wKw = 0;
  for (let i = 0; i < n; i++) {
    fw += f[i] * omega[i];
    wKw += omega[i] * Kw[i];
  }
  const Ip = section.Ixx + section.Iyy;
  const J = Ip - (2 * fw - wKw);
  const w = warpingIntegrals(m, g, part, parts, section, omega);
  return { section, omega, J, ...w, solve: report, levels: M.sizes };
}

/**
 * On a mirror-symmetric mesh the warping function about a point of the axis is odd under the
 * mirror; the exact discrete solution is too, the iterative one only to the solver tolerance.
 * Keeping its odd part, (ω − ω∘mirror)/2, removes that error (it is the orthogonal projection on
 * a subspace that holds the solution) and makes symmetric results exact to round-off. Each part
 * is then shifted back to zero at its held node, where the system holds it.
 */
function makeOdd(omega: Float64Array, mirrors: readonly Int32Array[], held: Uint8Array, part: Int32Array, parts: number): void {
  const n = omega.length;
  const tmp = new Float64Array(n);
  for (const m of mirrors) {
    for (let i = 0; i < n; i++) tmp[i] = (omega[i] - omega[m[i]]) / 2;
    omega.set(tmp);
  }
  const ref = new Float64Array(parts);
  for (let i = 0; i < n; i++) if (held[i]) ref[part[i]] = omega[i];
  for (let i = 0; i < n; i++) omega[i] -= ref[part[i]];
}

function* scaleProgress<T>(gen: Generator<number, T>, from: number, to: number): Generator<number, T> {
  for (;;) {
    const r = gen.next();
    if (r.done) return r.value;
    yield from + (to - from) * r.value;
  }
}

/** ∫ g ω per part, ∫ g x ω, ∫ g y ω, ∫ g dα·∇ω, ∫ g dβ·∇ω (centroidal x, y). */
function warpingIntegrals(m: QuadMesh, g: Float64Array, part: Int32Array, parts: number, s: MeshSection, omega: Float64Array) {
  const partOmega = new Float64Array(parts);
  let Xw = 0, Yw = 0, Da = 0, Db = 0;
  const ne = elementCount(m);
  const we = new Float64Array(6);
  const G = new ElementGeometry();
  for (let e = 0; e < ne; e++) {
    G.load(m.x, m.y, m.elem, e, s.cx, s.cy);
    for (let a = 0; a < 6; a++) we[a] = omega[m.elem[6 * e + a]];
    const ge = g[m.piece[e]];
    const k = part[m.elem[6 * e]];
    for (let q = 0; q < NQ; q++) {
      const w = ge * G.w[q], x = G.px[q], y = G.py[q];
      let om = 0, ox = 0, oy = 0;
      for (let a = 0; a < 6; a++) {
        om += QN[6 * q + a] * we[a];
        ox += G.gx[6 * q + a] * we[a];
        oy += G.gy[6 * q + a] * we[a];
      }
      partOmega[k] += w * om;
      Xw += w * x * om;
      Yw += w * y * om;
      // dα = ((x² − y²)/2, xy), dβ = (xy, (y² − x²)/2)
      Da += w * (((x * x - y * y) / 2) * ox + x * y * oy);
      Db += w * (x * y * ox + ((y * y - x * x) / 2) * oy);
    }
  }
  return { partOmega, Xw, Yw, Da, Db };
}
