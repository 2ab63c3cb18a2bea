/**
 * The published JSON Schemas of the section document (public/kern-section.schema.json for
 * version 2, public/kern-section.v1.schema.json for version 1): they are the generator's output
 * (src/document/schema.ts), they accept every example and fixture that Kern reads and refuse the
 * malformed ones, and they are never stricter than Kern, except that they flag fields Kern does not
 * know. Checked with the small validator in tests/json-schema-lite.ts. Project rules, no outside
 * source (the JSON Schema keywords follow draft 2020-12).
 */
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_DOCUMENT, parseDocument, serialiseDocumentText, SHAPE_TYPES, validateDocument } from '../src';
import { SCHEMA_FILE, sectionDocumentSchema, sectionDocumentSchemaText } from '../src/document/schema';
import { SchemaValidator } from './json-schema-lite';

const ROOT = join(__dirname, '..');
const read = (p: string) => readFileSync(join(ROOT, p), 'utf8');
const published = (v: 1 | 2) => JSON.parse(read(join('public', SCHEMA_FILE[v])));
const validators = { 1: new SchemaValidator(published(1)), 2: new SchemaValidator(published(2)) };

/** Schema errors of a document against the schema of the version it states. */
function schemaErrors(doc: unknown): string[] {
  const version = (doc as { version?: unknown }).version === 1 ? 1 : 2;
  return validators[version].validate(doc).map((e) => `${e.path || '/'}: ${e.message}`);
}

const EXAMPLES = readdirSync(join(ROOT, 'public', 'examples')).filter((f) => f.endsWith('.json')).map((f) => join('public', 'examples', f));
const VALID_FIXTURES = ['tests/fixtures/plate-with-bore.json', 'tests/fixtures/plate-proposals.json'];
const MALFORMED_FIXTURES = ['tests/fixtures/open-path.json'];

describe('the published schemas', () => {
  it('are the generator’s output, for both versions', () => {
    expect(read('public/kern-section.schema.json')).toBe(sectionDocumentSchemaText(2));
    expect(read('public/kern-section.v1.schema.json')).toBe(sectionDocumentSchemaText(1));
  });

  it('`kern schema` prints them', () => {
    const run = (...a: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', 'schema', ...a], { encoding: 'utf8', cwd: ROOT });
    const v2 = run();
    expect(v2.status).toBe(0);
    expect(v2.stdout).toBe(read('public/kern-section.schema.json'));
    expect(run('--version', '1').stdout).toBe(read('public/kern-section.v1.schema.json'));
    const bad = run('--version', '3');
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/--version must be 1 or 2/);
  });

  it('describe every shape kind: version 2 all of them, version 1 those it had', () => {
    const kinds = (v: 1 | 2) => Object.keys(sectionDocumentSchema(v).$defs as object).filter((k) => k.startsWith('shape-')).map((k) => k.slice(6)).sort();
    // Every kind the engine registers (a new kind fails here until src/document/schema.ts describes it).
    expect(kinds(2)).toEqual([...SHAPE_TYPES].sort());
    expect(kinds(1)).toEqual(kinds(2).filter((k) => k !== 'line' && k !== 'strip'));
  });
});

describe('documents against the schema', () => {
  it('accepts every example on the shelf', () => {
    expect(EXAMPLES.length).toBeGreaterThanOrEqual(5);
    for (const f of EXAMPLES) expect(schemaErrors(JSON.parse(read(f))), f).toEqual([]);
  });

  it('accepts the valid fixtures (version 1 and 2), the demo, and what Kern saves', () => {
    for (const f of VALID_FIXTURES) {
      expect(parseDocument(read(f)).ok, f).toBe(true);
      expect(schemaErrors(JSON.parse(read(f))), f).toEqual([]);
    }
    expect(schemaErrors(JSON.parse(serialiseDocumentText(DEMO_DOCUMENT)))).toEqual([]);
    // A version-1 file saved again is version 2, with its ids; the saved text fits the version-2 schema.
    for (const f of [...VALID_FIXTURES, ...EXAMPLES]) {
      const r = parseDocument(read(f));
      if (!r.ok) throw new Error(f);
      expect(schemaErrors(JSON.parse(serialiseDocumentText(r.doc))), f).toEqual([]);
    }
  });

  it('refuses the malformed fixtures, as Kern does', () => {
    for (const f of MALFORMED_FIXTURES) {
      expect(parseDocument(read(f)).ok, f).toBe(false);
      expect(schemaErrors(JSON.parse(read(f))), f).not.toEqual([]);
    }
    // open-path.json: the circle's radius is 0.
    expect(schemaErrors(JSON.parse(read('tests/fixtures/open-path.json')))).toContain('/shapes/1: matches none of the 11 allowed forms (oneOf); closest: /shapes/1/radius must be greater than 0');
  });

  it('refuses malformed documents with the path of the fault, each one refused by Kern too', () => {
    const base = { format: 'kern-section', version: 2, units: 'mm', shapes: [{ type: 'rectangle', at: [0, 0], width: 10, height: 5 }] };
    const bad: [string, unknown, RegExp][] = [
      ['wrong format', { ...base, format: 'kern' }, /^\/format: must be "kern-section"/],
      ['unknown units', { ...base, units: 'inch' }, /^\/units: must be one of/],
      ['no shapes', { ...base, shapes: undefined }, /^\/: missing required property "shapes"/],
      ['negative width', { ...base, shapes: [{ type: 'rectangle', at: [0, 0], width: -10, height: 5 }] }, /width must be greater than 0/],
      ['point of three numbers', { ...base, shapes: [{ type: 'circle', center: [0, 0, 0], radius: 2 }] }, /\/shapes\/0\/center must have at most 2 items/],
      ['polygon of two points', { ...base, shapes: [{ type: 'polygon', points: [[0, 0], [1, 1]] }] }, /points must have at least 3 items/],
      ['unknown kind', { ...base, shapes: [{ type: 'ellipse', center: [0, 0] }] }, /\/shapes\/0: matches none/],
      ['empty id', { ...base, shapes: [{ id: ' ', type: 'circle', center: [0, 0], radius: 1 }] }, /id must match/],
      ['line with an operation', { ...base, shapes: [{ type: 'line', start: [0, 0], segments: [{ to: [1, 0] }], op: 'subtract' }] }, /op must be "add"/],
      ['material without E', { ...base, materials: [{ id: 'S355', name: 'Steel', density: 7850, fy: 355 }], reference: 'S355' }, /^\/materials\/0: missing required property "E"/],
      ['limit on an unknown property', { ...base, limits: [{ property: 'Iz', maxLossPercent: 10 }] }, /^\/limits\/0\/property: must be one of/],
      ['limit that sets nothing', { ...base, limits: [{ property: 'Ix' }] }, /^\/limits\/0: must have at least 2 properties/],
      ['loss over 100 %', { ...base, limits: [{ property: 'Ix', maxLossPercent: 120 }] }, /maxLossPercent: must be at most 100/],
      ['proposal without a name', { ...base, variants: [{ shapes: [] }] }, /^\/variants\/0: missing required property "name"/],
      ['title field not text', { ...base, title: { project: 7 } }, /^\/title\/project: expected string/],
      ['unknown load', { ...base, loads: { T: 5 } }, /^\/loads\/T: unknown property/],
    ];
    for (const [what, written, message] of bad) {
      const doc = JSON.parse(JSON.stringify(written)); // as a file holds it (no undefined fields)
      expect(validateDocument(doc).ok, `Kern refuses: ${what}`).toBe(false);
      const errs = schemaErrors(doc);
      expect(errs.some((e) => message.test(e)), `${what}: ${errs.join(' | ')}`).toBe(true);
    }
  });

  it('flags a field Kern does not know (Kern reads past it): the one place the schema is stricter', () => {
    const doc = { format: 'kern-section', version: 2, units: 'mm', shapes: [{ type: 'circle', center: [0, 0], raduis: 5, radius: 5 }] };
    expect(validateDocument(doc).ok).toBe(true);
    expect(schemaErrors(doc).join(' ')).toMatch(/unknown property "raduis"/);
  });
});

/** Every way of spoiling one value: delete it, or put a wrong or borderline value in its place. */
const SPOILERS: ((v: unknown) => unknown)[] = [() => undefined, () => null, () => -1, () => 0, () => 'x', () => [], () => ({}), () => true, () => 0.5, () => 100.5];

function* mutations(value: unknown, path: (string | number)[] = []): Generator<[(string | number)[], (v: unknown) => unknown]> {
  if (path.length > 0) for (const s of SPOILERS) yield [path, s];
  if (Array.isArray(value)) for (let i = 0; i < value.length; i++) yield* mutations(value[i], [...path, i]);
  else if (value && typeof value === 'object') for (const k of Object.keys(value)) yield* mutations((value as Record<string, unknown>)[k], [...path, k]);
}

function withValue(doc: unknown, path: (string | number)[], f: (v: unknown) => unknown): unknown {
  if (path.length === 0) return f(doc);
  const [head, ...rest] = path;
  if (Array.isArray(doc)) {
    const next = doc.slice();
    const v = withValue(doc[head as number], rest, f);
    if (v === undefined && rest.length === 0) next.splice(head as number, 1);
    else next[head as number] = v;
    return next;
  }
  const next = { ...(doc as Record<string, unknown>) };
  const v = withValue(next[head as string], rest, f);
  if (v === undefined) delete next[head as string];
  else next[head as string] = v;
  return next;
}

describe('never stricter than Kern', () => {
  it('every one-value spoiling of the examples and fixtures that Kern reads, the schema accepts', () => {
    let tried = 0, bothRefuse = 0;
    const offenders: string[] = [];
    for (const f of [...EXAMPLES, ...VALID_FIXTURES]) {
      const doc = JSON.parse(read(f));
      for (const [path, spoil] of mutations(doc)) {
        // Changing the version moves the file to the other schema, whose fields differ by design.
        if (path[0] === 'version' || path[0] === '$schema') continue;
        const m = withValue(doc, path, spoil);
        tried++;
        const kern = validateDocument(m).ok;
        const schema = schemaErrors(m).length === 0;
        if (kern && !schema) offenders.push(`${f} ${path.join('.')} → ${JSON.stringify(spoil(undefined))}: ${schemaErrors(m).join('; ')}`);
        if (!kern && !schema) bothRefuse++;
      }
    }
    console.log(`schema: ${tried} spoiled documents, ${bothRefuse} refused by both Kern and the schema, ${offenders.length} read by Kern but refused by the schema`);
    expect(offenders).toEqual([]);
    expect(bothRefuse).toBeGreaterThan(tried / 3);
  });
});
