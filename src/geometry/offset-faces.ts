/**
 * The faces of a thin wall near one joint of its centreline, and where two faces meet, exactly.
 *
 * At a joint V, a centreline piece has a unit tangent t (direction of travel), the unit left
 * normal n = k × t, and a signed curvature k (1/r, positive for a CCW arc, 0 for a line). Its face
 * at signed offset d (d > 0 on the left) is the line, or the concentric circle of radius |1/k − d|,
 * whose points V + w satisfy
 *     F(w) = k|w|² − 2 w·n + 2d − k d² = 0
 * (expand |w − n/k|² = (1/k − d)² and multiply by k). One equation holds lines and arcs, and it
 * stays well conditioned for very flat arcs, whose centres are far away: no centre is formed.
 *
 * Two faces at the same offset d meet where F1 = F2 = 0. Eliminating |w|² gives the radical line
 *     w·g = d(k2 − k1),  g = k2 n1 − k1 n2;
 * along it, w = w0 + s g⊥, and F = 0 becomes k s² − 2 b s + F(w0) = 0 with b = g⊥·n. The root
 * nearest the joint is s = F(w0) / (b + sign(b)·√(b² − k F(w0))), which is also right for k = 0.
 * Two lines (k1 = k2 = 0) meet at w = d(n1 + n2)/(1 + n1·n2).
 */

/** A centreline piece at a joint: unit tangent, unit left normal, signed curvature. */
export interface JointSide {
  tx: number;
  ty: number;
  nx: number;
  ny: number;
  k: number;
}

/** Where the faces at offset d of two pieces meeting at a joint cross, relative to the joint; null if they do not. */
export function facesMeet(p: JointSide, q: JointSide, d: number): [number, number] | null {
  if (p.k === 0 && q.k === 0) {
    const den = 1 + p.nx * q.nx + p.ny * q.ny;
    if (!(den > 0)) return null;
    return [(d * (p.nx + q.nx)) / den, (d * (p.ny + q.ny)) / den];
  }
  // Radical line, scaled so that its normal has unit length.
  const scale = Math.max(Math.abs(p.k), Math.abs(q.k));
  let gx = (q.k * p.nx - p.k * q.nx) / scale, gy = (q.k * p.ny - p.k * q.ny) / scale;
  let c = (d * (q.k - p.k)) / scale;
  const gl = Math.hypot(gx, gy);
  if (!(gl > 1e-14)) return null;
  gx /= gl;
  gy /= gl;
  c /= gl;
  const w0x = c * gx, w0y = c * gy;
  const px = -gy, py = gx; // along the radical line
  // Substitute into the face that crosses the radical line more steeply (its normal lies more
  // along the line), which is the better conditioned of the two.
  const bp = px * p.nx + py * p.ny, bq = px * q.nx + py * q.ny;
  const f = Math.abs(bp) >= Math.abs(bq) ? p : q;
  const b = f === p ? bp : bq;
  const F0 = f.k * (w0x * w0x + w0y * w0y) - 2 * (w0x * f.nx + w0y * f.ny) + 2 * d - f.k * d * d;
  let disc = b * b - f.k * F0;
  if (disc < 0) {
    if (disc < -1e-12 * b * b) return null;
    disc = 0;
  }
  const den = b + (b >= 0 ? 1 : -1) * Math.sqrt(disc);
  if (den === 0) return null;
  const s = F0 / den;
  const x = w0x + s * px, y = w0y + s * py;
  return Number.isFinite(x) && Number.isFinite(y) ? [x, y] : null;
}

/**
 * How far the point V + w lies along the face at offset d from the face's own point at the joint
 * (V + d n): `ds`, the distance along the face, positive in the direction of travel; and `dphi`,
 * the CCW rotation about the arc's centre (0 for a line), which is what the face's sweep changes by.
 */
export function alongFace(p: JointSide, d: number, wx: number, wy: number): { ds: number; dphi: number } {
  if (p.k === 0) return { ds: wx * p.tx + wy * p.ty, dphi: 0 };
  // k(E − C) = (kd − 1) n and k(P − C) = k w − n: the angle between them is the rotation about C
  // (scaling both by k, even negative, keeps it), computed without the centre.
  const ax = (p.k * d - 1) * p.nx, ay = (p.k * d - 1) * p.ny;
  const bx = p.k * wx - p.nx, by = p.k * wy - p.ny;
  const dphi = Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
  return { ds: (dphi / p.k) * (1 - p.k * d), dphi };
}
