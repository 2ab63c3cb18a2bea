/**
 * The baseline beside a proposal. While a proposal is active the comparison, the faint baseline
 * outline, the removed material and the "new" cautions all need the baseline's own evaluation.
 * The baseline does not change while the proposal is edited, so it is evaluated once per baseline
 * change, by a second evaluator (in the worker in the browser), never once per drag frame.
 *
 * - `baselineSection(doc)`: the baseline as a plain section; the same object as long as the
 *   baseline's shapes and the fields the evaluation reads are unchanged (editing a proposal, its
 *   limits or its net-section lines keeps it), so identity tells when to evaluate again.
 * - `sectionPart` / `SectionReplica`: the baseline sent to the worker as changed shapes only, and
 *   the worker's copy that keeps unchanged records identical for its incremental evaluator.
 */
import { createEvaluator, type Evaluation, type SectionDocument, type Shape } from '../../src';

/** Fields that never change a section's evaluation and change often while a proposal is checked. */
const NOT_EVALUATED = new Set(['shapes', 'variants', 'activeVariant', 'limits', 'holeRules', 'netLines']);

const cache = new WeakMap<Shape[], SectionDocument>();

function sameFields(section: SectionDocument, doc: SectionDocument): boolean {
  const a = section as unknown as Record<string, unknown>, b = doc as unknown as Record<string, unknown>;
  for (const k of Object.keys(b)) if (!NOT_EVALUATED.has(k) && a[k] !== b[k]) return false;
  for (const k of Object.keys(a)) if (!NOT_EVALUATED.has(k) && !(k in b)) return false;
  return true;
}

/** The document's baseline as a plain section (no proposals), the same object while nothing it holds changed. */
export function baselineSection(doc: SectionDocument): SectionDocument {
  const hit = cache.get(doc.shapes);
  if (hit && sameFields(hit, doc)) return hit;
  const section = { ...doc };
  for (const k of NOT_EVALUATED) if (k !== 'shapes') delete (section as unknown as Record<string, unknown>)[k];
  cache.set(doc.shapes, section);
  return section;
}

/** The baseline to evaluate beside the active section: only while a proposal is active. */
export function baselineNeeded(doc: SectionDocument): SectionDocument | null {
  return doc.activeVariant ? baselineSection(doc) : null;
}

/** A section as the worker receives it: its fields, the shape order, and only the shapes it lacks. */
export interface SectionPart {
  meta: Omit<SectionDocument, 'shapes'>;
  order: string[];
  changed: Record<string, Shape>;
}

/** The part to send for `doc`, given the records the worker holds (`sent`, updated here). */
export function sectionPart(doc: SectionDocument, sent: Map<string, Shape>): SectionPart {
  const changed: Record<string, Shape> = {};
  const ids = new Set<string>();
  for (const s of doc.shapes) {
    ids.add(s.id);
    if (sent.get(s.id) !== s) {
      changed[s.id] = s;
      sent.set(s.id, s);
    }
  }
  for (const id of [...sent.keys()]) if (!ids.has(id)) sent.delete(id);
  const { shapes: _shapes, ...meta } = doc;
  void _shapes;
  return { meta, order: doc.shapes.map((s) => s.id), changed };
}

/** The worker's copy of one section: its own shape records and its own incremental evaluator. */
export class SectionReplica {
  private readonly evaluator = createEvaluator();
  private readonly shapes = new Map<string, Shape>();
  private doc: SectionDocument | null = null;

  /** Take a part and return the section it describes. */
  apply(part: SectionPart): SectionDocument {
    for (const [id, s] of Object.entries(part.changed)) this.shapes.set(id, s);
    const keep = new Set(part.order);
    for (const id of [...this.shapes.keys()]) if (!keep.has(id)) this.shapes.delete(id);
    this.doc = { ...part.meta, shapes: part.order.map((id) => this.shapes.get(id)!) } as SectionDocument;
    return this.doc;
  }

  evaluate(): Evaluation | null {
    return this.doc ? this.evaluator.evaluate(this.doc) : null;
  }
}
