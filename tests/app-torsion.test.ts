/**
 * Live torsion in the editor (app/torsion/live.ts), without a browser: the run follows the
 * document, the last result stays and is marked stale while the section changes, a run the
 * document left behind is cancelled, the user's cancel pauses runs, and the report gets a result
 * for the section it prints. The numbers are checked against closed forms, each named beside its
 * check; the behaviour checks are the editor's own rules (no outside source).
 */
import { describe, expect, it } from 'vitest';
import { buildRegistry } from '../app/command-table';
import type { CommandContext } from '../app/commands/registry';
import { createLiveResults } from '../app/store/evaluation';
import { commit, undo } from '../app/store/history';
import { createEditorStore } from '../app/store/store';
import { createLiveTorsion, type TorsionView } from '../app/torsion/live';
import { renderReportHtml } from '../src/report';
import { parseDocument, type SectionDocument, type Shape } from '../src';

const registry = buildRegistry();

function setup(shapes: Shape[], extra: Partial<SectionDocument> = {}) {
  const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes, ...extra };
  const store = createEditorStore(doc);
  const results = createLiveResults(store, { worker: false });
  const torsion = createLiveTorsion(store, results, { worker: false, quietMs: 20 });
  const ctx: CommandContext = { store, evaluate: results.evaluate, shapesOf: results.shapesOf, torsion };
  const view = () => torsion.view.getState();
  const dispose = () => {
    torsion.dispose();
    results.dispose();
  };
  return { store, results, torsion, ctx, view, dispose, run: (name: string, arg?: unknown) => registry.dispatch(ctx, name, arg) };
}

async function until(pred: () => boolean, what: string, ms = 20000): Promise<void> {
  const t0 = Date.now();
  while (!pred()) {
    if (Date.now() - t0 > ms) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 5));
  }
}

const done = (v: TorsionView) => v.status === 'done' && !!v.shown?.torsion.ok;
const J = (v: TorsionView) => (v.shown?.torsion.ok ? v.shown.torsion.result.J : NaN);

/** Timoshenko & Goodier §109: J = (b t³/3)[1 − (192/π⁵)(t/b) Σ_{n odd} tanh(nπb/2t)/n⁵], b ≥ t. */
function rectangleJ(b: number, t: number): number {
  let sum = 0;
  for (let n = 1; n < 400; n += 2) sum += Math.tanh((n * Math.PI * b) / (2 * t)) / n ** 5;
  return ((b * t ** 3) / 3) * (1 - ((192 / Math.PI ** 5) * t * sum) / b);
}

const tube = (R: number, t: number, at: [number, number] = [0, 0]): Shape => ({ id: 'tube', type: 'round-tube', at, outerDiameter: 2 * R, wall: t }) as Shape;
const rect = (id: string, x: number, y: number, w: number, h: number): Shape => ({ id, type: 'rectangle', at: [x, y], width: w, height: h }) as Shape;

describe('live torsion follows the document', () => {
  it('is off until the document includes it, then runs: a round tube gives J = π(R⁴ − r⁴)/2', async () => {
    const e = setup([tube(50, 5)]);
    try {
      await new Promise((r) => setTimeout(r, 60));
      expect(e.view().status).toBe('off');
      expect(e.view().shown).toBeNull();
      e.run('torsion.include');
      expect(e.store.getState().doc.torsion).toEqual({ density: 'normal' });
      await until(() => done(e.view()), 'the first result');
      // Roark, Formulas for Stress and Strain, Table 10.1 (hollow concentric circle, from memory): J = π(R⁴ − r⁴)/2.
      const exact = (Math.PI * (50 ** 4 - 45 ** 4)) / 2;
      expect(Math.abs(J(e.view()) - exact) / exact).toBeLessThan(0.005);
      expect(e.view().stale).toBe(false);
      // Leaving it out is one undoable step; undo brings it back.
      e.run('torsion.include');
      expect(e.store.getState().doc.torsion).toBeUndefined();
      expect(e.view().status).toBe('off');
      undo(e.store);
      await until(() => done(e.view()), 'the result after undo');
    } finally {
      e.dispose();
    }
  });

  it('keeps the last result, marked stale, while the section changes; then replaces it', async () => {
    const e = setup([rect('a', 0, 0, 40, 10)], { torsion: { density: 'coarse' } });
    try {
      await until(() => done(e.view()), 'the first result');
      const first = e.view().shown;
      const finished = e.view().finished;
      // A drag: the section changes every few milliseconds, never still for the quiet time.
      for (let k = 1; k <= 8; k++) {
        const doc = e.store.getState().doc;
        e.store.setState({ doc: { ...doc, shapes: [rect('a', 0, 0, 40 + k, 10)] } });
        expect(e.view().stale).toBe(true);
        expect(e.view().shown).toBe(first);
        await new Promise((r) => setTimeout(r, 5));
      }
      await until(() => done(e.view()) && !e.view().stale, 'the result for the moved section');
      // Timoshenko & Goodier, Theory of Elasticity, §109: the series for a 48 × 10 rectangle.
      expect(Math.abs(J(e.view()) - rectangleJ(48, 10)) / rectangleJ(48, 10)).toBeLessThan(0.005);
      // No run was finished for the sections the drag passed through.
      expect(e.view().finished).toBe(finished + 1);
    } finally {
      e.dispose();
    }
  });

  it('cancels a run the document leaves behind: only the current section gets a result', async () => {
    const e = setup([tube(50, 2)], { torsion: { density: 'fine' } });
    try {
      await until(() => e.view().status === 'running' && e.view().progress > 0, 'a run under way');
      commit(e.store, { ...e.store.getState().doc, torsion: { density: 'coarse' } });
      await until(() => done(e.view()), 'the result');
      // The fine run never finished: the one result is the coarse one.
      expect(e.view().finished).toBe(1);
      expect(e.view().shown!.torsion.ok && e.view().shown!.torsion.settings.density).toBe('coarse');
    } finally {
      e.dispose();
    }
  });

  it('the user cancel pauses automatic runs until Compute', async () => {
    const e = setup([tube(50, 2)], { torsion: { density: 'fine' } });
    try {
      await until(() => e.view().status === 'running', 'a run');
      const finished = e.view().finished;
      e.run('torsion.cancel');
      expect(e.view().status).toBe('paused');
      // Editing while paused starts nothing.
      commit(e.store, { ...e.store.getState().doc, shapes: [tube(50, 3)] });
      await new Promise((r) => setTimeout(r, 200));
      expect(e.view().status).toBe('paused');
      expect(e.view().finished).toBe(finished);
      // Compute resumes.
      e.run('torsion.compute');
      await until(() => done(e.view()), 'the run after compute');
      const exact = (Math.PI * (50 ** 4 - 47 ** 4)) / 2; // Roark Table 10.1, hollow circle (from memory)
      expect(Math.abs(J(e.view()) - exact) / exact).toBeLessThan(0.005);
    } finally {
      e.dispose();
    }
  });

  it('says why when the section cannot be analysed, and recovers', async () => {
    const e = setup([], { torsion: {} });
    try {
      await until(() => e.view().finished === 1, 'the refusal');
      const shown = e.view().shown!;
      expect(shown.torsion.ok).toBe(false);
      if (!shown.torsion.ok) expect(shown.torsion.message).toMatch(/no area/);
      commit(e.store, { ...e.store.getState().doc, shapes: [rect('a', 0, 0, 20, 20)] });
      await until(() => done(e.view()), 'a result');
      // Timoshenko & Goodier §109, square: J = 0.1406 a⁴ (β for b/t = 1).
      expect(Math.abs(J(e.view()) / 20 ** 4 - 0.1406) / 0.1406).toBeLessThan(0.005);
    } finally {
      e.dispose();
    }
  });

  it('hands the report a result for the section it prints, run on demand when none is current', async () => {
    const e = setup([rect('a', 0, 0, 60, 6), rect('b', 0, 6, 6, 54)]);
    try {
      expect(await e.torsion.forReport(e.store.getState().doc)).toBeNull();
      commit(e.store, { ...e.store.getState().doc, torsion: { density: 'coarse', poisson: 0.25 } });
      const t = await e.torsion.forReport(e.store.getState().doc);
      expect(t?.ok).toBe(true);
      if (!t?.ok) return;
      expect(t.settings).toEqual({ density: 'coarse', poisson: 0.25, poissonFrom: 'setting' });
      const doc = e.store.getState().doc;
      const html = renderReportHtml({ doc, evaluation: e.results.evaluate(doc), torsion: t });
      expect(html).toContain('data-torsion="ok"');
      expect(html).toContain('data-density="coarse"');
      expect(html).toContain('data-prop="torsion.J"');
      expect(html).toContain('S = shear centre');
      expect(html).toContain('class="shear-centre"');
    } finally {
      e.dispose();
    }
  });
});

describe('torsion settings in the document', () => {
  const base = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
  it('reads valid settings and refuses bad ones with their paths', () => {
    const ok = parseDocument(JSON.stringify({ ...base, torsion: { density: 'fine', poisson: 0.25 } }));
    expect(ok.ok && ok.doc.torsion).toEqual({ density: 'fine', poisson: 0.25 });
    const bad = parseDocument(JSON.stringify({ ...base, torsion: { density: 'medium', poisson: 0.6, mesh: 3 } }));
    expect(bad.ok).toBe(false);
    if (bad.ok) return;
    const paths = bad.errors.map((i) => i.path).sort();
    expect(paths).toEqual(['torsion.density', 'torsion.mesh', 'torsion.poisson']);
    const notObject = parseDocument(JSON.stringify({ ...base, torsion: true }));
    expect(!notObject.ok && notObject.errors[0].path).toBe('torsion');
  });
  it('sets density and Poisson’s ratio as undoable steps, refusing a ratio outside [0, 0.5)', () => {
    const e = setup([], { torsion: {} });
    try {
      e.run('torsion.density', 'fine');
      e.run('torsion.density', 'medium');
      expect(e.store.getState().doc.torsion).toEqual({ density: 'fine' });
      e.run('torsion.poisson', 0.7);
      expect(e.store.getState().doc.torsion?.poisson).toBeUndefined();
      e.run('torsion.poisson', 0.2);
      expect(e.store.getState().doc.torsion).toEqual({ density: 'fine', poisson: 0.2 });
      undo(e.store);
      expect(e.store.getState().doc.torsion).toEqual({ density: 'fine' });
    } finally {
      e.dispose();
    }
  });
});

describe('the stress map picture', () => {
  it('covers every pixel of a meshed square once, with no cracks along shared edges, and interpolates |τ|', async () => {
    const { rasteriseStress } = await import('../app/paint/stress-map');
    const { rampColour } = await import('../app/paint/stress-ramp');
    // A 10 × 10 square (world units) as two triangles, |τ| rising from 0 on the left to the peak on the right.
    const stress = {
      xy: new Float64Array([0, 0, 10, 0, 10, 10, 0, 10]),
      triangles: new Uint32Array([0, 1, 2, 0, 2, 3]),
      magnitude: new Float64Array([0, 2, 2, 0]),
      max: 2,
      at: { x: 10, y: 0 },
    };
    const W = 20, H = 20;
    const px = new Uint32Array(W * H);
    // 1 px per unit, world origin at screen (5, 15): the square covers screen x 5–15, y 5–15.
    rasteriseStress(px, W, H, stress, { scale: 1, ox: 5, oy: 15 }, 1);
    let inside = 0;
    for (let y = 0; y < H; y++)
      for (let x = 0; x < W; x++) {
        const covered = x >= 5 && x < 15 && y >= 5 && y < 15;
        expect(px[y * W + x] !== 0, `pixel ${x}, ${y}`).toBe(covered);
        if (covered) inside++;
      }
    expect(inside).toBe(100);
    // Left column pale, right column dark: the colours of the ramp at 1/20 and 19/20 of the peak.
    const rgba = (w: number) => [w & 255, (w >>> 8) & 255, (w >>> 16) & 255];
    const near = (a: number[], b: number[]) => a.every((v, k) => Math.abs(v - b[k]) <= 3);
    expect(near(rgba(px[10 * W + 5]), rampColour(0.05))).toBe(true);
    expect(near(rgba(px[10 * W + 14]), rampColour(0.95))).toBe(true);
  });
});
