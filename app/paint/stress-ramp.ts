/**
 * The colour ramp of the torsion stress map: pale at no stress, through teal and ochre to a deep
 * red at the peak, so the eye finds the highly stressed parts first and the ramp still reads in
 * grey. The canvas map and its legend both take their colours from here.
 */

/** Stops: position 0–1 and RGB. */
export const STRESS_RAMP: readonly (readonly [number, number, number, number])[] = [
  [0, 238, 242, 238],
  [0.2, 160, 204, 203],
  [0.45, 232, 210, 110],
  [0.7, 222, 128, 60],
  [1, 150, 30, 45],
];

/** The ramp's colour at t (0–1, clamped) as [r, g, b]. */
export function rampColour(t: number): [number, number, number] {
  const x = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0));
  for (let k = 1; k < STRESS_RAMP.length; k++) {
    const [p1, r1, g1, b1] = STRESS_RAMP[k];
    if (x <= p1) {
      const [p0, r0, g0, b0] = STRESS_RAMP[k - 1];
      const f = (x - p0) / (p1 - p0);
      return [Math.round(r0 + f * (r1 - r0)), Math.round(g0 + f * (g1 - g0)), Math.round(b0 + f * (b1 - b0))];
    }
  }
  const [, r, g, b] = STRESS_RAMP[STRESS_RAMP.length - 1];
  return [r, g, b];
}

/** A CSS linear gradient of the ramp, left (0) to right (peak). */
export function rampGradientCss(): string {
  return `linear-gradient(to right, ${STRESS_RAMP.map(([p, r, g, b]) => `rgb(${r}, ${g}, ${b}) ${Math.round(p * 100)}%`).join(', ')})`;
}
