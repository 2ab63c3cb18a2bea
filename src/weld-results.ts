/**
 * The document's weld loads evaluated on its line groups: for each load, the elastic weld-group
 * forces (src/lines/weld-group.ts) with the units they are in. The evaluator runs it after the
 * line groups, so the panel, the CLI and the report read the same result.
 *
 * Units, as for the section loads (src/materials/units.ts): the force in the document's
 * `forceUnit` (kN when absent), the moment in force × `momentLength` (the document's length unit
 * when absent), converted to force × document length before it meets the group's coordinates.
 * The force per unit length comes out in force unit per document length unit (kN/mm).
 */
import type { SectionDocument, Units, WeldLoadCase } from './document/types';
import type { LineChain } from './lines/chain';
import { LineError } from './lines/chain';
import { weldGroupForces, type WeldGroupResult } from './lines/weld-group';
import { DEFAULT_FORCE_UNIT, momentFactor, type ForceUnit } from './materials/units';

/** What the weld stage needs of a line group: its name, its chains, and why it has no properties. */
export interface WeldGroupInput {
  group: string;
  chains: readonly LineChain[];
  message: string | null;
}

export interface WeldUnits {
  force: ForceUnit;
  length: Units;
  /** Unit text of the moment as the load gives it ("kN·mm"). */
  moment: string;
  /** Unit text of a force per unit length ("kN/mm"). */
  perLength: string;
}

export interface WeldResult {
  /** The load's place in `weldLoads`. */
  index: number;
  load: WeldLoadCase;
  group: string;
  units: WeldUnits;
  /** Forces per unit length in force / document length; `result.M` in force × document length. */
  result: WeldGroupResult | null;
  /** The moment about the group's centroid in the load's own moment unit (force × momentLength). */
  moment: number | null;
  message: string | null;
}

/** The units of a document's weld loads and results. */
export function weldUnits(doc: Pick<SectionDocument, 'units' | 'forceUnit' | 'momentLength'>): WeldUnits {
  const force = doc.forceUnit ?? DEFAULT_FORCE_UNIT;
  const m = doc.momentLength ?? doc.units;
  return { force, length: doc.units, moment: `${force}·${m}`, perLength: `${force}/${doc.units}` };
}

/** One load on one group, in the document's units. */
export function weldResult(doc: Pick<SectionDocument, 'units' | 'forceUnit' | 'momentLength'>, load: WeldLoadCase, index: number, g: WeldGroupInput | undefined): WeldResult {
  const units = weldUnits(doc);
  const group = load.group.trim();
  const base = { index, load, group, units };
  if (!g) return { ...base, result: null, moment: null, message: `The line group "${group}" has no line elements in this section.` };
  if (g.message) return { ...base, result: null, moment: null, message: g.message };
  const mk = momentFactor({ length: doc.units, force: units.force, stress: 'MPa', momentLength: doc.momentLength });
  try {
    const result = weldGroupForces(g.chains, { Fx: load.Fx, Fy: load.Fy, at: load.at, M: (load.M ?? 0) * mk });
    return { ...base, result, moment: result.M / mk, message: null };
  } catch (e) {
    if (!(e instanceof LineError)) throw e;
    return { ...base, result: null, moment: null, message: e.message };
  }
}

/**
 * Every weld load of the document on the line groups of the section evaluated, each result reused
 * while its load, its group and the units are unchanged (a drag of another shape redoes nothing).
 */
export function createWeldStage() {
  let cache = new Map<WeldLoadCase, { g: WeldGroupInput | undefined; key: string; result: WeldResult }>();
  return (doc: SectionDocument, groups: readonly WeldGroupInput[]): WeldResult[] => {
    const loads = doc.weldLoads ?? [];
    const next = new Map<WeldLoadCase, { g: WeldGroupInput | undefined; key: string; result: WeldResult }>();
    const key = `${doc.units}|${doc.forceUnit ?? ''}|${doc.momentLength ?? ''}`;
    const out = loads.map((load, index) => {
      const g = groups.find((x) => x.group === load.group.trim());
      const prev = cache.get(load);
      const result = prev && prev.g === g && prev.key === key && prev.result.index === index ? prev.result : weldResult(doc, load, index, g);
      next.set(load, { g, key, result });
      return result;
    });
    cache = next;
    return out;
  };
}
