/**
 * One load case on a section: the stress field of N, Mx and My (general bending formula on the
 * transformed section, src/materials/stress.ts), its largest tension and compression overall and
 * per material with their places, the neutral axis, the colour-map gradients, and the shear stress
 * VQ/(Ib) of V at a cut line when one is given, with the cautions the numbers call for.
 *
 * Everything here is cheap (a pass over the boundary at most), so the editor recomputes it for
 * every evaluation, during a drag too.
 */
import { stressCautions } from '../materials/cautions';
import { stressExtremes, type StressExtremes } from '../materials/extremes';
import type { MixedSection } from '../materials/mixed';
import { shearAtCut, type ShearResult } from '../materials/shear';
import { neutralAxis, stressField, type Loads, type NeutralAxis, type StressField } from '../materials/stress';
import { stressGradients, type StressGradient } from '../materials/stress-map';
import type { LoadUnits } from '../materials/units';

export interface CutLine {
  /** 'y': a horizontal cut at y = at (V along y); 'x': a vertical cut at x = at (V along x). */
  axis: 'x' | 'y';
  at: number;
}

export interface LoadCase {
  units: LoadUnits;
  /** The loads as given (absent ones as 0). */
  loads: { N: number; Mx: number; My: number; V: number };
  field: StressField;
  extremes: StressExtremes;
  axis: NeutralAxis | null;
  gradients: StressGradient[];
  /** Largest |σ| over the section: the half-range of a colour scale centred on zero. */
  peak: number;
  /** True when N, Mx and My are all zero (no normal stress anywhere). */
  unloaded: boolean;
  /** τ at the cut line, when a cut is given. */
  shear: ShearResult | null;
  cautions: string[];
}

/** True when a load record gives no normal force and no moment. */
export function noNormalLoad(loads: Loads | undefined): boolean {
  return !loads || (!loads.N && !loads.Mx && !loads.My);
}

/**
 * The load case on a section. Throws (Error) for loads that are not finite numbers or a section
 * with no bending stiffness; callers that take typed input check the loads first.
 */
export function analyseLoadCase(section: MixedSection, loads: Loads | undefined, units: LoadUnits, cut?: CutLine | null): LoadCase {
  const l = { N: loads?.N ?? 0, Mx: loads?.Mx ?? 0, My: loads?.My ?? 0, V: loads?.V ?? 0 };
  const field = stressField(section, l, units);
  const extremes = stressExtremes(field);
  const peak = Math.max(extremes.maxTension?.value ?? 0, -(extremes.maxCompression?.value ?? 0));
  const shear = cut && Number.isFinite(cut.at) ? shearAtCut(section, cut.axis, cut.at, l.V, units) : null;
  const cautions = stressCautions(section, field, extremes);
  if (shear && l.V !== 0) {
    // The shear cautions go before the deferral to the code, which stays last.
    const last = cautions.pop()!;
    cautions.push(...shear.cautions, last);
  }
  return {
    units,
    loads: l,
    field,
    extremes,
    axis: neutralAxis(field),
    gradients: stressGradients(field, extremes),
    peak,
    unloaded: l.N === 0 && l.Mx === 0 && l.My === 0,
    shear,
    cautions,
  };
}

/**
 * In words, the side of the neutral axis where the stress is tensile: the direction in which σ/n
 * grows (the gradient (b, c) of the field), named by the nearest of eight directions on the
 * drawing, worded to read before "it" ('above', 'to the left of', 'below and to the right of').
 * Null without bending.
 */
export function tensionSide(lc: Pick<LoadCase, 'field'>): string | null {
  const { b, c } = lc.field;
  if (!(Math.hypot(b, c) > 0)) return null;
  const names = ['to the right of', 'above and to the right of', 'above', 'above and to the left of', 'to the left of', 'below and to the left of', 'below', 'below and to the right of'];
  const k = Math.round(Math.atan2(c, b) / (Math.PI / 4));
  return names[(k + 8) % 8];
}

/** The neutral axis's angle from +x in degrees, in (−90°, 90°]. */
export function axisAngle(direction: { x: number; y: number }): number {
  let deg = (Math.atan2(direction.y, direction.x) * 180) / Math.PI;
  if (deg <= -90) deg += 180;
  if (deg > 90) deg -= 180;
  return deg + 0;
}
