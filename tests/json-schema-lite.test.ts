/**
 * The test validator itself (tests/json-schema-lite.ts), on small schemas whose verdicts follow
 * from the specification's wording (JSON Schema Validation, draft 2020-12, sections 6.1–6.5;
 * Core, sections 10.2 and 10.3): each keyword accepts what it should and refuses what it should,
 * with the path of the offending value, and a keyword it does not implement is refused outright.
 */
import { describe, expect, it } from 'vitest';
import { jsonEqual, SchemaValidator } from './json-schema-lite';

const v = (schema: Record<string, unknown>) => new SchemaValidator(schema);
const paths = (schema: Record<string, unknown>, value: unknown) => v(schema).validate(value).map((e) => e.path);

describe('json-schema-lite', () => {
  it('type: number excludes strings, integer excludes fractions, object excludes arrays and null', () => {
    expect(paths({ type: 'number' }, 3.5)).toEqual([]);
    expect(paths({ type: 'number' }, '3.5')).toEqual(['']);
    expect(paths({ type: 'integer' }, 3)).toEqual([]);
    expect(paths({ type: 'integer' }, 3.5)).toEqual(['']);
    expect(paths({ type: 'object' }, [])).toEqual(['']);
    expect(paths({ type: 'object' }, null)).toEqual(['']);
    expect(paths({ type: ['string', 'null'] }, null)).toEqual([]);
  });

  it('const and enum compare JSON values, objects regardless of key order', () => {
    expect(paths({ const: { a: 1, b: [2] } }, { b: [2], a: 1 })).toEqual([]);
    expect(paths({ const: 2 }, '2')).toEqual(['']);
    expect(paths({ enum: ['mm', 'cm'] }, 'in')).toEqual(['']);
    expect(jsonEqual([1, { x: 2 }], [1, { x: 2 }])).toBe(true);
    expect(jsonEqual([1, 2], [2, 1])).toBe(false);
  });

  it('bounds: minimum and maximum include the bound, exclusive ones do not', () => {
    const s = { type: 'number', minimum: 0, exclusiveMaximum: 0.5 };
    expect(paths(s, 0)).toEqual([]);
    expect(paths(s, 0.5)).toEqual(['']);
    expect(paths({ exclusiveMinimum: 0 }, 0)).toEqual(['']);
    expect(paths({ maximum: 100 }, 100)).toEqual([]);
    // Bounds apply to numbers only (a string passes a numeric bound; its type is another keyword).
    expect(paths({ minimum: 1 }, 'a')).toEqual([]);
  });

  it('objects: required, properties with paths, additionalProperties false or a schema, minProperties', () => {
    const s = { type: 'object', required: ['a'], properties: { a: { type: 'number' } }, additionalProperties: false };
    expect(paths(s, { a: 1 })).toEqual([]);
    expect(paths(s, {})).toEqual(['']);
    expect(paths(s, { a: 'x' })).toEqual(['/a']);
    expect(paths(s, { a: 1, b: 2 })).toEqual(['/b']);
    expect(paths({ type: 'object', additionalProperties: { type: 'string' } }, { x: 'ok', y: 3 })).toEqual(['/y']);
    expect(paths({ type: 'object', minProperties: 2 }, { a: 1 })).toEqual(['']);
    // A key with "/" or "~" is escaped in the pointer (RFC 6901).
    expect(paths({ type: 'object', additionalProperties: false }, { 'a/b~': 1 })).toEqual(['/a~1b~0']);
  });

  it('arrays: items with indices in the path, minItems and maxItems', () => {
    const point = { type: 'array', items: { type: 'number' }, minItems: 2, maxItems: 2 };
    expect(paths(point, [1, 2])).toEqual([]);
    expect(paths(point, [1])).toEqual(['']);
    expect(paths(point, [1, 2, 3])).toEqual(['']);
    expect(paths(point, [1, 'y'])).toEqual(['/1']);
  });

  it('strings: pattern is searched, not anchored; minLength counts code points', () => {
    expect(paths({ type: 'string', pattern: '\\S' }, '  a ')).toEqual([]);
    expect(paths({ type: 'string', pattern: '\\S' }, '   ')).toEqual(['']);
    expect(paths({ minLength: 2 }, 'Ø')).toEqual(['']);
    expect(paths({ minLength: 1 }, '😀')).toEqual([]);
  });

  it('oneOf needs exactly one match, anyOf at least one, allOf every one', () => {
    const s = { oneOf: [{ type: 'number' }, { type: 'number', minimum: 0 }] };
    expect(paths(s, -1)).toEqual([]);
    expect(paths(s, 1)).toEqual(['']); // both match
    expect(paths(s, 'x')).toEqual(['']); // none matches
    expect(paths({ anyOf: [{ type: 'string' }, { type: 'number' }] }, true)).toEqual(['']);
    expect(paths({ allOf: [{ minimum: 0 }, { maximum: 1 }] }, 2)).toEqual(['']);
  });

  it('$ref resolves local definitions, recursively', () => {
    const s = { $defs: { node: { type: 'object', properties: { next: { $ref: '#/$defs/node' }, v: { type: 'number' } }, additionalProperties: false } }, $ref: '#/$defs/node' };
    expect(paths(s, { v: 1, next: { v: 2, next: { v: 3 } } })).toEqual([]);
    expect(paths(s, { v: 1, next: { v: 2, next: { v: 'x' } } })).toEqual(['/next/next/v']);
  });

  it('refuses a schema with a keyword it does not implement, or a remote reference', () => {
    expect(() => v({ type: 'string', format: 'date' })).toThrow(/format/);
    expect(() => v({ properties: { a: { if: {} } } })).toThrow(/"if"/);
    expect(() => v({ $ref: 'other.json#/x' })).toThrow(/local/);
  });
});
