/**
 * One editor instance: the store, the live results, the transient pointer state, the tools and
 * the command context. Nothing here depends on React, so the tests build the same editor.
 */
import { allShapeIds, formatShapeIssue, newShapeId, unitFactor, validateShape, type Point, type SectionDocument, type Shape } from '../src';
import { registry } from './command-table';
import type { CommandContext, FileIO } from './commands/registry';
import type { EditorHandle } from './context';
import { parsePointInput } from './expr';
import { snapPointer } from './geometry/snap';
import { SelectTool } from './select';
import { TOOL_SPECS } from './shapes';
import { commit } from './store/history';
import { createLiveResults } from './store/evaluation';
import { createLiveTorsion } from './torsion/live';
import { createEditorStore } from './store/store';
import { createTransientStore } from './store/transient';
import type { Tool, ToolEnv } from './tools/types';
import { activeShapes, withActiveShapes } from './store/section';
import { ProbeTool } from './materials/probe-tool';
import { NetLineTool } from './tools/net-line';

export type Editor = EditorHandle;

export function createEditor(doc: SectionDocument, opts: { io?: FileIO; schedule?: (cb: () => void) => void; worker?: boolean } = {}): Editor {
  const store = createEditorStore(doc);
  const results = createLiveResults(store, { schedule: opts.schedule, worker: opts.worker });
  const torsion = createLiveTorsion(store, results, { worker: opts.worker });
  const transient = createTransientStore();
  const tools: Record<string, Tool> = { select: new SelectTool() };
  for (const t of TOOL_SPECS) tools[t.id] = t.create();
  tools.probe = new ProbeTool();
  tools.netline = new NetLineTool();
  const env: ToolEnv = {
    store,
    results,
    transient,
    snap(raw: Point, o = {}) {
      const s = store.getState();
      const r = snapPointer(raw, {
        shapes: results.shapesOf(s.doc),
        scale: s.scale,
        settings: s.snap,
        from: o.from,
        exclude: o.exclude,
        extra: o.extra,
        forceOrtho: o.shift,
      });
      transient.setState({ snap: r });
      return r;
    },
    addShape(partial) {
      const s = store.getState();
      const shapes = activeShapes(s.doc);
      const shape = { ...partial, id: partial.id ?? newShapeId(allShapeIds(s.doc)) } as Shape;
      const issues = validateShape(shape, `shapes[${shapes.length}]`);
      if (issues.length) {
        transient.setState({ inputError: `Not added: ${issues.map((i) => formatShapeIssue(i, [...shapes, shape])).join('; ')}` });
        return false;
      }
      commit(store, withActiveShapes(s.doc, [...shapes, shape]), [shape.id]);
      transient.setState({ inputError: null });
      return true;
    },
    message(text) {
      transient.setState({ inputError: text });
    },
  };
  const ctx: CommandContext = { store, evaluate: results.evaluate, shapesOf: results.shapesOf, io: opts.io, torsion };
  const tool = () => tools[store.getState().tool] ?? tools.select;
  const updatePrompt = () => transient.setState({ prompt: tool().prompt(env) });
  updatePrompt();
  // Switching tools abandons the half-finished shape of the previous one.
  const unsub = store.subscribe((s, prev) => {
    if (s.tool !== prev.tool) {
      tools[prev.tool]?.reset(env);
      transient.setState({ inputError: null });
    }
    if (s.doc.units !== prev.doc.units) {
      // Points held by a half-drawn shape are in the old units: start it again.
      tool().reset(env);
      // Keep the picture the same physical size on screen (on a unit switch, its undo and redo).
      const f = unitFactor(prev.doc.units, s.doc.units);
      store.setState({ scale: s.scale / f, cutAt: s.cutAt === null ? null : s.cutAt * f });
    }
    if (s.tool !== prev.tool || s.pathArc !== prev.pathArc || s.profileType !== prev.profileType) updatePrompt();
  });
  const unsubT = transient.subscribe((t, prev) => {
    if (t.draft !== prev.draft) {
      const p = tool().prompt(env);
      if (p !== t.prompt) transient.setState({ prompt: p });
    }
  });
  return {
    store,
    results,
    torsion,
    transient,
    env,
    ctx,
    commands: registry,
    tool,
    run: (name, arg) => registry.dispatch(ctx, name, arg),
    type(text: string) {
      const r = parsePointInput(text, tool().expects?.(env));
      const err = r.ok ? tool().typed(env, r.input) : r.message;
      transient.setState({ inputError: err, prompt: tool().prompt(env) });
      return err;
    },
    dispose() {
      unsub();
      unsubT();
      torsion.dispose();
      results.dispose();
    },
  };
}
