/**
 * The command table: every editor command as data, in one registry. The toolbar, the keyboard,
 * the keys sheet and the tests all dispatch through it (`registry.dispatch(ctx, name, arg)`).
 * What a command does lives in `app/ops/` (document operations) and `app/exchange/` (files);
 * the drawing tools' commands come from the shape-kind editors (`app/shapes/`).
 */
import { isProfile, OPS } from '../src';
import { readDxf } from './exchange/dxf';
import { canExport, exportDxfFile, exportJsonFile, exportPngFile, exportSvgFile } from './exchange/exports';
import { exchangeStore } from './exchange/state';
import { loadDemo, saveDocument, setUnits } from './ops/document';
import { openFileText } from './exchange/open';
import { OPEN_EXAMPLE_COMMAND } from './examples/open';
import { placeCatalogueCommand } from './ops/catalogue';
import { startNewSection } from './ops/new-section';
import { notify } from './ops/notice';
import { roundCorner } from './ops/round-corner';
import { convertSelectionToOutline, mergeSelection } from './ops/outline';
import {
  deleteSelection,
  duplicateSelection,
  hasSelection,
  mirrorSelection,
  moveSelection,
  nudgeSelection,
  reorderSelection,
  rotateSelection,
  selectedShapes,
  setSelectionOp,
} from './ops/selection';
import { setTitleField, type TitleField } from './ops/title';
import { addRevision, deleteRevision, setChecked, setNotes, setRevisionField, type CheckedField, type RevisionField } from './ops/checker';
import { fitView, toggleOverlay } from './ops/view';
import { hasTorsion, setTorsionDensity, setTorsionPoisson, toggleTorsion } from './ops/torsion';
import { SHAPE_EDITORS } from './shapes';
import { canRedo, canUndo, redo, undo } from './store/history';
import type { EditorState, Overlays } from './store/store';
import { CommandRegistry, type CommandContext } from './commands/registry';
import { activeShapes } from './store/section';
import { registerMaterials } from './materials/commands';
import { registerCutoutCommands } from './ops/cutout-commands';

const OP_LABEL = { add: 'Add', subtract: 'Subtract', intersect: 'Intersect' } as const;
const OP_KEY = { add: 'shift+a', subtract: 'shift+s', intersect: 'shift+i' } as const;

function registerTools(r: CommandRegistry): void {
  r.register({ name: 'tool.select', label: 'Select', group: 'tool', keys: ['v'], active: (c) => c.store.getState().tool === 'select', perform: (c) => c.store.setState({ tool: 'select', pathArc: false }) });
  for (const ed of SHAPE_EDITORS) {
    for (const t of ed.tools) {
      r.register({
        name: `tool.${t.id}`,
        label: t.label,
        group: 'tool',
        keys: t.key ? [t.key] : undefined,
        hint: t.hint,
        active: (c) => c.store.getState().tool === t.id,
        perform: (c, arg) => {
          t.configure?.(c, arg);
          c.store.setState({ tool: t.id, pathArc: false });
        },
      });
    }
    for (const cmd of ed.commands ?? []) r.register(cmd);
  }
}

function registerHistory(r: CommandRegistry): void {
  r.register({ name: 'undo', label: 'Undo', group: 'edit', keys: ['mod+z'], enabled: (c) => canUndo(c.store.getState()), perform: (c) => undo(c.store) });
  r.register({ name: 'redo', label: 'Redo', group: 'edit', keys: ['mod+shift+z', 'mod+y'], enabled: (c) => canRedo(c.store.getState()), perform: (c) => redo(c.store) });
}

function registerEdits(r: CommandRegistry): void {
  r.register({ name: 'select.all', label: 'Select all', group: 'edit', keys: ['mod+a'], perform: (c) => c.store.setState({ selected: activeShapes(c.store.getState().doc).map((s) => s.id) }) });
  r.register({ name: 'select.none', label: 'Select none', group: 'edit', perform: (c) => c.store.setState({ selected: [] }) });
  r.register({ name: 'edit.delete', label: 'Delete', group: 'edit', keys: ['delete', 'backspace'], enabled: hasSelection, perform: deleteSelection });
  r.register({ name: 'edit.duplicate', label: 'Duplicate', group: 'edit', keys: ['mod+d'], enabled: hasSelection, perform: duplicateSelection });
  const nudges: [string, string, string, number, number][] = [
    ['Left', 'Move left', 'arrowleft', -1, 0],
    ['Right', 'Move right', 'arrowright', 1, 0],
    ['Up', 'Move up', 'arrowup', 0, 1],
    ['Down', 'Move down', 'arrowdown', 0, -1],
  ];
  for (const [name, label, key, dx, dy] of nudges) {
    r.register({ name: `edit.nudge${name}`, label, group: 'edit', keys: [key], enabled: hasSelection, perform: (c) => nudgeSelection(c, dx, dy) });
    r.register({ name: `edit.nudge${name}10`, label: `${label} ×10`, group: 'edit', keys: [`shift+${key}`], enabled: hasSelection, perform: (c) => nudgeSelection(c, 10 * dx, 10 * dy) });
  }
  r.register({ name: 'edit.move', label: 'Move by', group: 'edit', enabled: hasSelection, perform: (c, arg) => moveSelection(c, ...(arg as [number, number])) });
  r.register({ name: 'edit.rotate', label: 'Rotate', group: 'edit', hint: 'Rotate the selection by a typed angle (degrees, CCW) about its centre', enabled: hasSelection, perform: (c, arg) => rotateSelection(c, Number(arg)) });
  // Shift+X turns x into −x (left–right), Shift+Y turns y into −y (top–bottom).
  r.register({ name: 'edit.mirrorX', label: 'Mirror left–right', group: 'edit', keys: ['shift+x'], enabled: hasSelection, perform: (c) => mirrorSelection(c, 'vertical') });
  r.register({ name: 'edit.mirrorY', label: 'Mirror top–bottom', group: 'edit', keys: ['shift+y'], enabled: hasSelection, perform: (c) => mirrorSelection(c, 'horizontal') });
  // Shapes apply in list order, so the order changes the result.
  r.register({ name: 'order.forward', label: 'Later in order', group: 'order', keys: [']'], enabled: hasSelection, perform: (c) => reorderSelection(c, 'forward') });
  r.register({ name: 'order.backward', label: 'Earlier in order', group: 'order', keys: ['['], enabled: hasSelection, perform: (c) => reorderSelection(c, 'backward') });
  r.register({ name: 'order.last', label: 'Last in order', group: 'order', keys: ['shift+]', 'shift+}'], enabled: hasSelection, perform: (c) => reorderSelection(c, 'front') });
  r.register({ name: 'order.first', label: 'First in order', group: 'order', keys: ['shift+[', 'shift+{'], enabled: hasSelection, perform: (c) => reorderSelection(c, 'back') });
  for (const op of OPS) r.register({ name: `op.${op}`, label: OP_LABEL[op], group: 'op', keys: [OP_KEY[op]], enabled: hasSelection, perform: (c) => setSelectionOp(c, op) });
  r.register({ name: 'shape.toOutline', label: 'Turn into a path', group: 'shape', hint: 'Replace the selected profile by a path of its exact lines and arcs, to edit point by point', enabled: (c) => selectedShapes(c.store.getState()).some(isProfile), perform: convertSelectionToOutline });
  r.register({ name: 'shape.merge', label: 'Merge into one outline', group: 'shape', keys: ['mod+m'], enabled: hasSelection, perform: mergeSelection });
  r.register({
    name: 'shape.roundCorner',
    label: 'Round a corner',
    group: 'shape',
    hint: 'Round a corner of the selected polygon or path with a radius: {corner, radius}',
    enabled: (c) => c.store.getState().selected.length === 1,
    perform: (c, arg) => {
      const err = roundCorner(c, arg);
      if (err) notify(c, 'error', 'The corner was not rounded.', [err]);
    },
  });
  r.register({ name: 'catalogue.place', label: 'Place a rolled section', group: 'shape', hint: 'Place a catalogue size {series, designation} at the middle of the view', perform: placeCatalogueCommand });
}

function registerView(r: CommandRegistry): void {
  r.register({ name: 'view.fit', label: 'Fit to section', group: 'view', keys: ['f'], perform: fitView });
  const overlays: [keyof Overlays, string, string | undefined][] = [
    ['centroid', 'Centroid', undefined],
    ['principal', 'Principal axes', undefined],
    ['fibres', 'Extreme fibres', undefined],
    ['cut', 'Cut line', 'k'],
    ['dimensions', 'Dimensions', 'm'],
  ];
  for (const [key, label, k] of overlays) {
    r.register({ name: `view.${key}`, label, group: 'view', keys: k ? [k] : undefined, active: (c) => c.store.getState().overlays[key], perform: (c) => toggleOverlay(c, key) });
  }
  const snapToggle = (key: keyof EditorState['snap']) => (c: CommandContext) => {
    const s = c.store.getState();
    c.store.setState({ snap: { ...s.snap, [key]: !s.snap[key] } });
  };
  r.register({ name: 'snap.grid', label: 'Grid', group: 'snap', keys: ['g'], active: (c) => c.store.getState().snap.grid, perform: snapToggle('grid') });
  r.register({
    name: 'snap.geometry',
    label: 'Points',
    group: 'snap',
    hint: 'Snap to vertices, midpoints, arc centres and intersections',
    keys: ['s'],
    active: (c) => c.store.getState().snap.vertex,
    perform: (c) => {
      const s = c.store.getState();
      const on = !s.snap.vertex;
      c.store.setState({ snap: { ...s.snap, vertex: on, midpoint: on, centre: on, intersection: on } });
    },
  });
  r.register({ name: 'snap.ortho', label: 'Orthogonal', group: 'snap', keys: ['o'], active: (c) => c.store.getState().snap.ortho, perform: snapToggle('ortho') });
  r.register({ name: 'notice.dismiss', label: 'Dismiss', group: 'view', perform: (c) => c.store.setState({ notice: null }) });
}

/** Torsion by finite elements (app/torsion/): part of the results or not, its settings, runs. */
function registerTorsion(r: CommandRegistry): void {
  r.register({ name: 'torsion.include', label: 'Torsion', group: 'view', hint: 'Include J, the shear centre and Cw by finite elements in the results and the report', active: hasTorsion, perform: toggleTorsion });
  r.register({ name: 'torsion.density', label: 'Torsion mesh density', group: 'view', perform: setTorsionDensity });
  r.register({ name: 'torsion.poisson', label: "Poisson's ratio for the shear centre", group: 'view', perform: (c, v) => void setTorsionPoisson(c, v) });
  r.register({ name: 'view.cautions', label: 'Caution markers', group: 'view', hint: 'Markers at the places of the structural cautions (numbered as in the cautions list)', active: (c) => c.store.getState().overlays.cautions, perform: (c) => toggleOverlay(c, 'cautions') });
  r.register({ name: 'view.stressMap', label: 'Torsion τ', group: 'view', hint: 'Shade the shear stress |τ| under a unit torque (with torsion included)', enabled: hasTorsion, active: (c) => c.store.getState().overlays.stressMap, perform: (c) => toggleOverlay(c, 'stressMap') });
  r.register({ name: 'torsion.compute', label: 'Compute', group: 'view', hint: 'Run the torsion analysis now', enabled: hasTorsion, perform: (c) => c.torsion?.compute() });
  r.register({ name: 'torsion.cancel', label: 'Cancel', group: 'view', hint: 'Stop the torsion run (automatic runs pause until Compute)', perform: (c) => c.torsion?.cancel() });
}

function registerFiles(r: CommandRegistry): void {
  r.register({ name: 'units.set', label: 'Units', group: 'units', perform: setUnits });
  r.register({
    name: 'file.open',
    label: 'Open…',
    group: 'file',
    keys: ['mod+o'],
    perform: async (c) => {
      const f = await c.io?.pickFile();
      if (f) openFileText(c, f.name, f.text);
    },
  });
  r.register({ name: 'file.save', label: 'Save', group: 'file', keys: ['mod+s'], perform: saveDocument });
  r.register({ name: 'file.demo', label: 'Load demo section', group: 'file', perform: loadDemo });
  r.register({ name: 'file.new', label: 'New section', group: 'file', hint: 'Start an empty section (asks first when the section has shapes)', perform: startNewSection });
  r.register(OPEN_EXAMPLE_COMMAND);
  r.register({ name: 'report.open', label: 'Report', group: 'file', keys: ['mod+p'], perform: (c) => c.openReport?.() });
  r.register({
    name: 'file.importDxf',
    label: 'Import DXF…',
    group: 'file',
    hint: 'Add outlines from a DXF drawing to the section',
    perform: (c, arg) => {
      const a = arg as { name?: unknown; text?: unknown; units?: unknown } | undefined;
      if (a && typeof a.text === 'string') readDxf(c, typeof a.name === 'string' ? a.name : 'drawing.dxf', a.text, a.units as never);
      else exchangeStore(c.store).getState().pickDxf?.();
    },
  });
  r.register({ name: 'file.export', label: 'Export…', group: 'file', hint: 'SVG, DXF, PNG or the section document', perform: (c) => exchangeStore(c.store).setState({ exportOpen: true }) });
  r.register({ name: 'export.svg', label: 'SVG', group: 'file', enabled: canExport, perform: (c) => void exportSvgFile(c) });
  r.register({ name: 'export.dxf', label: 'DXF', group: 'file', enabled: canExport, perform: (c) => void exportDxfFile(c) });
  r.register({
    name: 'export.png',
    label: 'PNG',
    group: 'file',
    enabled: canExport,
    perform: async (c, arg) => {
      const err = await exportPngFile(c, Number(arg));
      if (err) c.store.setState({ notice: { kind: 'error', title: 'The PNG was not exported.', lines: [err] } });
    },
  });
  r.register({ name: 'export.json', label: 'Section document (JSON)', group: 'file', perform: exportJsonFile });
  r.register({ name: 'doc.titleBlock', label: 'Title block…', group: 'file', hint: 'Project, section, author, checker, date and revision for the report', perform: (c) => exchangeStore(c.store).setState({ titleOpen: true }) });
  r.register({
    name: 'doc.setTitle',
    label: 'Set title-block field',
    group: 'file',
    perform: (c, arg) => {
      const a = arg as { field: TitleField; value: string } | undefined;
      if (a) setTitleField(c, a.field, a.value);
    },
  });
}

/** The checker's fields: revision history, notes, checked by / date (app/ops/checker.ts). */
function registerChecker(r: CommandRegistry): void {
  r.register({
    name: 'doc.checker',
    label: 'Revisions…',
    group: 'file',
    hint: 'Revision history, notes and the checked-by block for the report',
    perform: (c) => {
      // One dialog at a time: it is also opened from the title block's dialog.
      exchangeStore(c.store).setState({ titleOpen: false });
      c.store.setState({ checkerOpen: true });
    },
  });
  r.register({ name: 'doc.addRevision', label: 'Add revision', group: 'file', perform: (c, arg) => addRevision(c, (arg ?? {}) as Parameters<typeof addRevision>[1]) });
  r.register({
    name: 'doc.setRevision',
    label: 'Set revision field',
    group: 'file',
    perform: (c, arg) => {
      const a = arg as { index: number; field: RevisionField; value: string } | undefined;
      if (a) setRevisionField(c, a.index, a.field, a.value);
    },
  });
  r.register({ name: 'doc.deleteRevision', label: 'Delete revision', group: 'file', perform: (c, arg) => deleteRevision(c, Number(arg)) });
  r.register({ name: 'doc.setNotes', label: 'Set notes', group: 'file', perform: (c, arg) => setNotes(c, String(arg ?? '')) });
  r.register({
    name: 'doc.setChecked',
    label: 'Set checked by / date',
    group: 'file',
    perform: (c, arg) => {
      const a = arg as { field: CheckedField; value: string } | undefined;
      if (a) setChecked(c, a.field, a.value);
    },
  });
}

export function buildRegistry(): CommandRegistry {
  const r = new CommandRegistry();
  registerHistory(r);
  registerTools(r);
  registerEdits(r);
  registerView(r);
  registerTorsion(r);
  registerFiles(r);
  registerMaterials(r);
  registerChecker(r);
  registerCutoutCommands(r);
  return r;
}

export const registry = buildRegistry();
