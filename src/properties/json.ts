/**
 * Section properties as one JSON object, built from the property catalogue: a key with a dot
 * ('centroid.x') becomes a nested object. A property added to the catalogue appears in the CLI's
 * JSON with no other edit, at full precision.
 */
import { PROPERTY_CATALOG } from './catalog';
import type { SectionProperties } from './section';

export type PropertyJson = { [key: string]: number | PropertyJson };

export function propertiesJson(p: SectionProperties): PropertyJson {
  const out: PropertyJson = {};
  for (const info of PROPERTY_CATALOG) {
    const path = info.key.split('.');
    let node = out;
    for (const k of path.slice(0, -1)) node = (node[k] ??= {}) as PropertyJson;
    node[path[path.length - 1]] = info.get(p);
  }
  return out;
}

/** The value at a catalogue key in such an object ('centroid.x' reads out.centroid.x). */
export function jsonValueAt(o: unknown, key: string): unknown {
  return key.split('.').reduce<unknown>((node, k) => (node && typeof node === 'object' ? (node as Record<string, unknown>)[k] : undefined), o);
}
