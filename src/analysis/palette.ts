/**
 * Colours for materials and stresses (Kern's own palette), shared by the editor and the report so
 * that a material and a stress have one colour everywhere. A material's fill follows its family
 * when its id or name says which (steel, stainless, aluminium, timber, concrete, glass), so a steel
 * plate on timber reads at a glance; other materials take the next colour of a fixed list by
 * their place in the document's list. Stresses run from compression (blue) through a light grey
 * at zero to tension (red), symmetric about zero.
 */
import type { Material } from '../materials/material';

const FAMILIES: [RegExp, string][] = [
  [/stainless|inox|1\.4\d{3}/i, '#5b8a8f'],
  [/alumin/i, '#9aa9c2'],
  [/steel|s235|s275|s355|s460|iron/i, '#55697d'],
  [/timber|wood|softwood|hardwood|glulam|lvl|\bc\d{2}\b|\bd\d{2}\b|\bgl\d/i, '#c89a55'],
  [/concrete|grout|mortar|\bc\d{2}\/\d{2}/i, '#a3a09a'],
  [/glass/i, '#8fc3c9'],
];

const OTHERS = ['#7d6aa8', '#6f9a5a', '#b4694f', '#4f8bb4', '#a8845f', '#8a5f7d'];

/** The fill colour of a material (an opaque hex colour; painters add their own alpha). */
export function materialColour(m: Pick<Material, 'id' | 'name'>, index: number): string {
  const text = `${m.id} ${m.name}`;
  for (const [re, colour] of FAMILIES) if (re.test(text)) return colour;
  return OTHERS[index % OTHERS.length];
}

/** Colours of every material of a list, by id. */
export function materialColours(materials: readonly Pick<Material, 'id' | 'name'>[] | undefined): Map<string, string> {
  return new Map((materials ?? []).map((m, k) => [m.id, materialColour(m, k)]));
}

/** `#rrggbb` with an alpha, as an rgba() colour. */
export function withAlpha(hex: string, alpha: number): string {
  const n = parseInt(hex.slice(1), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}

const COMPRESSION = [47, 95, 158];
// Zero is a light grey, not the paper colour, so a part with little stress still reads as material.
const ZERO = [218, 217, 210];
const TENSION = [184, 67, 47];

/** The colour of a stress t = σ / peak, t in [−1, 1] (clamped): blue, paper, red. */
export function stressColour(t: number, alpha = 1): string {
  const u = Math.max(-1, Math.min(1, Number.isFinite(t) ? t : 0));
  const end = u < 0 ? COMPRESSION : TENSION;
  const a = Math.abs(u);
  const c = ZERO.map((z, k) => Math.round(z + (end[k] - z) * a));
  return `rgba(${c[0]}, ${c[1]}, ${c[2]}, ${alpha})`;
}

export const STRESS_INK = { tension: '#9c3420', compression: '#254f86', axis: '#1f2a2e', probe: '#6b3fa0', kern: '#1d6b52', gravity: '#8a4b14' } as const;
