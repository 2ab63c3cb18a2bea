/**
 * A small JSON Schema validator for the subset of draft 2020-12 that Kern's document schemas use
 * (src/document/schema.ts), written for the tests only: the dependencies allowed in this project
 * include no JSON Schema validator, and the subset is small enough to implement exactly.
 *
 * Supported keywords: $ref (local "#/$defs/name" only), type, const, enum, properties, required,
 * additionalProperties (false or a schema), minProperties, items, minItems, maxItems, minimum,
 * maximum, exclusiveMinimum, exclusiveMaximum, minLength, pattern, oneOf, anyOf, allOf; the
 * annotations $schema, $id, $defs, title and description are read and ignored. Any other keyword
 * throws, so a schema can never pass a document by using a keyword this validator skips.
 * Semantics follow the specification (JSON Schema Validation, draft 2020-12, sections 6.1 to
 * 6.5; Core, sections 10.2 and 10.3): "integer" is a number with no fractional part, const and
 * enum compare by JSON equality, pattern is an ECMA-262 regular expression searched (not anchored).
 */

export interface SchemaError {
  /** Where in the instance, as a JSON Pointer ("" is the whole document, "/shapes/2/radius"). */
  path: string;
  message: string;
}

type Schema = Record<string, unknown> | boolean;

const ANNOTATIONS = new Set(['$schema', '$id', '$defs', 'title', 'description']);
const KEYWORDS = new Set([
  '$ref', 'type', 'const', 'enum', 'properties', 'required', 'additionalProperties', 'minProperties', 'items', 'minItems', 'maxItems',
  'minimum', 'maximum', 'exclusiveMinimum', 'exclusiveMaximum', 'minLength', 'pattern', 'oneOf', 'anyOf', 'allOf',
]);

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function typeOf(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'array';
  return typeof v;
}

function hasType(v: unknown, t: string): boolean {
  switch (t) {
    case 'integer':
      return typeof v === 'number' && Number.isInteger(v);
    case 'number':
      return typeof v === 'number' && Number.isFinite(v);
    case 'object':
      return isObject(v);
    default:
      return typeOf(v) === t;
  }
}

/** Equality of JSON values (objects by keys regardless of order). */
export function jsonEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((x, i) => jsonEqual(x, b[i]));
  if (isObject(a) && isObject(b)) {
    const ka = Object.keys(a), kb = Object.keys(b);
    return ka.length === kb.length && ka.every((k) => Object.prototype.hasOwnProperty.call(b, k) && jsonEqual(a[k], b[k]));
  }
  return false;
}

const pointer = (path: string, key: string | number) => `${path}/${String(key).replace(/~/g, '~0').replace(/\//g, '~1')}`;

export class SchemaValidator {
  constructor(private readonly root: Record<string, unknown>) {
    this.checkKeywords(root, '#');
  }

  /** Every keyword of every subschema is one this validator implements (else it throws). */
  private checkKeywords(s: unknown, at: string): void {
    if (typeof s === 'boolean') return;
    if (!isObject(s)) throw new Error(`${at}: a schema must be an object or a boolean`);
    for (const [k, v] of Object.entries(s)) {
      if (!KEYWORDS.has(k) && !ANNOTATIONS.has(k)) throw new Error(`${at}: keyword "${k}" is not supported by this validator`);
      if (k === '$defs' || k === 'properties') for (const [n, sub] of Object.entries(v as object)) this.checkKeywords(sub, `${at}/${k}/${n}`);
      else if (k === 'items' || (k === 'additionalProperties' && typeof v !== 'boolean')) this.checkKeywords(v, `${at}/${k}`);
      else if (k === 'oneOf' || k === 'anyOf' || k === 'allOf') (v as unknown[]).forEach((sub, i) => this.checkKeywords(sub, `${at}/${k}/${i}`));
      else if (k === '$ref' && !/^#\/\$defs\/[^/]+$/.test(String(v))) throw new Error(`${at}: only local references "#/$defs/name" are supported, got ${String(v)}`);
    }
  }

  private resolve(ref: string): Schema {
    const name = ref.slice('#/$defs/'.length);
    const defs = this.root.$defs as Record<string, Schema> | undefined;
    const s = defs?.[name];
    if (s === undefined) throw new Error(`unresolved reference ${ref}`);
    return s;
  }

  /** Index of the alternative whose `const` property the value matches, or -1. */
  private discriminated(alternatives: Schema[], v: unknown): number {
    if (!isObject(v)) return -1;
    const props = alternatives.map((a) => {
      const s = typeof a === 'object' && typeof a.$ref === 'string' ? this.resolve(a.$ref) : a;
      return typeof s === 'object' && isObject(s.properties) ? (s.properties as Record<string, unknown>) : {};
    });
    for (const key of Object.keys(v)) {
      const hit = props.findIndex((p) => isObject(p[key]) && 'const' in (p[key] as object) && jsonEqual((p[key] as { const: unknown }).const, v[key]));
      if (hit >= 0 && props.every((p) => isObject(p[key]) && 'const' in (p[key] as object))) return hit;
    }
    return -1;
  }

  validate(instance: unknown): SchemaError[] {
    return this.check(this.root, instance, '');
  }

  private check(schema: Schema, v: unknown, path: string): SchemaError[] {
    if (schema === true) return [];
    if (schema === false) return [{ path, message: 'no value is allowed here' }];
    const s = schema;
    const out: SchemaError[] = [];
    const fail = (message: string, at = path) => out.push({ path: at, message });
    if (typeof s.$ref === 'string') out.push(...this.check(this.resolve(s.$ref), v, path));
    if (s.type !== undefined) {
      const types = Array.isArray(s.type) ? (s.type as string[]) : [s.type as string];
      if (!types.some((t) => hasType(v, t))) {
        fail(`expected ${types.join(' or ')}, got ${typeOf(v)}`);
        return out; // the other keywords would only repeat the type error
      }
    }
    if ('const' in s && !jsonEqual(v, s.const)) fail(`must be ${JSON.stringify(s.const)}`);
    if (Array.isArray(s.enum) && !s.enum.some((e) => jsonEqual(v, e))) fail(`must be one of ${s.enum.map((e) => JSON.stringify(e)).join(', ')}`);
    if (typeof v === 'number') {
      if (typeof s.minimum === 'number' && !(v >= s.minimum)) fail(`must be at least ${s.minimum}`);
      if (typeof s.maximum === 'number' && !(v <= s.maximum)) fail(`must be at most ${s.maximum}`);
      if (typeof s.exclusiveMinimum === 'number' && !(v > s.exclusiveMinimum)) fail(`must be greater than ${s.exclusiveMinimum}`);
      if (typeof s.exclusiveMaximum === 'number' && !(v < s.exclusiveMaximum)) fail(`must be less than ${s.exclusiveMaximum}`);
    }
    if (typeof v === 'string') {
      // Length in code points, as the specification counts it.
      if (typeof s.minLength === 'number' && [...v].length < s.minLength) fail(`must have at least ${s.minLength} characters`);
      if (typeof s.pattern === 'string' && !new RegExp(s.pattern, 'u').test(v)) fail(`must match /${s.pattern}/`);
    }
    if (Array.isArray(v)) {
      if (typeof s.minItems === 'number' && v.length < s.minItems) fail(`must have at least ${s.minItems} items`);
      if (typeof s.maxItems === 'number' && v.length > s.maxItems) fail(`must have at most ${s.maxItems} items`);
      if (s.items !== undefined) v.forEach((x, i) => out.push(...this.check(s.items as Schema, x, pointer(path, i))));
    }
    if (isObject(v)) {
      const props = (s.properties ?? {}) as Record<string, Schema>;
      if (Array.isArray(s.required)) for (const k of s.required as string[]) if (!(k in v)) fail(`missing required property "${k}"`);
      if (typeof s.minProperties === 'number' && Object.keys(v).length < s.minProperties) fail(`must have at least ${s.minProperties} properties`);
      for (const [k, x] of Object.entries(v)) {
        if (Object.prototype.hasOwnProperty.call(props, k)) out.push(...this.check(props[k], x, pointer(path, k)));
        else if (s.additionalProperties === false) fail(`unknown property "${k}"`, pointer(path, k));
        else if (isObject(s.additionalProperties)) out.push(...this.check(s.additionalProperties as Schema, x, pointer(path, k)));
      }
    }
    if (Array.isArray(s.allOf)) for (const sub of s.allOf as Schema[]) out.push(...this.check(sub, v, path));
    if (Array.isArray(s.anyOf) && !(s.anyOf as Schema[]).some((sub) => this.check(sub, v, path).length === 0)) fail('matches none of the allowed forms (anyOf)');
    if (Array.isArray(s.oneOf)) {
      const results = (s.oneOf as Schema[]).map((sub) => this.check(sub, v, path));
      const passing = results.filter((r) => r.length === 0).length;
      if (passing === 0) {
        // Report the alternative the value names by a discriminating const (a shape's "type"),
        // else the one that came closest (fewest errors), as editors do. Messages only.
        const named = this.discriminated(s.oneOf as Schema[], v);
        const best = named >= 0 ? results[named] : results.reduce((a, b) => (b.length < a.length ? b : a));
        fail(`matches none of the ${results.length} allowed forms (oneOf); closest: ${best.map((e) => `${e.path || '/'} ${e.message}`).join('; ')}`);
      } else if (passing > 1) fail(`matches ${passing} of the allowed forms (oneOf), exactly one is allowed`);
    }
    return out;
  }
}
