/**
 * Every editor command, in one registry. The toolbar, the keyboard and the tests call
 * `registry.dispatch(ctx, name, arg)`.
 */
import {
  convertDocumentUnits,
  DEMO_DOCUMENT,
  formatIssue,
  parseDocument,
  regionBounds,
  UNITS,
  type Bounds,
  type Op,
  type SectionDocument,
  type Shape,
  type Units,
} from '../../src';
import { canRedo, canUndo, commit, redo, undo } from '../store/history';
import type { EditorState, Overlays, ToolId } from '../store/store';
import { fitBounds, evaluationBounds } from '../view';
import {
  isProfile,
  mirrorShape,
  newShapeId,
  profileToOutline,
  regionToPaths,
  rotateShape,
  translateShape,
} from '../shapes';
import { CommandRegistry, type CommandContext } from './registry';
import { registerExchangeCommands } from '../exchange/commands';
import { centroidCut } from './cut';

const hasSelection = (ctx: CommandContext) => ctx.store.getState().selected.length > 0;

function selectedShapes(s: EditorState): Shape[] {
  const sel = new Set(s.selected);
  return s.doc.shapes.filter((sh) => sel.has(sh.id));
}

/** Replace the selected shapes by `f(shape)` in one undoable step. */
function mapSelected(ctx: CommandContext, f: (s: Shape) => Shape): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return;
  let changed = false;
  const shapes = s.doc.shapes.map((sh) => {
    if (!sel.has(sh.id)) return sh;
    const n = f(sh);
    if (n !== sh) changed = true;
    return n;
  });
  if (changed) commit(ctx.store, { ...s.doc, shapes });
}

/** Bounds of the selected shapes' own outlines. */
export function selectionBounds(ctx: CommandContext): Bounds | null {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  let out: Bounds | null = null;
  for (const r of ctx.shapesOf(s.doc)) {
    if (!sel.has(r.id)) continue;
    const b = regionBounds(r.region);
    if (!b) continue;
    out = out
      ? { xmin: Math.min(out.xmin, b.xmin), xmax: Math.max(out.xmax, b.xmax), ymin: Math.min(out.ymin, b.ymin), ymax: Math.max(out.ymax, b.ymax) }
      : b;
  }
  return out;
}

/** The fixed arrow-key step in document units: 1 mm, or 1/16 in for inch and foot documents. */
export function nudgeStep(units: Units): number {
  switch (units) {
    case 'mm': return 1;
    case 'cm': return 0.1;
    case 'm': return 0.001;
    case 'in': return 1 / 16;
    case 'ft': return 1 / 192;
  }
}

function notify(ctx: CommandContext, kind: 'error' | 'info', title: string, lines: string[] = []) {
  ctx.store.setState({ notice: { kind, title, lines } });
}

/** Load a document from file text: a file that fails validation changes nothing. */
export function loadDocumentText(ctx: CommandContext, name: string, text: string): boolean {
  const r = parseDocument(text);
  if (!r.ok) {
    notify(ctx, 'error', `"${name}" was not opened: it is not a valid section document.`, [
      ...r.errors.map(formatIssue),
      'Your current section is unchanged.',
    ]);
    return false;
  }
  commit(ctx.store, r.doc, []);
  fitView(ctx);
  if (r.warnings.length) notify(ctx, 'info', `"${name}" opened with warnings.`, r.warnings.map(formatIssue));
  else ctx.store.setState({ notice: null });
  return true;
}

export function fitView(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const b = evaluationBounds({ shapes: ctx.shapesOf(s.doc) });
  if (!b) return;
  ctx.store.setState(fitBounds(b, s.width, s.height));
}

export function documentFileName(doc: SectionDocument): string {
  const base = (doc.name ?? 'section').trim().replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'section';
  return `${base}.json`;
}

export function serialiseDocument(doc: SectionDocument): string {
  return JSON.stringify(doc, null, 2) + '\n';
}

function setTool(ctx: CommandContext, tool: ToolId) {
  ctx.store.setState({ tool, pathArc: false });
}

function toggleOverlay(key: keyof Overlays) {
  return (ctx: CommandContext) => {
    const s = ctx.store.getState();
    const overlays = { ...s.overlays, [key]: !s.overlays[key] };
    const patch: Partial<EditorState> = { overlays };
    if (key === 'cut' && overlays.cut && s.cutAt === null) {
      const ev = ctx.evaluate(s.doc);
      if (ev.props) patch.cutAt = centroidCut(ev.props, s.cutAxis);
    }
    ctx.store.setState(patch);
  };
}

function reorder(ctx: CommandContext, dir: 'forward' | 'backward' | 'front' | 'back') {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return;
  const shapes = s.doc.shapes.slice();
  if (dir === 'front' || dir === 'back') {
    const picked = shapes.filter((sh) => sel.has(sh.id));
    const rest = shapes.filter((sh) => !sel.has(sh.id));
    const next = dir === 'front' ? [...rest, ...picked] : [...picked, ...rest];
    if (next.every((sh, i) => sh === s.doc.shapes[i])) return;
    commit(ctx.store, { ...s.doc, shapes: next });
    return;
  }
  let moved = false;
  if (dir === 'forward') {
    for (let i = shapes.length - 2; i >= 0; i--) {
      if (sel.has(shapes[i].id) && !sel.has(shapes[i + 1].id)) {
        [shapes[i], shapes[i + 1]] = [shapes[i + 1], shapes[i]];
        moved = true;
      }
    }
  } else {
    for (let i = 1; i < shapes.length; i++) {
      if (sel.has(shapes[i].id) && !sel.has(shapes[i - 1].id)) {
        [shapes[i], shapes[i - 1]] = [shapes[i - 1], shapes[i]];
        moved = true;
      }
    }
  }
  if (moved) commit(ctx.store, { ...s.doc, shapes });
}

function nudge(dx: number, dy: number) {
  return (ctx: CommandContext) => {
    const step = nudgeStep(ctx.store.getState().doc.units);
    mapSelected(ctx, (sh) => translateShape(sh, dx * step, dy * step));
  };
}

/** Bake the selected shapes into path shapes from their boolean result (arcs preserved). */
export function mergeSelection(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  const picked = s.doc.shapes.filter((sh) => sel.has(sh.id));
  if (picked.length === 0) return;
  const ev = ctx.evaluate({ ...s.doc, shapes: picked });
  if (ev.region.length === 0) {
    notify(ctx, 'error', 'Nothing to merge: the selected shapes combine to an empty section.', ['The section is unchanged.']);
    return;
  }
  const rest = { ...s.doc, shapes: s.doc.shapes.filter((sh) => !sel.has(sh.id)) };
  const paths = regionToPaths(ev.region, rest);
  const first = s.doc.shapes.findIndex((sh) => sel.has(sh.id));
  const before = s.doc.shapes.slice(0, first).filter((sh) => !sel.has(sh.id));
  const after = s.doc.shapes.slice(first).filter((sh) => !sel.has(sh.id));
  const firstName = picked.length === 1 ? picked[0].name : undefined;
  const named = paths.map((p, i) => (i === 0 ? { ...p, name: firstName ?? 'Merged outline' } : p));
  commit(ctx.store, { ...s.doc, shapes: [...before, ...named, ...after] }, named.map((p) => p.id));
}

export function convertSelectionToOutline(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  const out: Shape[] = [];
  const newSel: string[] = [];
  let working = s.doc;
  let changed = false;
  for (const sh of s.doc.shapes) {
    if (!sel.has(sh.id) || !isProfile(sh)) {
      out.push(sh);
      if (sel.has(sh.id)) newSel.push(sh.id);
      continue;
    }
    let r;
    try {
      r = profileToOutline(sh, working);
    } catch (e) {
      notify(ctx, 'error', 'This profile cannot be converted.', [(e as Error).message, 'The section is unchanged.']);
      return;
    }
    if (!r.ok) {
      notify(ctx, 'error', 'This profile cannot be converted.', [r.message, 'The section is unchanged.']);
      return;
    }
    out.push(...r.shapes);
    newSel.push(...r.shapes.map((x) => x.id));
    working = { ...working, shapes: [...working.shapes, ...r.shapes.slice(1)] };
    changed = true;
  }
  if (changed) commit(ctx.store, { ...s.doc, shapes: out }, newSel);
}

function duplicate(ctx: CommandContext) {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return;
  const step = nudgeStep(s.doc.units) * 10;
  const taken = new Set<string>();
  const copies: Shape[] = [];
  for (const sh of s.doc.shapes) {
    if (!sel.has(sh.id)) continue;
    const id = newShapeId(s.doc, taken);
    taken.add(id);
    const c = translateShape({ ...sh, id, name: sh.name ? `${sh.name} (copy)` : undefined }, step, -step);
    if (c.name === undefined) delete (c as { name?: string }).name;
    copies.push(c);
  }
  commit(ctx.store, { ...s.doc, shapes: [...s.doc.shapes, ...copies] }, copies.map((c) => c.id));
}

function setOp(op: Op) {
  return (ctx: CommandContext) => mapSelected(ctx, (sh) => ((sh.op ?? 'add') === op ? sh : { ...sh, op }));
}

export function buildRegistry(): CommandRegistry {
  const r = new CommandRegistry();
  // history
  r.register({ name: 'undo', label: 'Undo', group: 'edit', keys: ['mod+z'], enabled: (c) => canUndo(c.store.getState()), perform: (c) => undo(c.store) });
  r.register({ name: 'redo', label: 'Redo', group: 'edit', keys: ['mod+shift+z', 'mod+y'], enabled: (c) => canRedo(c.store.getState()), perform: (c) => redo(c.store) });
  // tools
  const tools: [ToolId, string, string][] = [
    ['select', 'Select', 'v'],
    ['rectangle', 'Rectangle', 'r'],
    ['circle', 'Circle', 'c'],
    ['polygon', 'Polygon', 'p'],
    ['path', 'Path', 'l'],
  ];
  for (const [id, label, key] of tools) {
    r.register({ name: `tool.${id}`, label, group: 'tool', keys: [key], active: (c) => c.store.getState().tool === id, perform: (c) => setTool(c, id) });
  }
  r.register({
    name: 'tool.profile',
    label: 'Profile',
    group: 'tool',
    keys: ['i'],
    hint: 'Place the chosen profile with a click',
    active: (c) => c.store.getState().tool === 'profile',
    perform: (c, arg) => {
      if (typeof arg === 'string') c.store.setState({ profileType: arg as EditorState['profileType'] });
      setTool(c, 'profile');
    },
  });
  r.register({ name: 'path.arcMode', label: 'Arc segment', group: 'tool', keys: ['a'], hint: 'Path tool: next segment is a three-point arc', active: (c) => c.store.getState().pathArc, perform: (c) => c.store.setState({ pathArc: !c.store.getState().pathArc }) });
  // selection and edits
  r.register({ name: 'select.all', label: 'Select all', group: 'edit', keys: ['mod+a'], perform: (c) => c.store.setState({ selected: c.store.getState().doc.shapes.map((s) => s.id) }) });
  r.register({ name: 'select.none', label: 'Select none', group: 'edit', perform: (c) => c.store.setState({ selected: [] }) });
  r.register({
    name: 'edit.delete',
    label: 'Delete',
    group: 'edit',
    keys: ['delete', 'backspace'],
    enabled: hasSelection,
    perform: (c) => {
      const s = c.store.getState();
      const sel = new Set(s.selected);
      commit(c.store, { ...s.doc, shapes: s.doc.shapes.filter((sh) => !sel.has(sh.id)) }, []);
    },
  });
  r.register({ name: 'edit.duplicate', label: 'Duplicate', group: 'edit', keys: ['mod+d'], enabled: hasSelection, perform: duplicate });
  r.register({ name: 'edit.nudgeLeft', label: 'Move left', group: 'edit', keys: ['arrowleft'], enabled: hasSelection, perform: nudge(-1, 0) });
  r.register({ name: 'edit.nudgeRight', label: 'Move right', group: 'edit', keys: ['arrowright'], enabled: hasSelection, perform: nudge(1, 0) });
  r.register({ name: 'edit.nudgeUp', label: 'Move up', group: 'edit', keys: ['arrowup'], enabled: hasSelection, perform: nudge(0, 1) });
  r.register({ name: 'edit.nudgeDown', label: 'Move down', group: 'edit', keys: ['arrowdown'], enabled: hasSelection, perform: nudge(0, -1) });
  r.register({ name: 'edit.nudgeLeft10', label: 'Move left ×10', group: 'edit', keys: ['shift+arrowleft'], enabled: hasSelection, perform: nudge(-10, 0) });
  r.register({ name: 'edit.nudgeRight10', label: 'Move right ×10', group: 'edit', keys: ['shift+arrowright'], enabled: hasSelection, perform: nudge(10, 0) });
  r.register({ name: 'edit.nudgeUp10', label: 'Move up ×10', group: 'edit', keys: ['shift+arrowup'], enabled: hasSelection, perform: nudge(0, 10) });
  r.register({ name: 'edit.nudgeDown10', label: 'Move down ×10', group: 'edit', keys: ['shift+arrowdown'], enabled: hasSelection, perform: nudge(0, -10) });
  r.register({
    name: 'edit.move',
    label: 'Move by',
    group: 'edit',
    enabled: hasSelection,
    perform: (c, arg) => {
      const [dx, dy] = arg as [number, number];
      if (!Number.isFinite(dx) || !Number.isFinite(dy)) return;
      mapSelected(c, (sh) => translateShape(sh, dx, dy));
    },
  });
  r.register({
    name: 'edit.rotate',
    label: 'Rotate',
    group: 'edit',
    hint: 'Rotate the selection by a typed angle (degrees, CCW) about its centre',
    enabled: hasSelection,
    perform: (c, arg) => {
      const deg = Number(arg);
      if (!Number.isFinite(deg) || deg === 0) return;
      const b = selectionBounds(c);
      if (!b) return;
      const px = (b.xmin + b.xmax) / 2, py = (b.ymin + b.ymax) / 2;
      mapSelected(c, (sh) => rotateShape(sh, deg, px, py));
    },
  });
  r.register({
    name: 'edit.mirrorX',
    label: 'Mirror left–right',
    group: 'edit',
    keys: ['shift+h'],
    enabled: hasSelection,
    perform: (c) => {
      const b = selectionBounds(c);
      if (b) mapSelected(c, (sh) => mirrorShape(sh, 'vertical', (b.xmin + b.xmax) / 2));
    },
  });
  r.register({
    name: 'edit.mirrorY',
    label: 'Mirror top–bottom',
    group: 'edit',
    keys: ['shift+v'],
    enabled: hasSelection,
    perform: (c) => {
      const b = selectionBounds(c);
      if (b) mapSelected(c, (sh) => mirrorShape(sh, 'horizontal', (b.ymin + b.ymax) / 2));
    },
  });
  // order (shapes apply in list order, so order changes the result)
  r.register({ name: 'order.forward', label: 'Later in order', group: 'order', keys: [']'], enabled: hasSelection, perform: (c) => reorder(c, 'forward') });
  r.register({ name: 'order.backward', label: 'Earlier in order', group: 'order', keys: ['['], enabled: hasSelection, perform: (c) => reorder(c, 'backward') });
  r.register({ name: 'order.last', label: 'Last in order', group: 'order', keys: ['shift+]', 'shift+}'], enabled: hasSelection, perform: (c) => reorder(c, 'front') });
  r.register({ name: 'order.first', label: 'First in order', group: 'order', keys: ['shift+[', 'shift+{'], enabled: hasSelection, perform: (c) => reorder(c, 'back') });
  // operations
  r.register({ name: 'op.add', label: 'Add', group: 'op', keys: ['shift+a'], enabled: hasSelection, perform: setOp('add') });
  r.register({ name: 'op.subtract', label: 'Subtract', group: 'op', keys: ['shift+s'], enabled: hasSelection, perform: setOp('subtract') });
  r.register({ name: 'op.intersect', label: 'Intersect', group: 'op', keys: ['shift+i'], enabled: hasSelection, perform: setOp('intersect') });
  // shape conversions
  r.register({
    name: 'shape.toOutline',
    label: 'Convert to outline',
    group: 'shape',
    enabled: (c) => selectedShapes(c.store.getState()).some(isProfile),
    perform: convertSelectionToOutline,
  });
  r.register({ name: 'shape.merge', label: 'Merge into one outline', group: 'shape', keys: ['mod+m'], enabled: hasSelection, perform: mergeSelection });
  // view
  r.register({ name: 'view.fit', label: 'Fit to section', group: 'view', keys: ['f'], perform: fitView });
  r.register({ name: 'view.centroid', label: 'Centroid', group: 'view', active: (c) => c.store.getState().overlays.centroid, perform: toggleOverlay('centroid') });
  r.register({ name: 'view.principal', label: 'Principal axes', group: 'view', active: (c) => c.store.getState().overlays.principal, perform: toggleOverlay('principal') });
  r.register({ name: 'view.fibres', label: 'Extreme fibres', group: 'view', active: (c) => c.store.getState().overlays.fibres, perform: toggleOverlay('fibres') });
  r.register({ name: 'view.cut', label: 'Cut line', group: 'view', keys: ['k'], active: (c) => c.store.getState().overlays.cut, perform: toggleOverlay('cut') });
  // snapping
  const snapToggle = (key: keyof EditorState['snap']) => (c: CommandContext) => {
    const s = c.store.getState();
    c.store.setState({ snap: { ...s.snap, [key]: !s.snap[key] } });
  };
  r.register({ name: 'snap.grid', label: 'Grid', group: 'snap', keys: ['g'], active: (c) => c.store.getState().snap.grid, perform: snapToggle('grid') });
  r.register({ name: 'snap.geometry', label: 'Points', group: 'snap', hint: 'Snap to vertices, midpoints, arc centres and intersections', keys: ['s'], active: (c) => c.store.getState().snap.vertex, perform: (c) => {
    const s = c.store.getState();
    const on = !s.snap.vertex;
    c.store.setState({ snap: { ...s.snap, vertex: on, midpoint: on, centre: on, intersection: on } });
  } });
  r.register({ name: 'snap.ortho', label: 'Orthogonal', group: 'snap', keys: ['o'], active: (c) => c.store.getState().snap.ortho, perform: snapToggle('ortho') });
  // units
  r.register({
    name: 'units.set',
    label: 'Units',
    group: 'units',
    perform: (c, arg) => {
      const u = arg as Units;
      if (!(UNITS as readonly string[]).includes(u)) return;
      const s = c.store.getState();
      if (s.doc.units === u) return;
      // The view follows the units (editor.ts), also on undo and redo.
      commit(c.store, convertDocumentUnits(s.doc, u));
    },
  });
  // files
  r.register({
    name: 'file.open',
    label: 'Open…',
    group: 'file',
    keys: ['mod+o'],
    perform: async (c) => {
      const f = await c.io?.pickFile();
      if (f) loadDocumentText(c, f.name, f.text);
    },
  });
  r.register({
    name: 'file.save',
    label: 'Save',
    group: 'file',
    keys: ['mod+s'],
    perform: (c) => {
      const doc = c.store.getState().doc;
      c.io?.download(documentFileName(doc), serialiseDocument(doc));
    },
  });
  r.register({ name: 'file.demo', label: 'Load demo section', group: 'file', perform: (c) => { commit(c.store, DEMO_DOCUMENT, []); fitView(c); } });
  r.register({
    name: 'file.new',
    label: 'New section',
    group: 'file',
    perform: (c) => commit(c.store, { format: 'kern-section', version: 1, units: c.store.getState().doc.units, shapes: [] }, []),
  });
  r.register({ name: 'report.open', label: 'Report', group: 'file', keys: ['mod+p'], perform: (c) => c.openReport?.() });
  r.register({ name: 'notice.dismiss', label: 'Dismiss', group: 'view', perform: (c) => c.store.setState({ notice: null }) });
  registerExchangeCommands(r);
  return r;
}

export const registry = buildRegistry();
