/**
 * DXF import: hand-written DXF text (group code / value lines as in the AutoCAD DXF Reference,
 * 2012) checked against composite closed forms for the sections they draw.
 * Closed forms: Gere & Goodno, Mechanics of Materials, Appendix E (rectangle, circle, semicircle,
 * quarter circle, circular segment), combined by the composite-area method (Hibbeler, Statics,
 * "composite bodies"; parallel-axis theorem).
 */
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { importDxf, type DxfImportOk } from '../src/exchange/dxf-import';
import { evaluateDocument, sectionProperties, validateDocument, type SectionDocument, type Shape, type Units } from '../src';
import { close } from './helpers';

/** DXF text from alternating group codes and values (one per line, as in the file). */
function dxf(...groups: (string | number)[]): string {
  return groups.map(String).join('\n') + '\n';
}
const HEADER_MM = ['0', 'SECTION', '2', 'HEADER', '9', '$INSUNITS', '70', '4', '0', 'ENDSEC'];
const wrap = (entities: (string | number)[], header: (string | number)[] = HEADER_MM) =>
  dxf(...header, '0', 'SECTION', '2', 'ENTITIES', ...entities, '0', 'ENDSEC', '0', 'EOF');

function ok(r: ReturnType<typeof importDxf>): DxfImportOk {
  if (!r.ok) expect.fail(`import failed: ${r.error}`);
  return r;
}

function docOf(shapes: Shape[], units: Units = 'mm'): SectionDocument {
  return { format: 'kern-section', version: 2, units, shapes };
}

function evaluated(r: DxfImportOk) {
  const doc = docOf(r.shapes, r.units ?? 'mm');
  const v = validateDocument(JSON.parse(JSON.stringify(doc)));
  expect(v.ok, v.ok ? '' : JSON.stringify(v.errors)).toBe(true);
  const ev = evaluateDocument(doc);
  expect(ev.props, ev.message ?? '').not.toBeNull();
  return ev.props!;
}

// ---------------------------------------------------------------------------------------------
// 1. Plate with holes, LWPOLYLINE with bulge arcs.
// 200 × 120 plate (drawn clockwise), a Ø40 hole at (50, 60) as a two-vertex LWPOLYLINE with
// bulge 1 (two half circles), and a 40 × 30 slot with R15 ends centred at (140, 60).
const PLATE = `0
SECTION
2
HEADER
9
$ACADVER
1
AC1015
9
$INSUNITS
70
4
0
ENDSEC
0
SECTION
2
ENTITIES
0
LWPOLYLINE
5
2A
100
AcDbEntity
8
PLATE
100
AcDbPolyline
90
4
70
1
10
0
20
0
10
0
20
120
10
200
20
120
10
200
20
0
0
LWPOLYLINE
5
2B
8
HOLES
90
2
70
1
10
30
20
60
42
1
10
70
20
60
42
1
0
LWPOLYLINE
5
2C
8
HOLES
90
4
70
1
10
120
20
45
10
160
20
45
42
1.0
10
160
20
75
10
120
20
75
42
1.0
0
ENDSEC
0
EOF
`;

describe('plate with holes (LWPOLYLINE with bulges)', () => {
  // Composite closed form (Gere & Goodno App. E: rectangle bh³/12, circle πr⁴/4, semicircle
  // πr⁴/8 about its diameter with centroid 4r/3π from it; parallel-axis theorem).
  const Ar = 200 * 120, Ac = Math.PI * 20 ** 2, r = 15, Ah = (Math.PI * r * r) / 2, e = (4 * r) / (3 * Math.PI);
  const As = 40 * 30 + 2 * Ah;
  const A = Ar - Ac - As;
  const xc = (Ar * 100 - Ac * 50 - As * 140) / A;
  const Ix = (200 * 120 ** 3) / 12 - (Math.PI * 20 ** 4) / 4 - ((40 * 30 ** 3) / 12 + (Math.PI * r ** 4) / 4);
  const Ihc = (Math.PI * r ** 4) / 8 - Ah * e * e; // half disk about its own centroidal axis
  const Iy =
    (120 * 200 ** 3) / 12 + Ar * (100 - xc) ** 2 -
    ((Math.PI * 20 ** 4) / 4 + Ac * (50 - xc) ** 2) -
    ((30 * 40 ** 3) / 12 + 1200 * (140 - xc) ** 2 + Ihc + Ah * (160 + e - xc) ** 2 + Ihc + Ah * (120 - e - xc) ** 2);

  test('three loops: one outline and two holes; units from $INSUNITS', () => {
    const r1 = ok(importDxf(PLATE));
    expect(r1.units).toBe('mm');
    expect(r1.unitsFromFile).toBe('mm');
    expect(r1.problems).toEqual([]);
    expect(r1.shapes).toHaveLength(3);
    expect(r1.shapes[0].op ?? 'add').toBe('add');
    expect(r1.shapes.slice(1).map((s) => s.op)).toEqual(['subtract', 'subtract']);
  });

  test('A, centroid, Ix, Iy, Ixy equal the composite closed form', () => {
    const r1 = ok(importDxf(PLATE));
    for (const p of [sectionProperties(r1.region), evaluated(r1)]) {
      close(p.area, A, 1e-12); // composite method, Gere & Goodno App. E
      close(p.centroid.x, xc, 1e-12);
      close(p.centroid.y, 60, 1e-12); // symmetry about y = 60
      close(p.Ix, Ix, 1e-11);
      close(p.Iy, Iy, 1e-11);
      close(p.Ixy, 0, 1e-12, Ix); // symmetric about y = 60: Ixy = 0 (Gere & Goodno, product of inertia)
    }
  });

  test('entity order does not matter', () => {
    const [head, rest] = PLATE.split('0\nLWPOLYLINE\n5\n2A');
    const [outer, holesAndTail] = ['0\nLWPOLYLINE\n5\n2A' + rest.split('0\nLWPOLYLINE\n5\n2B')[0], '0\nLWPOLYLINE\n5\n2B' + rest.split('0\nLWPOLYLINE\n5\n2B')[1]];
    const [holes, tail] = holesAndTail.split('0\nENDSEC\n0\nEOF');
    const swapped = head + holes + outer + '0\nENDSEC\n0\nEOF' + tail;
    const p = sectionProperties(ok(importDxf(swapped)).region);
    close(p.area, A, 1e-12); // composite method, as above
    close(p.Iy, Iy, 1e-11);
  });
});

// ---------------------------------------------------------------------------------------------
// 2. A rounded rectangle drawn as separate LINE and ARC entities, in random order and direction,
// with a Ø16 hole drawn as two ARCs. 100 × 60, corner radius 10, centred on the origin; hole at (20, 5).
function line(h: string, x1: number, y1: number, x2: number, y2: number) {
  return ['0', 'LINE', '5', h, '8', 'OUTLINE', '10', x1, '20', y1, '30', 0, '11', x2, '21', y2, '31', 0];
}
function arc(h: string, cx: number, cy: number, r: number, a0: number, a1: number, extra: (string | number)[] = []) {
  return ['0', 'ARC', '5', h, '8', 'OUTLINE', '10', cx, '20', cy, '30', 0, '40', r, '50', a0, '51', a1, ...extra];
}
/** Deterministic shuffle (mulberry32), so a failing order can be replayed. */
function shuffle<T>(items: T[], seed: number): T[] {
  let s = seed >>> 0;
  const rnd = () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const a = items.slice();
  for (let i = a.length - 1; i > 0; i--) {
    const j = Math.floor(rnd() * (i + 1));
    [a[i], a[j]] = [a[j], a[i]];
  }
  return a;
}

describe('LINE and ARC entities in random order', () => {
  const R = 10, rh = 8;
  const entities = (seed: number) => {
    const lines = [
      line('L1', -40, -30, 40, -30),
      line('L2', 50, -20, 50, 20),
      line('L3', 40, 30, -40, 30),
      line('L4', -50, 20, -50, -20),
    ].map((l, i) => {
      // Reverse some lines (swap the two end points) so directions are mixed.
      if ((seed >> i) & 1) return [...l.slice(0, 6), '10', l[13], '20', l[15], '30', 0, '11', l[7], '21', l[9], '31', 0];
      return l;
    });
    const arcs = [arc('A1', 40, -20, R, 270, 360), arc('A2', 40, 20, R, 0, 90), arc('A3', -40, 20, R, 90, 180), arc('A4', -40, -20, R, 180, 270)];
    const hole = [arc('H1', 20, 5, rh, 0, 180), arc('H2', 20, 5, rh, 180, 360)];
    return shuffle([...lines, ...arcs, ...hole], seed).flat();
  };
  // Composite closed form (Gere & Goodno App. E: rectangles; quarter circle πr⁴/16 about its
  // straight edges with centroid 4r/3π from each; circle πr⁴/4; parallel-axis theorem).
  const Aq = (Math.PI * R * R) / 4, e = (4 * R) / (3 * Math.PI), Iq = (Math.PI * R ** 4) / 16 - Aq * e * e;
  const Arr = 100 * 60 - (4 - Math.PI) * R * R;
  const IxRR = (100 * 40 ** 3) / 12 + 2 * ((80 * 10 ** 3) / 12 + 800 * 25 ** 2) + 4 * (Iq + Aq * (20 + e) ** 2);
  const IyRR = (40 * 100 ** 3) / 12 + 2 * ((10 * 80 ** 3) / 12) + 4 * (Iq + Aq * (40 + e) ** 2);
  const Ah = Math.PI * rh * rh, Ih = (Math.PI * rh ** 4) / 4;
  const A = Arr - Ah;
  const xc = -(Ah * 20) / A, yc = -(Ah * 5) / A;
  const Ix = IxRR + Arr * yc * yc - (Ih + Ah * (5 - yc) ** 2);
  const Iy = IyRR + Arr * xc * xc - (Ih + Ah * (20 - xc) ** 2);
  const Ixy = Arr * (0 - xc) * (0 - yc) - Ah * (20 - xc) * (5 - yc);

  for (const seed of [1, 2, 7, 12, 99, 2024]) {
    test(`seed ${seed}: joined into an outline and a hole with the closed-form properties`, () => {
      const r = ok(importDxf(wrap(entities(seed))));
      expect(r.problems).toEqual([]);
      expect(r.shapes.map((s) => s.op ?? 'add')).toEqual(['add', 'subtract']);
      for (const p of [sectionProperties(r.region), evaluated(r)]) {
        close(p.area, A, 1e-12); // composite method (Gere & Goodno App. E)
        close(p.centroid.x, xc, 1e-11);
        close(p.centroid.y, yc, 1e-11);
        close(p.Ix, Ix, 1e-11);
        close(p.Iy, Iy, 1e-11);
        close(p.Ixy, Ixy, 1e-9, Ix);
      }
    });
  }

  test('ends that miss by less than the tolerance are joined; a larger gap is not', () => {
    // Move one line end by 1e-5 (drawing extent 100: default tolerance 1e-4).
    const near = wrap([...line('L1', -40, -30, 40.00001, -30), ...line('L2', 50, -20, 50, 20), ...line('L3', 40, 30, -40, 30), ...line('L4', -50, 20, -50, -20),
      ...arc('A1', 40, -20, R, 270, 360), ...arc('A2', 40, 20, R, 0, 90), ...arc('A3', -40, 20, R, 90, 180), ...arc('A4', -40, -20, R, 180, 270)]);
    const r = ok(importDxf(near));
    expect(r.problems).toEqual([]);
    close(sectionProperties(r.region).area, Arr, 1e-6); // gap 1e-5 moves the area by about 1e-4 (composite form as above)
    const far = ok(importDxf(near, { tol: 1e-6 }));
    expect(far.shapes).toHaveLength(0);
    expect(far.problems.length).toBe(8);
    expect(far.problems.some((p) => /open end/.test(p.message))).toBe(true);
    // The message gives the size of the gap so the user knows what tolerance would close it.
    expect(far.problems.some((p) => /nearest other end is 0.00001 away/.test(p.message))).toBe(true);
  });
});

// ---------------------------------------------------------------------------------------------
describe('an unclosed chain is reported with layer and handle and left out', () => {
  const text = wrap([
    // A U of three lines on layer OPEN (the fourth side is missing).
    '0', 'LINE', '5', 'A1', '8', 'OPEN', '10', 0, '20', 0, '11', 10, '21', 0,
    '0', 'LINE', '5', 'A2', '8', 'OPEN', '10', 10, '20', 0, '11', 10, '21', 10,
    '0', 'LINE', '5', 'A3', '8', 'OPEN', '10', 10, '20', 10, '11', 0, '21', 10,
    // A closed 20 × 5 rectangle elsewhere.
    '0', 'LWPOLYLINE', '5', 'B1', '8', 'PLATE', '90', 4, '70', 1, '10', 100, '20', 0, '10', 120, '20', 0, '10', 120, '20', 5, '10', 100, '20', 5,
  ]);
  test('problems name the handles and the layer; the section is the rectangle only', () => {
    const r = ok(importDxf(text));
    expect(r.problems.map((p) => p.handle).sort()).toEqual(['A1', 'A2', 'A3']);
    for (const p of r.problems) {
      expect(p.layer).toBe('OPEN');
      expect(p.message).toMatch(/open end at \(0, 0\)|open end at \(0, 10\)/);
      expect(p.points.length).toBeGreaterThanOrEqual(2);
      for (const [x, y] of p.points) expect(Number.isFinite(x) && Number.isFinite(y)).toBe(true);
    }
    expect(r.shapes).toHaveLength(1);
    close(sectionProperties(r.region).area, 100, 1e-15); // rectangle b·h = 20 × 5 (Gere & Goodno App. E)
  });

  test('a branch (three ends at one point) is reported, not guessed', () => {
    const t = wrap([
      '0', 'LINE', '5', 'C1', '8', 'T', '10', 0, '20', 0, '11', 10, '21', 0,
      '0', 'LINE', '5', 'C2', '8', 'T', '10', 10, '20', 0, '11', 10, '21', 10,
      '0', 'LINE', '5', 'C3', '8', 'T', '10', 10, '20', 10, '11', 0, '21', 0,
      '0', 'LINE', '5', 'C4', '8', 'T', '10', 10, '20', 0, '11', 20, '21', 0,
    ]);
    const r = ok(importDxf(t));
    expect(r.shapes).toHaveLength(0);
    expect(r.problems.map((p) => p.handle).sort()).toEqual(['C1', 'C2', 'C3', 'C4']);
    expect(r.problems.some((p) => /branches/.test(p.message))).toBe(true);
  });

  test('a line drawn twice is set aside and the outline still closes', () => {
    const t = wrap([
      '0', 'LINE', '5', 'D1', '10', 0, '20', 0, '11', 10, '21', 0,
      '0', 'LINE', '5', 'D2', '10', 10, '20', 0, '11', 0, '21', 10,
      '0', 'LINE', '5', 'D3', '10', 0, '20', 10, '11', 0, '21', 0,
      '0', 'LINE', '5', 'D4', '10', 10, '20', 0, '11', 0, '21', 0,
    ]);
    const r = ok(importDxf(t));
    expect(r.problems.map((p) => p.handle)).toEqual(['D4']);
    expect(r.problems[0].message).toMatch(/repeats/);
    close(sectionProperties(r.region).area, 50, 1e-15); // right triangle bh/2 (Gere & Goodno App. E)
  });
});

// ---------------------------------------------------------------------------------------------
describe('files that cannot be read give ok:false with a message, never a throw', () => {
  const cases: [string, string, RegExp][] = [
    ['empty file', '', /empty/],
    ['whitespace only', '  \n\n \r\n', /empty/],
    ['text that is not DXF', 'hello world\nthis is not a drawing\n', /line 1 should hold a group code/],
    ['truncated file', PLATE.slice(0, PLATE.indexOf('0\nLWPOLYLINE\n5\n2C')), /truncated/],
    ['truncated mid-pair', PLATE.slice(0, PLATE.indexOf('HOLES') - 1), /truncated/],
    ['binary DXF sentinel', 'AutoCAD Binary DXF\r\n\u001a\u0000', /binary DXF/],
    ['POLYLINE without SEQEND', wrap(['0', 'POLYLINE', '5', 'P1', '70', 1, '0', 'VERTEX', '10', 0, '20', 0, '0', 'LINE', '10', 0, '20', 0, '11', 1, '21', 1]), /SEQEND/],
    ['no ENTITIES section', dxf(...HEADER_MM, '0', 'EOF'), /no ENTITIES/],
  ];
  for (const [name, text, msg] of cases) {
    test(name, () => {
      const r = importDxf(text);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatch(msg);
    });
  }

  test('binary garbage', () => {
    // Deterministic pseudo-random bytes read as Latin-1 text (what a browser's readAsText can give).
    let s = 12345;
    const bytes = Array.from({ length: 4096 }, () => ((s = (s * 1103515245 + 12345) & 0x7fffffff), s & 0xff));
    const r = importDxf(String.fromCharCode(...bytes));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/not a text DXF|group code/);
    // The same bytes decoded as UTF-8 give replacement characters.
    const r2 = importDxf(new TextDecoder('utf-8').decode(new Uint8Array(bytes)));
    expect(r2.ok).toBe(false);
  });

  test('fuzzed corruptions of a valid file never throw, hang or give NaN', () => {
    // Invariant (project rule: fuzzed input never crashes the engine or yields NaN). Lines are
    // deleted, replaced, inserted or doubled; dxf-parser alone hangs on some of these (a vertex x
    // without its y, a POLYLINE without SEQEND), which the scanner must catch first.
    const extra = dxf(...line('L1', 300, 0, 310, 0), ...arc('A1', 305, 0, 5, 0, 180), '0', 'POLYLINE', '70', 1, '0', 'VERTEX', '10', 400, '20', 0, '42', 1, '0', 'VERTEX', '10', 402, '20', 0, '42', 1, '0', 'SEQEND');
    const base = PLATE.replace('0\nENDSEC\n0\nEOF\n', extra + '0\nENDSEC\n0\nEOF\n');
    expect(ok(importDxf(base)).shapes).toHaveLength(5); // the unmutated file is valid: plate, 2 holes, half disk, circle
    const lines = base.split('\n');
    const token = fc.oneof(...['', '0', '10', '20', '42', '90', 'VERTEX', 'SEQEND', 'LWPOLYLINE', 'ENDSEC', '1e308', 'NaN', '-'].map((v) => fc.constant(v)), fc.string({ maxLength: 6 }));
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(lines.length - 1), fc.integer({ min: 0, max: 3 }), token), { maxLength: 8 }), (edits) => {
        const l = lines.slice();
        for (const [i, kind, v] of edits) {
          if (kind === 0) l.splice(i, 1);
          else if (kind === 1) l[i] = v;
          else if (kind === 2) l.splice(i, 0, v);
          else l.splice(i, 0, v, l[i]);
        }
        const r = importDxf(l.join('\n'));
        if (!r.ok) {
          expect(typeof r.error).toBe('string');
          expect(r.error.length).toBeGreaterThan(0);
          return;
        }
        for (const pr of r.problems) for (const [x, y] of pr.points) expect(Number.isFinite(x) && Number.isFinite(y)).toBe(true);
        expect(JSON.stringify(r.shapes)).not.toMatch(/null|NaN/);
        if (r.region.length > 0) {
          let p;
          try {
            p = sectionProperties(r.region);
          } catch {
            return; // a zero-area section is refused with a message by the engine
          }
          expect(Number.isFinite(p.area) && Number.isFinite(p.Ix) && Number.isFinite(p.Iy)).toBe(true);
        }
      }),
      { numRuns: 1000, seed: 4 },
    );
  });
});

// ---------------------------------------------------------------------------------------------
describe('units', () => {
  const square = ['0', 'LWPOLYLINE', '5', 'S1', '90', 4, '70', 1, '10', 0, '20', 0, '10', 2, '20', 0, '10', 2, '20', 2, '10', 0, '20', 2];
  const hdr = (code: number) => ['0', 'SECTION', '2', 'HEADER', '9', '$INSUNITS', '70', code, '0', 'ENDSEC'];
  // $INSUNITS codes: AutoCAD DXF Reference, HEADER section (1 in, 2 ft, 4 mm, 5 cm, 6 m).
  test.each([
    [1, 'in'],
    [2, 'ft'],
    [4, 'mm'],
    [5, 'cm'],
    [6, 'm'],
  ] as const)('$INSUNITS %i is %s', (code, u) => {
    const r = ok(importDxf(wrap(square, hdr(code))));
    expect(r.units).toBe(u);
    expect(r.unitsFromFile).toBe(u);
  });
  test('no header, or $INSUNITS 0 (unitless): units are null so the caller asks', () => {
    for (const t of [wrap(square, []), wrap(square, hdr(0))]) {
      const r = ok(importDxf(t));
      expect(r.units).toBeNull();
      expect(r.unitsFromFile).toBeNull();
      expect(r.shapes).toHaveLength(1);
      expect(ok(importDxf(t, { units: 'cm' })).units).toBe('cm');
    }
  });
  test('an unsupported unit (13 = micrometres) is reported and not guessed', () => {
    const r = ok(importDxf(wrap(square, hdr(13))));
    expect(r.units).toBeNull();
    expect(r.warnings.join(' ')).toMatch(/micrometres/);
  });
  test('targetUnits converts lengths (1 in = 25.4 mm exactly, NIST SP 811 B.8)', () => {
    const r = ok(importDxf(wrap(square, hdr(1)), { targetUnits: 'mm' }));
    expect(r.units).toBe('mm');
    close(sectionProperties(r.region).area, 4 * 25.4 * 25.4, 1e-14);
  });
});

// ---------------------------------------------------------------------------------------------
describe('other entity forms', () => {
  test('POLYLINE with VERTEX bulges (old-style polyline): a circle of two half arcs', () => {
    const t = wrap(['0', 'POLYLINE', '5', 'P1', '8', '0', '66', 1, '10', 0, '20', 0, '30', 0, '70', 1,
      '0', 'VERTEX', '8', '0', '10', -5, '20', 0, '42', 1,
      '0', 'VERTEX', '8', '0', '10', 5, '20', 0, '42', 1,
      '0', 'SEQEND', '8', '0']);
    const r = ok(importDxf(t));
    close(sectionProperties(r.region).area, Math.PI * 25, 1e-14); // circle πr² (Gere & Goodno App. E)
    close(sectionProperties(r.region).Ix, (Math.PI * 5 ** 4) / 4, 1e-14); // circle πr⁴/4
  });

  test('bulge over 1 (arc over 180°): the major circular segment', () => {
    // Chord from (6, −8) to (−6, −8) on a circle r = 10 about the origin, closed by the major arc:
    // half-angle of the minor segment β = atan2(6, 8); major sweep 2π − 2β; bulge tan(sweep/4) = 3.
    const t = wrap(['0', 'LWPOLYLINE', '5', 'M1', '90', 2, '70', 1, '10', -6, '20', -8, '10', 6, '20', -8, '42', 3]);
    const r = ok(importDxf(t));
    const beta = Math.atan2(6, 8);
    const minor = ((10 * 10) / 2) * (2 * beta - Math.sin(2 * beta)); // segment r²(θ − sinθ)/2 (Gere & Goodno App. E)
    close(sectionProperties(r.region).area, Math.PI * 100 - minor, 1e-13);
  });

  test('CIRCLE becomes a circle shape; a circle inside it becomes a hole', () => {
    const t = wrap(['0', 'CIRCLE', '5', 'C1', '8', '0', '10', 0, '20', 0, '40', 10, '0', 'CIRCLE', '5', 'C2', '8', '0', '10', 0, '20', 0, '40', 6]);
    const r = ok(importDxf(t));
    expect(r.shapes.map((s) => [s.type, s.op ?? 'add'])).toEqual([['circle', 'add'], ['circle', 'subtract']]);
    const p = evaluated(r);
    close(p.area, Math.PI * (100 - 36), 1e-14); // annulus π(R² − r²) (Roark Table A.1)
    close(p.Ix, (Math.PI * (10 ** 4 - 6 ** 4)) / 4, 1e-14); // annulus π(R⁴ − r⁴)/4 (Roark Table A.1)
  });

  test('an island in a hole (depth 2) is material again', () => {
    const sq = (h: string, a: number) => ['0', 'LWPOLYLINE', '5', h, '90', 4, '70', 1, '10', -a, '20', -a, '10', a, '20', -a, '10', a, '20', a, '10', -a, '20', a];
    const r = ok(importDxf(wrap([...sq('Q3', 2), ...sq('Q1', 10), ...sq('Q2', 6)])));
    expect(r.shapes.map((s) => s.op ?? 'add')).toEqual(['add', 'subtract', 'add']);
    close(evaluated(r).area, 400 - 144 + 16, 1e-14); // squares a² by the composite method
  });

  test('extrusion (0, 0, −1): the arc is mirrored into world x (DXF OCS, arbitrary axis algorithm)', () => {
    // A half disk r = 10 whose OCS centre (5, 0) is world (−5, 0).
    const t = wrap([
      '0', 'LINE', '5', 'E1', '10', -15, '20', 0, '11', 5, '21', 0,
      ...arc('E2', 5, 0, 10, 0, 180, ['210', 0, '220', 0, '230', -1]),
    ]);
    const r = ok(importDxf(t));
    expect(r.problems).toEqual([]);
    const p = sectionProperties(r.region);
    close(p.area, (Math.PI * 100) / 2, 1e-14); // semicircle πr²/2 (Gere & Goodno App. E)
    close(p.centroid.x, -5, 1e-13);
    close(p.centroid.y, 40 / (3 * Math.PI), 1e-13); // semicircle centroid 4r/3π
  });

  test('text, dimensions and paper-space entities are counted, not reported; splines are reported', () => {
    const t = wrap([
      '0', 'TEXT', '5', 'T1', '8', 'NOTES', '10', 0, '20', 0, '40', 2.5, '1', '<b>not markup</b>',
      '0', 'LINE', '5', 'PS', '67', 1, '10', 0, '20', 0, '11', 5, '21', 0,
      '0', 'SPLINE', '5', 'SP', '8', 'CURVES', '70', 8, '71', 3, '72', 0, '73', 2, '10', 0, '20', 0, '30', 0, '10', 5, '20', 5, '30', 0,
      '0', 'CIRCLE', '5', 'C1', '10', 0, '20', 0, '40', 1,
    ]);
    const r = ok(importDxf(t));
    expect(r.ignored).toEqual(expect.arrayContaining([{ type: 'TEXT', count: 1 }, { type: 'LINE in paper space', count: 1 }]));
    expect(r.problems.map((p) => [p.handle, p.layer])).toEqual([['SP', 'CURVES']]);
    expect(r.problems[0].message).toMatch(/spline/);
    expect(r.shapes).toHaveLength(1);
  });

  test('names from the file are data: a layer called <script> is kept as plain text', () => {
    const t = wrap(['0', 'LINE', '5', '<img src=x>', '8', '<script>alert(1)</script>', '10', 0, '20', 0, '11', 1, '21', 0]);
    const r = ok(importDxf(t));
    expect(r.problems[0].layer).toBe('<script>alert(1)</script>');
    expect(r.problems[0].handle).toBe('<img src=x>');
  });
});

// ---------------------------------------------------------------------------------------------
describe('block references and hidden layers', () => {
  // A block "BOLTHOLE" (base point (1, 1)) holding a circle r = 2.5 centred on (1, 1) and a nested
  // block "MARK" with a short construction LINE on layer HIDDEN, which is switched off (colour −7).
  const tables = ['0', 'SECTION', '2', 'TABLES', '0', 'TABLE', '2', 'LAYER', '70', 2,
    '0', 'LAYER', '2', 'PLATE', '70', 0, '62', 7,
    '0', 'LAYER', '2', 'HIDDEN', '70', 0, '62', -7,
    '0', 'ENDTAB', '0', 'ENDSEC'];
  const blocks = ['0', 'SECTION', '2', 'BLOCKS',
    '0', 'BLOCK', '8', '0', '2', 'BOLTHOLE', '70', 0, '10', 1, '20', 1, '30', 0,
    '0', 'CIRCLE', '5', 'B1', '8', '0', '10', 1, '20', 1, '30', 0, '40', 2.5,
    '0', 'INSERT', '5', 'B2', '8', '0', '2', 'MARK', '10', 1, '20', 1, '30', 0,
    '0', 'ENDBLK', '5', 'B3', '8', '0',
    '0', 'BLOCK', '8', '0', '2', 'MARK', '70', 0, '10', 0, '20', 0, '30', 0,
    '0', 'LINE', '5', 'B4', '8', 'HIDDEN', '10', -1, '20', 0, '11', 1, '21', 0,
    '0', 'ENDBLK', '5', 'B5', '8', '0',
    '0', 'ENDSEC'];
  const plate = ['0', 'LWPOLYLINE', '5', 'P1', '8', 'PLATE', '90', 4, '70', 1, '10', 0, '20', 0, '10', 100, '20', 0, '10', 100, '20', 50, '10', 0, '20', 50];
  const insert = (h: string, x: number, y: number, s: number, rot: number, sy = s) =>
    ['0', 'INSERT', '5', h, '8', 'PLATE', '2', 'BOLTHOLE', '10', x, '20', y, '30', 0, '41', s, '42', sy, '43', 1, '50', rot];
  const file = (...ents: (string | number)[][]) =>
    dxf(...HEADER_MM, ...tables, ...blocks, '0', 'SECTION', '2', 'ENTITIES', ...ents.flat(), '0', 'ENDSEC', '0', 'EOF');

  test('inserted holes land where the references place them, scaled and rotated', () => {
    // Scale 2 makes r = 5; the base point (1, 1) goes to the insertion point, so rotation about it does not move the centre.
    const r = ok(importDxf(file(plate, insert('I1', 20, 25, 2, 0), insert('I2', 50, 25, 2, 90), insert('I3', 80, 25, -2, 30, 2))));
    expect(r.problems).toEqual([]);
    expect(r.shapes.map((s) => s.op ?? 'add')).toEqual(['add', 'subtract', 'subtract', 'subtract']);
    const centres = r.shapes.slice(1).map((s) => (s.type === 'circle' ? [s.center[0], s.center[1], s.radius] : null));
    for (const [c, x] of [[centres[0], 20], [centres[1], 50], [centres[2], 80]] as const) {
      expect(Math.abs(c![0] - x)).toBeLessThan(1e-12);
      expect(Math.abs(c![1] - 25)).toBeLessThan(1e-12);
      expect(Math.abs(c![2] - 5)).toBeLessThan(1e-12);
    }
    const p = evaluated(r);
    close(p.area, 5000 - 3 * Math.PI * 25, 1e-13); // rectangle bh less three circles πr² (composite method)
    close(p.Ix, (100 * 50 ** 3) / 12 - (3 * Math.PI * 5 ** 4) / 4, 1e-13); // bh³/12 − 3·πr⁴/4, all on the x axis through y = 25
    // The hidden construction line inside the nested block is counted, not used.
    expect(r.ignored).toEqual([{ type: 'LINE on a hidden layer', count: 3 }]);
    expect(r.warnings.join(' ')).toMatch(/off or frozen/);
  });

  test('unequal x and y scale, a missing block and a block that contains itself are reported', () => {
    const selfRef = dxf(...HEADER_MM, '0', 'SECTION', '2', 'BLOCKS', '0', 'BLOCK', '2', 'LOOP', '10', 0, '20', 0,
      '0', 'INSERT', '5', 'L2', '2', 'LOOP', '10', 0, '20', 0, '0', 'ENDBLK', '0', 'ENDSEC',
      '0', 'SECTION', '2', 'ENTITIES', '0', 'INSERT', '5', 'L1', '8', 'X', '2', 'LOOP', '10', 0, '20', 0, '0', 'ENDSEC', '0', 'EOF');
    const a = ok(importDxf(file(plate, insert('U1', 20, 25, 2, 0, 3))));
    expect(a.problems.map((p) => p.handle)).toEqual(['U1']);
    expect(a.problems[0].message).toMatch(/unequally/);
    expect(a.problems[0].points).toEqual([[20, 25]]);
    const b = ok(importDxf(file(plate, ['0', 'INSERT', '5', 'M1', '8', 'PLATE', '2', 'NOSUCH', '10', 1, '20', 2])));
    expect(b.problems[0].message).toMatch(/does not define/);
    const c = ok(importDxf(selfRef));
    expect(c.problems.map((p) => p.handle)).toEqual(['L2']);
    expect(c.problems[0].message).toMatch(/contains itself/);
  });
});

describe('a block bomb', () => {
  test('blocks that insert each other ten times over 12 levels stop at the entity budget', () => {
    // Block Bk holds ten references to B(k+1); B12 holds a circle: 10^12 circles if expanded.
    const defs: (string | number)[] = ['0', 'SECTION', '2', 'BLOCKS'];
    for (let k = 1; k <= 12; k++) {
      defs.push('0', 'BLOCK', '2', `B${k}`, '10', 0, '20', 0);
      if (k < 12) for (let j = 0; j < 10; j++) defs.push('0', 'INSERT', '2', `B${k + 1}`, '10', j, '20', 0);
      else defs.push('0', 'CIRCLE', '10', 0, '20', 0, '40', 0.1);
      defs.push('0', 'ENDBLK');
    }
    defs.push('0', 'ENDSEC');
    const text = dxf(...defs, '0', 'SECTION', '2', 'ENTITIES', '0', 'INSERT', '5', 'X', '2', 'B1', '10', 0, '20', 0, '0', 'ENDSEC', '0', 'EOF');
    const r = ok(importDxf(text));
    expect(r.warnings.join(' ')).toMatch(/more than 200000 entities/);
  });
});


describe('polylines drawn with a width', () => {
  test('are imported as their centre line, with a warning that names them', () => {
    // AutoCAD DXF Reference, LWPOLYLINE: group 43 is the constant width.
    const r = ok(
      importDxf(
        wrap(['0', 'LWPOLYLINE', '5', 'W1', '8', '0', '90', '4', '70', '1', '43', '2.5', '10', '0', '20', '0', '10', '10', '20', '0', '10', '10', '20', '5', '10', '0', '20', '5']),
      ),
    );
    expect(r.warnings.join('\n')).toMatch(/1 polyline is drawn with a width \(handle W1\); only the centre line was imported/);
    // The centre line encloses a 10 × 5 rectangle: A = bh (Gere & Goodno, App. E).
    expect(Math.abs(evaluated(r).area - 50)).toBeLessThan(1e-12);
  });
});
