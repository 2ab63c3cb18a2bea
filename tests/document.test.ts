/**
 * Section document v1: malformed documents of every kind get a message that names the place.
 * (Behavioural checks of our own format; no outside source applies.)
 */
import { describe, expect, it } from 'vitest';
import { DEMO_DOCUMENT, convertDocumentUnits, evaluateDocument, formatIssue, parseDocument, validateDocument } from '../src';
import { close } from './helpers';

const base = { format: 'kern-section', version: 1, units: 'mm' };
const withShapes = (shapes: unknown[]) => ({ ...base, shapes });

function errorsOf(v: unknown): string[] {
  const r = validateDocument(v);
  return r.ok ? [] : r.errors.map(formatIssue);
}

describe('validation', () => {
  it('accepts the example of the format and the demo', () => {
    const example = withShapes([
      { id: 'plate', type: 'polygon', points: [[0, 0], [200, 0], [200, 100], [0, 100]] },
      { id: 'bore', type: 'circle', center: [100, 50], radius: 20, op: 'subtract' },
      { id: 'lug', type: 'path', start: [0, 0], segments: [{ to: [60, 0] }, { to: [0, 60], via: [42.43, 42.43] }, { to: [0, 0] }] },
    ]);
    expect(errorsOf(example)).toEqual([]);
    expect(errorsOf(DEMO_DOCUMENT)).toEqual([]);
  });

  it('refuses non-JSON text and non-objects', () => {
    const r = parseDocument('{"format": "kern-section", ');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0].message).toMatch(/not valid JSON/);
    expect(errorsOf([1, 2])[0]).toMatch(/must be a JSON object/);
  });

  it('refuses unknown formats, versions and units', () => {
    expect(errorsOf({ ...base, format: 'other', shapes: [] })[0]).toMatch(/^format: expected "kern-section"/);
    expect(errorsOf({ ...base, version: 3, shapes: [] })[0]).toMatch(/^version: unknown version 3; this Kern reads versions 1, 2/);
    expect(errorsOf({ ...base, version: '1', shapes: [] })[0]).toMatch(/^version: unknown version "1"/);
    expect(errorsOf({ ...base, units: 'furlong', shapes: [] })[0]).toMatch(/^units: unknown units "furlong"/);
  });

  it('refuses non-finite numbers with their path', () => {
    const doc = withShapes([{ id: 'c', type: 'circle', center: [0, Infinity], radius: 1 }]);
    expect(errorsOf(doc)).toContain('shapes[0].center[1]: coordinate must be a finite number, got Infinity');
    const doc2 = withShapes([{ id: 'c', type: 'circle', center: [0, 0], radius: NaN }]);
    expect(errorsOf(doc2)[0]).toMatch(/^shapes\[0\]\.radius: radius must be a finite number/);
    // 1e400 in JSON text parses to Infinity.
    const r = parseDocument('{"format":"kern-section","version":1,"units":"mm","shapes":[{"id":"p","type":"polygon","points":[[0,0],[1e400,0],[0,1]]}]}');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(formatIssue(r.errors[0])).toBe('shapes[0].points[1][0]: coordinate must be a finite number, got Infinity');
  });

  it('refuses zero radius, short polygons and zero-area polygons', () => {
    expect(errorsOf(withShapes([{ id: 'c', type: 'circle', center: [0, 0], radius: 0 }]))).toEqual(['shapes[0].radius: radius must be greater than 0, got 0']);
    expect(errorsOf(withShapes([{ id: 'p', type: 'polygon', points: [[0, 0], [1, 1]] }]))).toEqual(['shapes[0].points: a polygon needs at least 3 points, got 2']);
    expect(errorsOf(withShapes([{ id: 'p', type: 'polygon', points: [[0, 0], [1, 1], [2, 2]] }]))[0]).toMatch(/enclose no area/);
  });

  it('refuses open paths and collinear arcs, naming the segment', () => {
    const open = withShapes([{ id: 'q', type: 'path', start: [0, 0], segments: [{ to: [10, 0] }, { to: [10, 10] }] }]);
    expect(errorsOf(open)[0]).toBe('shapes[0].segments: path does not close: it ends at (10, 10) but starts at (0, 0)');
    const collinear = withShapes([
      { id: 'q', type: 'path', start: [0, 0], segments: [{ to: [10, 0] }, { to: [10, 10] }, { to: [0, 10] }, { to: [0, 0] }, { to: [0, 0] }] },
      {
        id: 'r',
        type: 'path',
        start: [0, 0],
        segments: [{ to: [10, 0] }, { to: [10, 10] }, { to: [5, 10] }, { to: [0, 10] }, { to: [0, 0], via: [0, 5] }],
      },
    ]);
    expect(errorsOf(collinear)).toEqual(['shapes[1].segments[4].via: arc points are collinear']);
  });

  it('refuses unknown shape types and operations, missing and duplicate ids', () => {
    const errs = errorsOf(
      withShapes([
        { id: 'a', type: 'blob' },
        { id: 'b', type: 'circle', center: [0, 0], radius: 1, op: 'xor' },
        { id: '', type: 'circle', center: [0, 0], radius: 1 },
        { id: 'b', type: 'circle', center: [0, 0], radius: 1 },
      ]),
    );
    expect(errs[0]).toMatch(/^shapes\[0\]\.type: unknown shape type "blob"/);
    expect(errs).toContain('shapes[1].op: unknown operation "xor"; use one of add, subtract, intersect');
    expect(errs).toContain('shapes[2].id: every shape needs a non-empty string id');
    expect(errs).toContain('shapes[3].id: id "b" is already used by shapes[1]');
  });

  it('reports every problem, not only the first', () => {
    const errs = errorsOf(
      withShapes([
        { id: 'c', type: 'circle', center: [0, 0], radius: -1 },
        { id: 'p', type: 'polygon', points: [[0, 0]] },
      ]),
    );
    expect(errs.length).toBe(2);
  });

  it('checks profile dimensions with their paths', () => {
    const errs = errorsOf(withShapes([{ id: 'w', type: 'i-beam', at: [0, 0], depth: 50, flangeWidth: 100, flangeThickness: 30, webThickness: 5, rootRadius: 0 }]));
    expect(errs[0]).toMatch(/^shapes\[0\]\.flangeThickness: /);
  });
});

describe('self-intersecting outlines', () => {
  it('are resolved by the even-odd rule and reported as a warning', () => {
    // A bow tie: two triangles meeting at (1, 1), each of area 1 (base 2, height 1).
    const r = validateDocument(withShapes([{ id: 'bow', type: 'polygon', points: [[0, 0], [2, 2], [2, 0], [0, 2]] }]));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const ev = evaluateDocument(r.doc);
    expect(ev.warnings.map(formatIssue).join('\n')).toMatch(/shapes\[0\]: the outline crosses or touches itself; it was resolved by the even-odd rule/);
    // Two triangles of base 2 and height 1 (Gere & Goodno, plane areas: A = bh/2 each).
    close(ev.props!.area, 2, 1e-12);
  });
});

describe('empty sections', () => {
  it('give a message, not NaN', () => {
    const ev = evaluateDocument(withShapes([]) as never);
    expect(ev.props).toBeNull();
    expect(ev.message).toMatch(/empty/);
    const sub = evaluateDocument(withShapes([{ id: 'c', type: 'circle', center: [0, 0], radius: 1, op: 'subtract' }]) as never);
    expect(sub.props).toBeNull();
    expect(sub.message).toMatch(/no area/);
    // Intersection of two disjoint shapes.
    const dis = evaluateDocument(
      withShapes([
        { id: 'a', type: 'circle', center: [0, 0], radius: 1 },
        { id: 'b', type: 'circle', center: [5, 0], radius: 1, op: 'intersect' },
      ]) as never,
    );
    expect(dis.props).toBeNull();
    expect(dis.message).toMatch(/no area/);
  });
});

describe('sizes lost in their coordinates', () => {
  it('a tiny circle far from the origin is refused (regression: fuzz seed 834176907)', () => {
    expect(errorsOf(withShapes([{ id: 'c', type: 'circle', center: [0, 1e-9], radius: 2.07e-150 }]))[0]).toMatch(/^shapes\[0\]\.radius: radius .* too small/);
  });
  it('a tiny polygon far from the origin gives a message, not NaN', () => {
    const ev = evaluateDocument(withShapes([{ id: 'p', type: 'polygon', points: [[1e6, 1e6], [1e6 + 1e-12, 1e6], [1e6, 1e6 + 1e-12]] }]) as never);
    expect(ev.props).toBeNull();
    expect(ev.message).toMatch(/too small|no area/);
  });
});

describe('units', () => {
  it('converting a document scales every property by the right power', () => {
    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
    const mm = evaluateDocument(DEMO_DOCUMENT).props!;
    const inch = evaluateDocument(convertDocumentUnits(DEMO_DOCUMENT, 'in')).props!;
    close(inch.area, mm.area / 25.4 ** 2, 1e-12);
    close(inch.Ix, mm.Ix / 25.4 ** 4, 1e-12);
    close(inch.Zx, mm.Zx / 25.4 ** 3, 1e-12);
    close(inch.theta, mm.theta, 1e-9, 90);
    const back = convertDocumentUnits(convertDocumentUnits(DEMO_DOCUMENT, 'ft'), 'mm');
    close(evaluateDocument(back).props!.Ix, mm.Ix, 1e-12);
  });
});
