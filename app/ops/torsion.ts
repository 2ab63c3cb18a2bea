/**
 * Torsion as part of the document's results: include it (with the default settings), leave it
 * out, and change its mesh density or Poisson's ratio. Each is one undoable step; the live torsion
 * (app/torsion/live.ts) follows the document.
 */
import { poissonIssue } from '../../src/document/torsion-settings';
import { TORSION_DENSITIES, type TorsionDensitySetting, type TorsionSettings } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';

export function hasTorsion(ctx: CommandContext): boolean {
  return !!ctx.store.getState().doc.torsion;
}

/** Include torsion in the results (normal density; ν from the reference material or 0.3), or leave it out. */
export function toggleTorsion(ctx: CommandContext): void {
  const doc = ctx.store.getState().doc;
  if (doc.torsion) {
    const { torsion: _off, ...rest } = doc;
    void _off;
    commit(ctx.store, rest);
  } else commit(ctx.store, { ...doc, torsion: { density: 'normal' } });
}

function setSetting(ctx: CommandContext, patch: TorsionSettings): void {
  const doc = ctx.store.getState().doc;
  const next = { ...(doc.torsion ?? {}), ...patch };
  if (next.density === doc.torsion?.density && next.poisson === doc.torsion?.poisson) return;
  commit(ctx.store, { ...doc, torsion: next });
}

export function setTorsionDensity(ctx: CommandContext, d: unknown): void {
  if ((TORSION_DENSITIES as readonly unknown[]).includes(d)) setSetting(ctx, { density: d as TorsionDensitySetting });
}

/** Set Poisson's ratio for the shear centre; returns the reason when the value is refused. */
export function setTorsionPoisson(ctx: CommandContext, v: unknown): string | null {
  const problem = poissonIssue(v);
  if (problem) return problem;
  setSetting(ctx, { poisson: v as number });
  return null;
}
