/**
 * Line elements in the section document: the optional `weldLoads` field (validation, units,
 * evaluation), a document of line elements only, and point editing of open chains (line elements
 * and strips) with the same functions as paths.
 *
 * Sources:
 * - Blodgett, Design of Welded Structures (1966), Sect. 7.4 and Table 5 (weld treated as a line;
 *   C-shaped group: Nx = b²/(2b + d), Jw = (2b + d)³/12 − b²(b + d)²/(2b + d); from memory). The
 *   eccentric load below is our own, worked by hand in the comment (the same method as the
 *   bracket examples of Sect. 7.4, whose numbers are not recalled).
 * - Annular sector (Roark, Table A.1, from memory): area (Ro² − Ri²)·φ/2 = t·R·φ, R the mean
 *   radius; so a strip bent on a centreline arc of radius R has exactly t times the centreline length.
 */
import { afterAll, describe, expect, it } from 'vitest';
import {
  chainDeletePoint,
  chainMakeArc,
  chainMakeLine,
  chainReverse,
  chainRoundCorner,
  chainSplitSegment,
  chainRemoveSegment,
  linesAlongOutline,
  circleContour,
  polygonContour,
  convertDocumentUnits,
  createEvaluator,
  evaluateDocument,
  formatIssue,
  LINES_ONLY_MESSAGE,
  lineProperties,
  chainFromPath,
  parseDocument,
  serialiseDocumentText,
  shapeToRegion,
  validateDocument,
  regionMoments,
  type LineShape,
  type SectionDocument,
  type StripShape,
} from '../src';
import { close, worst } from './helpers';

afterAll(() => console.log(`lines-document: largest relative error against the hand values ${worst.value.toExponential(2)}`));

/** The C-shaped weld group of Blodgett Sect. 7.4 kind: web d along x = 0, flanges b to the right. */
const C_GROUP: LineShape = { id: 'w', type: 'line', group: 'Bracket weld', start: [50, 100], segments: [{ to: [0, 100] }, { to: [0, 0] }, { to: [50, 0] }] };

function docWith(extra: Record<string, unknown>, shapes: unknown[] = [C_GROUP]): unknown {
  return { format: 'kern-section', version: 2, units: 'mm', shapes, ...extra };
}

function errors(value: unknown): string[] {
  const r = validateDocument(value);
  return r.ok ? [] : r.errors.map(formatIssue);
}

function warnings(value: unknown): string[] {
  return validateDocument(value).warnings.map(formatIssue);
}

describe('weldLoads in the document', () => {
  it('accepts a load on an existing group and keeps it through save and read', () => {
    const d = docWith({ weldLoads: [{ group: 'Bracket weld', at: [200, 50], Fx: 0, Fy: -10, M: 0, name: 'Service' }] });
    expect(errors(d)).toEqual([]);
    const r = parseDocument(serialiseDocumentText((validateDocument(d) as { doc: SectionDocument }).doc));
    expect(r.ok && r.doc.weldLoads).toEqual([{ group: 'Bracket weld', at: [200, 50], Fx: 0, Fy: -10, M: 0, name: 'Service' }]);
  });

  it('names a group that does not exist, with the groups the document has (a warning: the file still opens)', () => {
    const typo = docWith({ weldLoads: [{ group: 'Top weld', at: [0, 0], Fx: 1, Fy: 0 }] });
    expect(errors(typo)).toEqual([]);
    expect(warnings(typo)).toEqual(['weldLoads[0].group: there is no line group "Top weld"; the document\'s line groups are "Bracket weld" (the load is kept but not evaluated)']);
    const noLines = docWith({ weldLoads: [{ group: 'Lines', at: [0, 0], Fx: 1, Fy: 0 }] }, [{ type: 'circle', center: [0, 0], radius: 5 }]);
    expect(warnings(noLines)).toEqual(['weldLoads[0].group: there is no line group "Lines": the document has no line elements (the load is kept but not evaluated)']);
    const ev = evaluateDocument((validateDocument(typo) as { doc: SectionDocument }).doc);
    expect(ev.welds[0].result).toBeNull();
    expect(ev.welds[0].message).toBe('The line group "Top weld" has no line elements in this section.');
  });

  it('takes the default group "Lines" and a group that only a proposal has', () => {
    const plain = { ...C_GROUP, group: undefined };
    expect(errors(docWith({ weldLoads: [{ group: 'Lines', at: [0, 0], Fx: 1, Fy: 0 }] }, [plain]))).toEqual([]);
    const d = docWith({
      variants: [{ name: 'Extra weld', shapes: ['w', { id: 'x', type: 'line', group: 'Stiffener', start: [0, 0], segments: [{ to: [0, 10] }] }] }],
      weldLoads: [{ group: 'Stiffener', at: [5, 5], Fx: 1, Fy: 0 }],
    });
    expect(errors(d)).toEqual([]);
    // In the baseline that group has no elements: the load says so, it is not an error.
    const ev = evaluateDocument((validateDocument(d) as { doc: SectionDocument }).doc);
    expect(ev.welds[0].message).toBe('The line group "Stiffener" has no line elements in this section.');
  });

  it('refuses bad values, each with its path', () => {
    const d = docWith({ weldLoads: [{ group: 'Bracket weld', at: [1], Fx: 'ten', Fy: 0, M: null, extra: 1 }, 'load', { group: '', at: [0, 0], Fx: 0, Fy: 0 }] });
    expect(errors(d)).toEqual([
      'weldLoads[0].extra: unknown field; a weld load has group, at, Fx, Fy, M, name',
      'weldLoads[0].at: the point where the force acts must be [x, y], two finite numbers; got [1]',
      'weldLoads[0].Fx: Fx must be a finite number (force), got "ten"',
      'weldLoads[0].M: the moment M must be a finite number, got null',
      'weldLoads[1]: a weld load must be an object {group, at, Fx, Fy, M}',
      'weldLoads[2].group: name the line group the load acts on',
    ]);
    expect(errors(docWith({ weldLoads: {} }))).toEqual(['weldLoads: weldLoads must be a list of {group, at, Fx, Fy, M}']);
  });
});

describe('weld results in the evaluation', () => {
  // Hand calculation (Blodgett Sect. 7.4; Table 5 C-shape, from memory), b = 50, d = 100 mm:
  //   L = 2b + d = 200 mm, x̄ = b²/L = 12.5 mm, ȳ = 50 mm
  //   Jw = (2b + d)³/12 − b²(b + d)²/(2b + d) = 8e6/12 − 2500·22500/200 = 666666.67 − 281250 = 385416.67 mm³
  //   P = 10 kN down at (200, 50): e = 187.5 mm, T = 1875 kN·mm clockwise
  //   at the flange tips (50, 100) and (50, 0): r = (37.5, ±50)
  //   f = √((T·50/Jw)² + (P/L + T·37.5/Jw)²) = √(0.243243² + (0.05 + 0.182432)²) = √(0.059167 + 0.054025) = 0.336440 kN/mm
  const L = 200, Jw = 8e6 / 12 - (2500 * 22500) / 200, T = 10 * 187.5;
  const fTip = Math.hypot((T * 50) / Jw, 10 / L + (T * 37.5) / Jw);

  it('the C-shaped group under an eccentric load: critical force per length at the flange tips', () => {
    const d = validateDocument(docWith({ weldLoads: [{ group: 'Bracket weld', at: [200, 50], Fx: 0, Fy: -10 }] })) as { ok: true; doc: SectionDocument };
    const ev = evaluateDocument(d.doc);
    expect(ev.props).toBeNull();
    expect(ev.message).toBe(LINES_ONLY_MESSAGE);
    const w = ev.welds[0];
    expect(w.message).toBeNull();
    close(w.result!.properties.J, Jw, 1e-12);
    close(w.result!.critical.f, fTip, 1e-12);
    close(fTip, 0.33644, 1e-5); // the hand figure to the digits carried
    expect(w.result!.critical.x).toBe(50);
    expect([w.result!.critical.y, w.result!.alsoCritical[0].y].sort((a, b) => a - b)).toEqual([0, 100]);
    expect(w.units).toEqual({ force: 'kN', length: 'mm', moment: 'kN·mm', perLength: 'kN/mm' });
    close(w.moment!, -T, 1e-12);
  });

  it('a moment given in kN·m on a drawing in mm is converted (momentLength)', () => {
    // The same eccentric load given as a force through the centroid plus its moment: T = 1.875 kN·m.
    const d = validateDocument(docWith({ momentLength: 'm', weldLoads: [{ group: 'Bracket weld', at: [12.5, 50], Fx: 0, Fy: -10, M: -1.875 }] })) as { ok: true; doc: SectionDocument };
    const w = evaluateDocument(d.doc).welds[0];
    close(w.result!.critical.f, fTip, 1e-12);
    close(w.moment!, -1.875, 1e-12);
    expect(w.units.moment).toBe('kN·m');
  });

  it('a change of units moves the load with the drawing: the force per length scales by the length factor', () => {
    const d = (validateDocument(docWith({ weldLoads: [{ group: 'Bracket weld', at: [200, 50], Fx: 3, Fy: -10, M: 500 }] })) as { ok: true; doc: SectionDocument }).doc;
    const inches = convertDocumentUnits(d, 'in');
    close(inches.weldLoads![0].at[0], 200 / 25.4, 1e-15);
    close(inches.weldLoads![0].M!, 500 / 25.4, 1e-15);
    const a = evaluateDocument(d).welds[0].result!, b = evaluateDocument(inches).welds[0].result!;
    // kN/in = 25.4 × kN/mm (exact identity of the unit change).
    close(b.critical.f, a.critical.f * 25.4, 1e-12);
    close(b.critical.x * 25.4, a.critical.x, 1e-12);
  });

  it('reuses a result while its load and its group are unchanged, and redoes it when the load moves', () => {
    const d = (validateDocument(docWith({ weldLoads: [{ group: 'Bracket weld', at: [200, 50], Fx: 0, Fy: -10 }] })) as { ok: true; doc: SectionDocument }).doc;
    const ev = createEvaluator();
    const first = ev.evaluate(d).welds[0];
    expect(ev.evaluate({ ...d }).welds[0]).toBe(first);
    const moved = ev.evaluate({ ...d, weldLoads: [{ ...d.weldLoads![0], at: [100, 50] }] }).welds[0];
    expect(moved).not.toBe(first);
    close(moved.moment!, -10 * 87.5, 1e-12);
  });
});

describe('a document of line elements only', () => {
  it('is valid and gives its line group with the area results marked absent; the message follows the document', () => {
    const ev = createEvaluator();
    const empty: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
    expect(ev.evaluate(empty).message).toMatch(/empty/);
    const lines = ev.evaluate({ ...empty, shapes: [C_GROUP] });
    expect(lines.props).toBeNull();
    expect(lines.message).toBe(LINES_ONLY_MESSAGE);
    expect(lines.lines).toHaveLength(1);
    expect(lines.lines[0].group).toBe('Bracket weld');
    expect(lines.lines[0].chains).toHaveLength(1);
    close(lines.lines[0].props!.length, 200, 1e-15);
    expect(ev.evaluate(empty).message).toMatch(/empty/);
  });
});

describe('point editing of open chains (line elements and strips)', () => {
  const L_STRIP: StripShape = { id: 's', type: 'strip', start: [0, 100], segments: [{ to: [0, 0] }, { to: [80, 0] }], thickness: 4 };
  const ok = <T,>(r: { ok: true; shape: T } | { ok: false; message: string }): T => {
    if (!r.ok) throw new Error(r.message);
    return r.shape;
  };
  const refused = (r: { ok: boolean; message?: string }) => (r.ok ? '' : (r as { message: string }).message);
  const props = (s: LineShape) => lineProperties([chainFromPath(s.start, s.segments)]);

  it('splitting a segment leaves the line properties unchanged (exact identity)', () => {
    const before = props(C_GROUP);
    const after = ok(chainSplitSegment(C_GROUP, 1));
    expect(after.segments.map((g) => g.to)).toEqual([[0, 100], [0, 50], [0, 0], [50, 0]]);
    const p = props(after);
    for (const k of ['length', 'Ix', 'Iy', 'Ixy', 'J'] as const) close(p[k], before[k], 1e-12, before.J / 200);
    // An arc is split at its through-point into two arcs on the same circle.
    const arc = ok(chainMakeArc(C_GROUP, 0));
    const split = ok(chainSplitSegment(arc, 0));
    const pa = props(arc), ps = props(split);
    for (const k of ['length', 'Ix', 'Iy', 'J'] as const) close(ps[k], pa[k], 1e-12);
  });

  it('deletes an end point (drops the end segment), an inner point (one line), and refuses the last segment', () => {
    expect(ok(chainDeletePoint(C_GROUP, 0)).start).toEqual([0, 100]);
    expect(ok(chainDeletePoint(C_GROUP, 3)).segments).toEqual([{ to: [0, 100] }, { to: [0, 0] }]);
    expect(ok(chainDeletePoint(C_GROUP, 1)).segments).toEqual([{ to: [0, 0] }, { to: [50, 0] }]);
    const one: LineShape = { ...C_GROUP, segments: [{ to: [0, 100] }] };
    expect(refused(chainDeletePoint(one, 1, 'shapes[0]'))).toBe('shapes[0].segments[0].to: this point cannot be deleted: a line needs at least one segment and this one has 1');
    expect(refused(chainDeletePoint(C_GROUP, 4))).toBe('shape: there is no point 5 (the line has 4)');
  });

  it('switches a segment between line and arc, and refuses what it cannot do', () => {
    const arc = ok(chainMakeArc(L_STRIP, 1, 'shapes[0]'));
    expect(arc.segments[1].via).toEqual([40, 20]);
    expect(ok(chainMakeLine(arc, 1)).segments[1]).toEqual({ to: [80, 0] });
    expect(refused(chainMakeLine(L_STRIP, 0))).toMatch(/already a line/);
    // An arc so deep that the strip's inner face folds on itself is refused with the strip's message.
    const tight: StripShape = { ...L_STRIP, thickness: 200 };
    expect(refused(chainMakeArc(tight, 1, 'shapes[0]'))).toMatch(/^shapes\[0\]/);
  });

  it('reverses an open chain: same properties, points in reverse order, arcs keep their through-points', () => {
    const arc = ok(chainMakeArc(C_GROUP, 1));
    const rev = ok(chainReverse(arc));
    expect(rev.start).toEqual([50, 0]);
    expect(rev.segments).toEqual([{ to: [0, 0] }, { to: [0, 100], via: arc.segments[1].via }, { to: [50, 100] }]);
    const a = props(arc), b = props(rev);
    for (const k of ['length', 'Ix', 'Iy', 'Ixy'] as const) close(b[k], a[k], 1e-12, a.J / 200);
  });

  it('rounds a corner of a strip: a bend of centreline radius R; the area is t × the centreline length (annular sector)', () => {
    const R = 12, t = 4;
    const bent = ok(chainRoundCorner(L_STRIP, 1, R, 'shapes[0]'));
    expect(bent.segments).toHaveLength(3);
    expect(bent.segments[1].via).toBeDefined();
    // Centreline: (100 − R) + πR/2 + (80 − R).
    const Lc = 100 - R + (Math.PI * R) / 2 + 80 - R;
    close(props(bent as unknown as LineShape).length, Lc, 1e-12);
    close(regionMoments(shapeToRegion(bent)).m00, t * Lc, 1e-12);
    expect(refused(chainRoundCorner(L_STRIP, 0, R, 'shapes[0]'))).toMatch(/^shapes\[0\]\.start: An end of an open line is not a corner/);
    expect(refused(chainRoundCorner(L_STRIP, 1, 500, 'shapes[0]'))).toMatch(/^shapes\[0\]\.segments\[0\]\.to: A radius of 500 does not fit/);
  });

  it('removes a segment: an end is dropped, an inner one splits the line in two, a weld all round is opened', () => {
    const lengthOf = (ls: LineShape[]) => lineProperties(ls.map((l) => chainFromPath(l.start, l.segments))).length;
    const r = chainRemoveSegment(C_GROUP, 1, 'shapes[0]');
    if (!r.ok) throw new Error(r.message);
    expect(r.shapes.map((x) => [x.start, x.segments.length])).toEqual([[[50, 100], 1], [[0, 0], 1]]);
    close(lengthOf(r.shapes), 100, 1e-15);
    const end = chainRemoveSegment(C_GROUP, 2);
    expect(end.ok && end.shapes[0].segments).toEqual([{ to: [0, 100] }, { to: [0, 0] }]);
    const ring: LineShape = { id: 'r', type: 'line', start: [0, 0], segments: [{ to: [40, 0] }, { to: [40, 30] }, { to: [0, 30] }, { to: [0, 0] }] };
    const open = chainRemoveSegment(ring, 1);
    if (!open.ok) throw new Error(open.message);
    expect(open.shapes).toHaveLength(1);
    expect(open.shapes[0].start).toEqual([40, 30]);
    expect(open.shapes[0].segments.map((g) => g.to)).toEqual([[0, 30], [0, 0], [40, 0]]);
    expect(refused(chainRemoveSegment({ ...C_GROUP, segments: [{ to: [0, 100] }] }, 0, 'shapes[0]'))).toMatch(/only segment cannot be removed/);
  });

  it('lines along an outline: a weld all round a rectangle and a ring (Blodgett Table 5, from memory)', () => {
    const b = 40, d = 30;
    const [rect] = linesAlongOutline([polygonContour([[0, 0], [b, 0], [b, d], [0, d]])], 'All round');
    expect(rect.group).toBe('All round');
    const p = lineProperties([chainFromPath(rect.start, rect.segments)]);
    close(p.length, 2 * (b + d), 1e-15);
    close(p.J, (b + d) ** 3 / 6, 1e-13); // Blodgett Table 5, box: Jw = (b + d)³/6
    const r0 = 12;
    const [ring] = linesAlongOutline([circleContour(5, 7, r0)]);
    expect(ring.group).toBeUndefined();
    const q = lineProperties([chainFromPath(ring.start, ring.segments)]);
    close(q.length, 2 * Math.PI * r0, 1e-14);
    close(q.J, 2 * Math.PI * r0 ** 3, 1e-13); // Blodgett Table 5, circle: Jw = πd³/4 = 2πr³
  });
});
