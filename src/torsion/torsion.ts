/**
 * Torsion constant, shear centre and warping constant of a section by finite elements.
 *
 * The whole job, in order (each step in its own file):
 * 1. mesh the exact outline of every piece for quality (mesh-section.ts);
 * 2. make it a quadratic mesh with curved sides on arcs, number its nodes (quad-mesh.ts,
 *    ordering.ts), and solve the warping function (warping.ts);
 * 3. split every element into four (half the element size) and solve again, starting from the
 *    first solution;
 * 4. from the finer solution: J, the centre of twist, the shear centre and Cw (shear-centre.ts),
 *    the stress map (stress-map.ts); from the two: the convergence estimate (convergence.ts).
 *
 * Mixed materials: each piece has its own shear modulus G; the formulation is G-weighted and J,
 * Cw are returned relative to a reference modulus G_ref (J_eff = Σ∫(G/G_ref)(…) dA), so that the
 * torsional stiffness is G_ref·J. Poisson's ratio is one value for the whole section.
 */
import type { Region } from '../geometry/contour';
import { centres } from './shear-centre';
import { convergence, expectedOrder, largestCornerAngle, type Convergence } from './convergence';
import { TorsionError } from './errors';
import { meshSection, type TorsionDensity } from './mesh-section';
import { reverseCuthillMcKee, splitOrdering } from './ordering';
import { runAsync, runSync, stage, type RunHooks, type Step } from './progress';
import { elementCount, prolong, quadraticMesh, renumberNodes, renumberProlongation, splitUniformly, type QuadMesh } from './quad-mesh';
import { elementPattern } from './sparse';
import { unitTorqueStress } from './stress-map';
import { nodeMirror, type Axis } from './symmetry';
import { solveWarping, type WarpingSolution } from './warping';

export interface TorsionPiece {
  /** Exact outline: outer loops counter-clockwise, holes clockwise. */
  region: Region;
  /** Shear modulus of the piece's material (any consistent unit; only ratios matter). */
  G: number;
}

export interface TorsionOptions extends RunHooks {
  /** Mesh density (default 'normal'). The finer of the two meshes has half this element size. */
  density?: TorsionDensity;
  /** Poisson's ratio for the elastic shear centre (default 0.3). */
  poisson?: number;
  /** Shear modulus J and Cw are relative to (default: the first piece's G). */
  referenceG?: number;
}

export interface TorsionResult {
  /** Torsion constant (length⁴), G-weighted relative to referenceG: torsional stiffness = referenceG·J. */
  J: number;
  /** Elastic shear centre (with Poisson's ratio), in the section's coordinates. */
  shearCentre: { x: number; y: number };
  /** Centre of twist (the shear centre for Poisson's ratio 0; the pole of Cw). */
  centreOfTwist: { x: number; y: number };
  /** Warping constant (length⁶) about the centre of twist, weighted relative to referenceG. */
  Cw: number;
  /** G-weighted centroid of the meshed section (for drawing the shear-centre offset). */
  centroid: { x: number; y: number };
  referenceG: number;
  poisson: number;
  density: TorsionDensity;
  convergence: Convergence;
  mesh: {
    /** The finer mesh, on which the results are computed. */
    nodes: number;
    elements: number;
    /** The coarser mesh (twice the element size). */
    coarseNodes: number;
    coarseElements: number;
    /** Shortest and longest element side on the finer mesh (straight distance between vertices). */
    minSide: number;
    maxSide: number;
  };
  /** Shear stress under a unit torque on the finer mesh, ready to draw. */
  stress: {
    /** Node coordinates, interleaved x, y, in the section's coordinates. */
    xy: Float64Array;
    /** Straight triangles over the nodes (node ids, three per triangle). */
    triangles: Uint32Array;
    /** |τ| per node for T = 1 (1/length³): multiply by the torque for stresses. */
    magnitude: Float64Array;
    max: number;
    at: { x: number; y: number };
  };
  solver: { coarseIterations: number; fineIterations: number; residual: number };
  /** Conditions of this geometry that deserve a caution beside the results. */
  cautions: string[];
}

/**
 * Relative residuals the solves must reach. J is taken in a stationary form whose error is the
 * square of the solver's, so the coarse solve (used for the convergence estimate and as the fine
 * solve's start) needs less; the shear centre and Cw of the fine solve are linear in its error.
 */
const COARSE_TOL = 1e-7;
const FINE_TOL = 1e-9;

export function computeTorsion(pieces: readonly TorsionPiece[], options: TorsionOptions = {}): TorsionResult {
  return runSync(torsionSteps(pieces, options), options);
}

/** As computeTorsion, but gives the event loop a turn every few milliseconds (for a worker's cancel message). */
export function computeTorsionAsync(pieces: readonly TorsionPiece[], options: TorsionOptions = {}): Promise<TorsionResult> {
  return runAsync(torsionSteps(pieces, options), options);
}

/** One material: the region's own J, shear centre and Cw. */
export function computeRegionTorsion(region: Region, options: TorsionOptions = {}): TorsionResult {
  return computeTorsion([{ region, G: 1 }], options);
}

interface Checked {
  g: Float64Array;
  Gref: number;
  nu: number;
  density: TorsionDensity;
}

function checkInput(pieces: readonly TorsionPiece[], o: TorsionOptions): Checked {
  if (!Array.isArray(pieces) || pieces.length === 0) throw new TorsionError('no pieces to analyse: give at least one { region, G }');
  pieces.forEach((p, k) => {
    if (!p || typeof p !== 'object') throw new TorsionError(`pieces[${k}] must be an object { region, G }`);
    if (!(typeof p.G === 'number' && Number.isFinite(p.G) && p.G > 0)) throw new TorsionError(`pieces[${k}].G must be a positive shear modulus (got ${String(p.G)})`);
  });
  const nu = o.poisson ?? 0.3;
  if (!(typeof nu === 'number' && nu > -1 && nu < 0.5)) throw new TorsionError(`Poisson's ratio must lie between −1 and 0.5 (got ${String(nu)})`);
  const Gref = o.referenceG ?? pieces[0].G;
  if (!(typeof Gref === 'number' && Number.isFinite(Gref) && Gref > 0)) throw new TorsionError(`the reference shear modulus must be positive (got ${String(Gref)})`);
  const density = o.density ?? 'normal';
  if (density !== 'coarse' && density !== 'normal' && density !== 'fine') throw new TorsionError(`density must be 'coarse', 'normal' or 'fine' (got ${String(density)})`);
  return { g: Float64Array.from(pieces, (p) => p.G / Gref), Gref, nu, density };
}

/** The node-ordered quadratic mesh and its connected parts. */
function ordered(m: QuadMesh) {
  const ord = reverseCuthillMcKee(elementPattern(m.x.length, m.elem, 6));
  const { mesh } = renumberNodes(m, ord.order);
  return { mesh, order: ord.order, part: ord.part, parts: ord.parts };
}

/** The split mesh ordered after its parent. */
function orderedSplit(m: QuadMesh, parentCount: number, parentPart: Int32Array, parts: number) {
  const ord = splitOrdering(m.elem, m.x.length, parentCount, parentPart, parts);
  const { mesh } = renumberNodes(m, ord.order);
  return { mesh, order: ord.order, part: ord.part, parts: ord.parts };
}

export function* torsionSteps(pieces: readonly TorsionPiece[], options: TorsionOptions = {}): Generator<Step, TorsionResult> {
  const { g, Gref, nu, density } = checkInput(pieces, options);
  const { mesh: lin, boundary, axes } = yield* stage(
    meshSection(
      pieces.map((p) => p.region),
      density,
    ),
    'mesh',
    0,
    0.2,
  );
  const coarse = ordered(quadraticMesh(lin));
  const solC = yield* stage(
    solveWarping(coarse.mesh, g, coarse.part, coarse.parts, { tol: COARSE_TOL, start: null, mirrors: mirrorsOf(coarse.mesh, axes) }),
    'solve-coarse',
    0.2,
    0.45,
  );
  const centC = centres(coarse.mesh, g, coarse.part, coarse.parts, solC, nu);

  yield { fraction: 0.45, stage: 'refine' };
  const split = splitUniformly(coarse.mesh);
  const fine = orderedSplit(split.mesh, coarse.mesh.x.length, coarse.part, coarse.parts);
  const prolongation = renumberProlongation(split.prolongation, fine.order);
  const start = prolong(prolongation, coarse.mesh, solC.omega);
  const solF = yield* stage(
    solveWarping(fine.mesh, g, fine.part, fine.parts, { tol: FINE_TOL, start, mirrors: mirrorsOf(fine.mesh, axes) }),
    'solve-fine',
    0.47,
    0.97,
  );
  const centF = centres(fine.mesh, g, fine.part, fine.parts, solF, nu);
  yield { fraction: 0.97, stage: 'results' };

  const ox = boundary.originX, oy = boundary.originY;
  const stress = unitTorqueStress(fine.mesh, g, solF.omega, solF.J, solF.section.cx, solF.section.cy);
  const xy = new Float64Array(2 * fine.mesh.x.length);
  for (let i = 0; i < fine.mesh.x.length; i++) {
    xy[2 * i] = fine.mesh.x[i] + ox;
    xy[2 * i + 1] = fine.mesh.y[i] + oy;
  }
  const corner = largestCornerAngle(boundary);
  const order = expectedOrder(corner);
  const shift = Math.hypot(centF.shearX - centC.shearX, centF.shearY - centC.shearY);
  const conv = convergence(solC.J, solF.J, centC.Cw, centF.Cw, shift, boundary.size, order);
  const sides = sideRange(fine.mesh);
  yield { fraction: 1, stage: 'results' };
  return {
    J: solF.J,
    shearCentre: { x: centF.shearX + ox, y: centF.shearY + oy },
    centreOfTwist: { x: centF.twistX + ox, y: centF.twistY + oy },
    Cw: centF.Cw,
    centroid: { x: solF.section.cx + ox, y: solF.section.cy + oy },
    referenceG: Gref,
    poisson: nu,
    density,
    convergence: conv,
    mesh: {
      nodes: fine.mesh.x.length,
      elements: elementCount(fine.mesh),
      coarseNodes: coarse.mesh.x.length,
      coarseElements: elementCount(coarse.mesh),
      minSide: sides.min,
      maxSide: sides.max,
    },
    stress: {
      xy,
      triangles: stress.triangles,
      magnitude: stress.magnitude,
      max: stress.max,
      at: { x: xy[2 * stress.maxNode], y: xy[2 * stress.maxNode + 1] },
    },
    solver: { coarseIterations: solC.solve.iterations, fineIterations: solF.solve.iterations, residual: solF.solve.residual },
    cautions: cautionsFor(fine.parts, corner > Math.PI + 1e-3, conv, lin.warnings, coarse.mesh.straightened + fine.mesh.straightened, new Set(pieces.map((p) => p.G)).size, solF),
  };
}

/** Node mirror maps of a mesh built symmetric about `axes` (none if a node has no partner). */
function mirrorsOf(m: QuadMesh, axes: readonly Axis[]): Int32Array[] {
  const maps = axes.map((a) => nodeMirror(m, a));
  return maps.every((x) => x !== null) ? (maps as Int32Array[]) : [];
}

function sideRange(m: QuadMesh): { min: number; max: number } {
  let min = Infinity, max = 0;
  const ne = elementCount(m);
  for (let e = 0; e < ne; e++)
    for (let s = 0; s < 3; s++) {
      const p = m.elem[6 * e + s], q = m.elem[6 * e + ((s + 1) % 3)];
      const d = Math.hypot(m.x[q] - m.x[p], m.y[q] - m.y[p]);
      if (d < min) min = d;
      if (d > max) max = d;
    }
  return { min, max };
}

function cautionsFor(parts: number, reentrant: boolean, conv: Convergence, meshWarnings: string[], straightened: number, materials: number, sol: WarpingSolution): string[] {
  const out: string[] = [...meshWarnings];
  if (parts > 1)
    out.push(
      `The section is made of ${parts} separate parts. J is the sum of the parts' own values; the shear centre and Cw assume the parts are held together in the plane but warp independently. Check how the parts are actually connected.`,
    );
  if (reentrant)
    out.push(
      'The outline has sharp re-entrant corners: the shear stress there is theoretically unbounded, so the peak on the stress map depends on the mesh. Real corners have a radius; model it to read the corner stress.',
    );
  if (conv.estimatedError > 0.01) out.push(`J may still be ${(100 * conv.estimatedError).toPrecision(2)} % off (estimated from two meshes); use a finer density.`);
  if (straightened > 0) out.push(`${straightened} elements along arcs kept straight sides (a curved side would have turned them inside out); the arc is approximated by chords there.`);
  if (materials > 1) out.push("Pieces of different materials share one Poisson's ratio here, so the shear centre of the mixed section is approximate.");
  if (!sol.solve.converged) out.push(`The equation solver stopped at a relative residual of ${sol.solve.residual.toExponential(1)}; results may be inaccurate.`);
  return out;
}
