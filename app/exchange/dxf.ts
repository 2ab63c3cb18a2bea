/**
 * DXF import in the editor: read the file with the engine's importer (into the document's units),
 * ask for units when the file states none, let the user review what was found, then append the
 * outlines to the document as ONE undoable step, either added to the section or cut out of it.
 * A file that cannot be read changes nothing.
 */
import { allShapeIds, regionBounds, regionToPaths, unionBounds, UNITS, type Bounds, type Region, type SectionDocument, type Shape, type Units } from '../../src';
import { importDxf } from '../../src/exchange';
import type { CommandContext } from '../commands/registry';
import { fitView } from '../ops/view';
import { commit } from '../store/history';
import { evaluationBounds, fitBounds, STRIP_PX } from '../view';
import { exchangeStore, type PendingImport } from './state';
import { activeSection, activeShapes, withActiveShapes } from '../store/section';

/** A shape-id prefix no shape of the document uses yet: 'dxf', 'dxf2', 'dxf3', ... */
export function uniqueIdPrefix(doc: SectionDocument): string {
  const ids = [...allShapeIds(doc)];
  for (let k = 1; ; k++) {
    const p = k === 1 ? 'dxf' : `dxf${k}`;
    if (!ids.some((id) => id === p || id.startsWith(`${p}-`))) return p;
  }
}

function notify(ctx: CommandContext, title: string, lines: string[]) {
  ctx.store.setState({ notice: { kind: 'error', title, lines } });
}

/**
 * Read DXF text for the current document. Returns what happens next: 'units' (ask the user),
 * 'review' (show what was found) or 'refused' (the file cannot be read; a notice says why).
 */
export function readDxf(ctx: CommandContext, fileName: string, text: string, units?: Units): 'units' | 'review' | 'refused' {
  const ex = exchangeStore(ctx.store);
  const doc = ctx.store.getState().doc;
  if (units !== undefined && !(UNITS as readonly string[]).includes(units)) units = undefined;
  const r = importDxf(text, { units, targetUnits: doc.units, idPrefix: uniqueIdPrefix(doc) });
  if (!r.ok) {
    ex.setState({ pending: null });
    notify(ctx, `"${fileName}" was not imported.`, [r.error, 'Your current section is unchanged.']);
    return 'refused';
  }
  if (r.units === null) {
    ex.setState({ pending: { stage: 'units', fileName, text } });
    return 'units';
  }
  const pending: PendingImport = {
    stage: 'review',
    fileName,
    sourceUnits: (r.unitsFromFile ?? units)!,
    unitsFromFile: r.unitsFromFile !== null,
    targetUnits: doc.units,
    shapes: r.shapes,
    region: r.region,
    problems: r.problems,
    warnings: r.warnings,
    ignored: r.ignored,
  };
  ex.setState({ pending, problems: r.problems, problemsFile: fileName });
  ctx.store.setState({ notice: null });
  // The review card covers about 160 px of the canvas's right edge.
  showAll(ctx, pending.region, r.problems.flatMap((p) => p.points), 160);
  return 'review';
}

/** Fit the view to the current section, the imported outlines and the problem geometry together. */
function showAll(ctx: CommandContext, region: Region, points: [number, number][], coveredRight = 0): void {
  const s = ctx.store.getState();
  let b: Bounds | null = unionBounds(evaluationBounds({ shapes: ctx.shapesOf(s.doc) }), regionBounds(region));
  for (const [x, y] of points) if (Number.isFinite(x) && Number.isFinite(y)) b = unionBounds(b, { xmin: x, xmax: x, ymin: y, ymax: y });
  if (b) ctx.store.setState(fitBounds(b, Math.max(s.width - coveredRight, s.width / 2), s.height, 48, STRIP_PX));
}

/**
 * The shapes to append for `mode`. 'add' appends the imported outlines as they are (holes
 * subtract). 'subtract' cuts the imported section R out of the current section S, exactly:
 * loops at even depth are subtracted, and inside each hole H of the import the material S ∩ H
 * that was there before is put back (computed by the engine's booleans, arcs kept).
 */
export function shapesToAppend(ctx: CommandContext, doc: SectionDocument, imported: Shape[], mode: 'add' | 'subtract'): Shape[] {
  if (mode === 'add') return imported;
  const out: Shape[] = [];
  const section = activeSection(doc);
  const used = allShapeIds(doc);
  for (const s of imported) used.add(s.id);
  for (const sh of imported) {
    const hole = sh.op === 'subtract';
    if (!hole) {
      out.push({ ...sh, op: 'subtract', name: (sh.name ?? sh.id).replace(/^Outline/, 'Cut-out') });
      continue;
    }
    // The section as it was, inside this hole of the imported outline.
    const kept = ctx.evaluate({ ...section, shapes: [...section.shapes, { ...sh, op: 'intersect' }] }).region;
    if (kept.length === 0) continue;
    const paths = regionToPaths(kept, used).map((p, i) => ({ ...p, name: `Section kept inside ${sh.name ?? sh.id}${i ? ` (${i + 1})` : ''}` }));
    for (const p of paths) used.add(p.id);
    out.push(...paths);
  }
  return out;
}

/** Append the reviewed import to the document in one undoable step; false when nothing to add. */
export function applyImport(ctx: CommandContext, mode: 'add' | 'subtract'): boolean {
  const ex = exchangeStore(ctx.store);
  const p = ex.getState().pending;
  if (!p || p.stage !== 'review' || p.shapes.length === 0) return false;
  const doc = ctx.store.getState().doc;
  if (doc.units !== p.targetUnits) {
    // The document's units changed while the dialog was open: read the file again.
    ex.setState({ pending: null });
    notify(ctx, `"${p.fileName}" was not imported: the section's units changed meanwhile.`, ['Import the file again.', 'Your current section is unchanged.']);
    return false;
  }
  const added = shapesToAppend(ctx, doc, p.shapes, mode);
  commit(ctx.store, withActiveShapes(doc, [...activeShapes(doc), ...added]), added.map((s) => s.id));
  ex.setState({ pending: null });
  // Show the section with the marks of what was left out.
  if (p.problems.length) showAll(ctx, [], p.problems.flatMap((pr) => pr.points));
  else fitView(ctx);
  return true;
}

export function cancelImport(ctx: CommandContext): void {
  exchangeStore(ctx.store).setState({ pending: null });
}

export function clearProblems(ctx: CommandContext): void {
  exchangeStore(ctx.store).setState({ problems: [], problemsFile: null });
}
