/**
 * Preconditioned conjugate gradients for the symmetric positive definite finite-element system
 * in compressed sparse rows and typed arrays (Saad, Iterative Methods for Sparse Linear Systems,
 * Algorithm 9.1). The preconditioner is the multigrid V-cycle of multigrid.ts. Written here
 * because no allowed library does sparse linear algebra.
 *
 * The solver is a generator: it yields its progress (0–1, from the residual's fall on a log
 * scale) every few iterations, so the caller can report progress and stop it.
 */
import { multiply, type CsrMatrix } from './sparse';

/** A preconditioner: z = M⁻¹ r for a symmetric positive definite M. */
export interface Preconditioner {
  apply(r: Float64Array, z: Float64Array): void;
}

export interface SolveReport {
  iterations: number;
  /** Final ‖b − A x‖ / ‖b‖. */
  residual: number;
  converged: boolean;
}

/** Yield progress every this many iterations. */
const REPORT_EVERY = 16;

/** Solve A x = b in place in x (x holds the starting guess), to ‖b − A x‖ ≤ tol ‖b‖. */
export function* conjugateGradients(
  A: CsrMatrix,
  b: Float64Array,
  x: Float64Array,
  M: Preconditioner,
  tol: number,
  maxIterations: number,
): Generator<number, SolveReport> {
  const n = A.n;
  const r = new Float64Array(n), z = new Float64Array(n), p = new Float64Array(n), q = new Float64Array(n);
  multiply(A, x, q);
  let bnorm = 0;
  for (let i = 0; i < n; i++) {
    r[i] = b[i] - q[i];
    bnorm += b[i] * b[i];
  }
  bnorm = Math.sqrt(bnorm);
  if (bnorm === 0) {
    x.fill(0);
    return { iterations: 0, residual: 0, converged: true };
  }
  const goal = tol * bnorm;
  let rnorm = norm(r);
  const start = rnorm;
  M.apply(r, z);
  p.set(z);
  let rz = dot(r, z);
  let it = 0;
  for (; it < maxIterations && rnorm > goal; it++) {
    multiply(A, p, q);
    const alpha = rz / dot(p, q);
    for (let i = 0; i < n; i++) {
      x[i] += alpha * p[i];
      r[i] -= alpha * q[i];
    }
    rnorm = norm(r);
    if (rnorm <= goal) {
      it++;
      break;
    }
    M.apply(r, z);
    const rzNew = dot(r, z);
    const beta = rzNew / rz;
    rz = rzNew;
    for (let i = 0; i < n; i++) p[i] = z[i] + beta * p[i];
    if (it % REPORT_EVERY === REPORT_EVERY - 1) yield Math.min(1, Math.log(start / rnorm) / Math.log(start / goal));
  }
  return { iterations: it, residual: rnorm / bnorm, converged: rnorm <= goal };
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

function norm(a: Float64Array): number {
  return Math.sqrt(dot(a, a));
}
