/**
 * Structural cautions for cutouts: each caution with a case that raises it and one that must not.
 *
 * Sources: re-entrant corners of cuts are radiused (AISC 360-16, Section M2.2, from memory; the
 * corner test itself is geometry: a sharp inside corner has a material angle over 180°);
 * hole edge distance and spacing (EN 1993-1-8:2005, Table 3.3: e1, e2 ≥ 1.2 d0, p1 ≥ 2.2 d0,
 * p2 ≥ 2.4 d0; AISC 360-16, Section J3.3: s ≥ 2⅔ d, 3 d preferred; Table J3.4M: M20 → 26 mm,
 * Table J3.4: 3/4 in → 1 in; Table J3.3/J3.3M standard holes d + 2 mm, d + 1/16 in; all from
 * memory); the ligament ratio is Kern's own screening ratio (no published source). Distances are
 * checked against hand geometry (Pythagoras, distances from a point to a line).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { DEMO_DOCUMENT, evaluateDocument, type SectionDocument, type Shape } from '../src';
import { analyseCutouts, type Caution, type CautionInput, type CautionOptions } from '../src/cautions';
import { close, worst } from './helpers';

function doc(shapes: Shape[], units: SectionDocument['units'] = 'mm'): SectionDocument {
  return { format: 'kern-section', version: 2, units, shapes };
}

/** The caution input of a document: its region and its shapes. */
function inputOf(d: SectionDocument): CautionInput {
  const ev = evaluateDocument(d);
  return { result: ev.region, shapes: d.shapes.map((s, k) => ({ id: s.id, name: s.name, op: s.op ?? 'add', region: ev.shapes[k].region })) };
}

function cautions(d: SectionDocument, base?: SectionDocument, opts: CautionOptions = {}): Caution[] {
  const input = inputOf(d);
  if (base) input.baseline = evaluateDocument(base).region;
  return analyseCutouts(input, { units: d.units, ...opts }).cautions;
}

const ofKind = (cs: Caution[], kind: Caution['kind']) => cs.filter((c) => c.kind === kind);

const web: Shape = { id: 'web', name: 'Web plate 300 × 200', type: 'rectangle', at: [0, 0], width: 300, height: 200 };

describe('re-entrant corners', () => {
  it('a square cope raises a sharp inside corner at its corner, naming the cope', () => {
    const cope: Shape = { id: 'cope', name: 'Cope 80 × 40', type: 'rectangle', at: [220, 160], width: 100, height: 60, op: 'subtract' };
    const cs = ofKind(cautions(doc([web, cope])), 're-entrant-corner');
    expect(cs).toHaveLength(1);
    expect(cs[0].at).toEqual({ x: 220, y: 160 });
    expect(cs[0].severity).toBe('warning');
    expect(cs[0].shape).toEqual({ id: 'cope', name: 'Cope 80 × 40' });
    expect(cs[0].message).toMatch(/Sharp inside corner at \(220, 160\) of “Cope 80 × 40” \(cope\)/);
    // The material angle of a square cope corner is 270° (three quadrants of material).
    close(cs[0].values!.materialAngle, 270, 1e-12);
    expect(cs[0].source).toMatch(/AISC 360-16, Section M2.2/);
  });

  it('a cope with a radius raises no sharp corner and reports the radius found', () => {
    // The same cope drawn as a path with a fillet of r = 12 at its inner corner: the arc from
    // (220, 172) to (232, 160) about (232, 172), through 232 − 12 cos45°, 172 − 12 sin45°.
    const s45 = 12 * Math.SQRT1_2;
    const cope: Shape = {
      id: 'cope', name: 'Cope with r = 12', type: 'path', op: 'subtract', start: [220, 220],
      segments: [{ to: [220, 172] }, { to: [232, 160], via: [232 - s45, 172 - s45] }, { to: [320, 160] }, { to: [320, 220] }, { to: [220, 220] }],
    };
    const cs = cautions(doc([web, cope]));
    expect(ofKind(cs, 're-entrant-corner')).toEqual([]);
    const r = ofKind(cs, 'radiused-corner');
    expect(r).toHaveLength(1);
    close(r[0].values!.radius, 12, 1e-12);
    expect(r[0].severity).toBe('note');
    expect(r[0].message).toMatch(/radiused: r = 12 mm/);
    // Marker at the middle of the fillet.
    close(r[0].at.x, 232 - s45, 1e-12);
    close(r[0].at.y, 172 - s45, 1e-12);
  });

  it('an uncut plate raises none', () => {
    expect(cautions(doc([web]))).toEqual([]);
  });

  it('against a baseline, only corners new in the proposal are flagged', () => {
    // The demo's cover plate meets the flange tips in two sharp inside corners at (±50, 200);
    // a proposal that cuts a square notch 20 × 4 into the underside of the bottom flange adds two
    // new ones, at the notch's inner corners (20, 4) and (40, 4).
    const base = { ...DEMO_DOCUMENT, shapes: DEMO_DOCUMENT.shapes.slice(0, 2) };
    const notch: Shape = { id: 'notch', name: 'Drain notch', type: 'rectangle', at: [20, -1], width: 20, height: 5, op: 'subtract' };
    const proposal = { ...base, shapes: [...base.shapes, notch] };
    // On its own the section has the notch's corners as warnings; where the cover plate meets
    // the flange tips it is a joint between two added parts, noted once.
    const plain = cautions(proposal);
    expect(ofKind(plain, 're-entrant-corner').map((c) => [c.at.x, c.at.y]).sort()).toEqual([[20, 4], [40, 4]]);
    expect(ofKind(plain, 'joint').map((c) => c.shape?.id)).toEqual(['beam']);
    const compared = ofKind(cautions(proposal, base), 're-entrant-corner');
    expect(compared.map((c) => c.at).sort((a, b) => a.x - b.x)).toEqual([{ x: 20, y: 4 }, { x: 40, y: 4 }]);
    for (const c of compared) expect(c.shape?.id).toBe('notch');
  });
});

describe('joints between parts', () => {
  // A tee welded from two plates: flange 200 × 20 on a web 10 × 180. The web meets the flange's
  // underside at (±5, 180), two inside corners of 270° of material.
  const flange: Shape = { id: 'fl', name: 'Flange 200 × 20', type: 'rectangle', at: [-100, 180], width: 200, height: 20 };
  const webPlate: Shape = { id: 'wb', name: 'Web 10 × 180', type: 'rectangle', at: [-5, 0], width: 10, height: 180 };

  it('two plates that meet make one joint note, not two sharp-corner warnings', () => {
    const cs = cautions(doc([webPlate, flange]));
    expect(ofKind(cs, 're-entrant-corner')).toEqual([]);
    const j = ofKind(cs, 'joint');
    expect(j).toHaveLength(1);
    expect(j[0].severity).toBe('note');
    expect(Math.abs(j[0].at.x)).toBe(5);
    expect(j[0].at.y).toBe(180);
    expect(j[0].message).toMatch(/“Web 10 × 180” \(wb\) and “Flange 200 × 20” \(fl\) meet at \(-?5, 180\)/);
    expect(j[0].message).toMatch(/shear flow/);
    expect(j[0].source).toMatch(/Gere & Goodno/);
  });

  it('the same tee drawn as one outline has two sharp inside corners (a cut plate)', () => {
    const tee: Shape = {
      id: 'tee', type: 'polygon',
      points: [[-5, 0], [5, 0], [5, 180], [100, 180], [100, 200], [-100, 200], [-100, 180], [-5, 180]],
    };
    const cs = cautions(doc([tee]));
    expect(ofKind(cs, 'joint')).toEqual([]);
    expect(ofKind(cs, 're-entrant-corner').map((c) => [c.at.x, c.at.y]).sort()).toEqual([[-5, 180], [5, 180]]);
  });

  it('a cut at the joint makes its corners cut corners; the joint it leaves alone stays a joint', () => {
    // A notch 20 × 5 cut into the flange's underside right of the web (x 5 to 25, y 180 to 185):
    // inside corners at (5, 185) and (25, 185), both on the notch; (−5, 180) is still web on flange.
    const notch: Shape = { id: 'n', name: 'Notch', type: 'rectangle', at: [5, 175], width: 20, height: 10, op: 'subtract' };
    const cs = cautions(doc([webPlate, flange, notch]));
    const sharp = ofKind(cs, 're-entrant-corner');
    expect(sharp.map((c) => [c.at.x, c.at.y]).sort()).toEqual([[25, 185], [5, 185]]);
    for (const c of sharp) expect(c.shape?.id).toBe('n');
    expect(ofKind(cs, 'joint').map((c) => [c.at.x, c.at.y])).toEqual([[-5, 180]]);
  });
});

describe('separate parts', () => {
  const base = { ...DEMO_DOCUMENT, shapes: DEMO_DOCUMENT.shapes.slice(0, 2) };

  it('the demo web opening splits the section, and the caution says so at the opening', () => {
    for (const cs of [cautions(DEMO_DOCUMENT), cautions(DEMO_DOCUMENT, base)]) {
      const parts = ofKind(cs, 'separate-parts');
      expect(parts).toHaveLength(1);
      expect(parts[0].shape?.id).toBe('opening');
      expect(parts[0].message).toMatch(/falls into 2 separate parts/);
      expect(parts[0].message).toMatch(/tied together elsewhere/);
      // The Ø60 opening cuts the 5.6 web between y = 90 ± √(30² − 2.8²): a gap of 2√(900 − 7.84).
      close(parts[0].values!.gap, 2 * Math.sqrt(900 - 2.8 * 2.8), 1e-12);
      close(parts[0].at.y, 90, 1e-12);
      expect(Math.abs(parts[0].at.x)).toBeLessThanOrEqual(2.8 + 1e-12);
    }
    expect(ofKind(cautions(DEMO_DOCUMENT, base), 'separate-parts')[0].message).toMatch(/the baseline has 1/);
  });

  it('a small opening that leaves the web whole raises none, nor does the uncut beam', () => {
    const small = { ...DEMO_DOCUMENT, shapes: [...base.shapes, { id: 'bore', type: 'circle', center: [0, 90], radius: 2, op: 'subtract' } as Shape] };
    expect(ofKind(cautions(small), 'separate-parts')).toEqual([]);
    expect(ofKind(cautions(base), 'separate-parts')).toEqual([]);
  });

  it('two parts already in the baseline are not flagged again against it', () => {
    const pair = doc([
      { id: 'a', name: 'Plate A', type: 'rectangle', at: [0, 0], width: 10, height: 100 },
      { id: 'b', name: 'Plate B', type: 'rectangle', at: [40, 0], width: 10, height: 100 },
    ]);
    expect(ofKind(cautions(pair), 'separate-parts')).toHaveLength(1);
    const drilled = doc([...pair.shapes, { id: 'h', type: 'circle', center: [5, 50], radius: 2, op: 'subtract' }]);
    expect(ofKind(cautions(drilled, pair), 'separate-parts')).toEqual([]);
  });
});

describe('holes near edges (EN 1993-1-8, Table 3.3: e ≥ 1.2 d0)', () => {
  const plate: Shape = { id: 'plate', name: 'Plate 200 × 100', type: 'rectangle', at: [0, 0], width: 200, height: 100 };
  const hole = (x: number, y = 50, r = 11): Shape => ({ id: 'hole', name: 'Bolt hole', type: 'circle', center: [x, y], radius: r, op: 'subtract' });

  it('a hole at 1.0 d0 from an edge is flagged, with the distances and the clause', () => {
    // d0 = 22, centre 22 from the left edge (1.0 d0): 22 < 1.2·22 = 26.4.
    const cs = ofKind(cautions(doc([plate, hole(22)])), 'hole-edge-distance');
    expect(cs).toHaveLength(1);
    close(cs[0].values!.centreDistance, 22, 1e-12);
    close(cs[0].values!.clearDistance, 11, 1e-12);
    close(cs[0].values!.required, 26.4, 1e-12);
    expect(cs[0].source).toMatch(/EN 1993-1-8:2005, Table 3.3 \(from memory\)/);
    expect(cs[0].message).toMatch(/Geometry check only/);
    expect(cs[0].shape?.id).toBe('hole');
  });

  it('a hole at 2.0 d0 from an edge is not', () => {
    expect(ofKind(cautions(doc([plate, hole(44)])), 'hole-edge-distance')).toEqual([]);
  });

  it('exactly at 1.2 d0 meets the rule; just inside it does not', () => {
    expect(ofKind(cautions(doc([plate, hole(26.4)])), 'hole-edge-distance')).toEqual([]);
    expect(ofKind(cautions(doc([plate, hole(26.39)])), 'hole-edge-distance')).toHaveLength(1);
  });

  it('a cope edge counts as a free edge (exact distance to the cut line)', () => {
    // Hole at (100, 50), d0 = 22; a cope whose lower edge is y = 75 leaves 25 < 26.4.
    const cope: Shape = { id: 'cope', type: 'rectangle', at: [60, 75], width: 200, height: 40, op: 'subtract' };
    const cs = ofKind(cautions(doc([plate, cope, hole(100)])), 'hole-edge-distance');
    expect(cs).toHaveLength(1);
    close(cs[0].values!.centreDistance, 25, 1e-12);
  });

  it('AISC 360: the same holes against Table J3.4M (d0 = 22 → M20 → 26 mm)', () => {
    const aisc = { rules: 'aisc360' as const, unitInMetres: 1e-3 };
    const at1 = ofKind(cautions(doc([plate, hole(22)]), undefined, aisc), 'hole-edge-distance');
    expect(at1).toHaveLength(1);
    close(at1[0].values!.required, 26, 1e-12);
    expect(at1[0].source).toMatch(/AISC 360-16, Section J3.4 \(from memory\)/);
    expect(ofKind(cautions(doc([plate, hole(44)]), undefined, aisc), 'hole-edge-distance')).toEqual([]);
    expect(ofKind(cautions(doc([plate, hole(26)]), undefined, aisc), 'hole-edge-distance')).toEqual([]);
  });

  it('AISC 360 in inches: a 13/16 in hole (3/4 in bolt) needs 1 in (Table J3.4)', () => {
    const p: Shape = { id: 'plate', type: 'rectangle', at: [0, 0], width: 8, height: 4 };
    const h = (x: number): Shape => ({ id: 'hole', type: 'circle', center: [x, 2], radius: 13 / 32, op: 'subtract' });
    const aisc = { rules: 'aisc360' as const, unitInMetres: 0.0254 };
    expect(ofKind(cautions(doc([p, h(1)], 'in'), undefined, aisc), 'hole-edge-distance')).toEqual([]);
    const cs = ofKind(cautions(doc([p, h(0.99)], 'in'), undefined, aisc), 'hole-edge-distance');
    expect(cs).toHaveLength(1);
    close(cs[0].values!.required, 1, 1e-12);
  });
});

describe('holes near each other', () => {
  const plate: Shape = { id: 'plate', type: 'rectangle', at: [0, 0], width: 300, height: 100 };
  const pair = (p: number): Shape[] => [
    plate,
    { id: 'h1', name: 'Hole 1', type: 'circle', center: [100, 50], radius: 11, op: 'subtract' },
    { id: 'h2', name: 'Hole 2', type: 'circle', center: [100 + p, 50], radius: 11, op: 'subtract' },
  ];

  it('EN: at 2.0 d0 both holes are flagged (p1 ≥ 2.2 d0 = 48.4), with centre and clear distances', () => {
    const cs = ofKind(cautions(doc(pair(44))), 'hole-spacing');
    expect(cs).toHaveLength(2);
    expect(cs.every((c) => c.severity === 'warning')).toBe(true);
    close(cs[0].values!.centreDistance, 44, 1e-12);
    close(cs[0].values!.clearDistance, 22, 1e-12);
    close(cs[0].values!.required, 48.4, 1e-12);
  });

  it('EN: at 2.2 d0 p1 is met but p2 (2.4 d0 = 52.8) is not: a note; at 2.4 d0 nothing', () => {
    const at22 = ofKind(cautions(doc(pair(48.4))), 'hole-spacing');
    expect(at22.map((c) => c.severity)).toEqual(['note', 'note']);
    expect(at22[0].message).toMatch(/p2 ≥ 2.4 d0/);
    expect(ofKind(cautions(doc(pair(52.8))), 'hole-spacing')).toEqual([]);
  });

  it('AISC: s ≥ 2⅔ d with d = 20 (53.33); 3 d = 60 preferred', () => {
    const aisc = { rules: 'aisc360' as const, unitInMetres: 1e-3 };
    const under = ofKind(cautions(doc(pair(52.8)), undefined, aisc), 'hole-spacing');
    expect(under.map((c) => c.severity)).toEqual(['warning', 'warning']);
    close(under[0].values!.required, (8 / 3) * 20, 1e-12);
    expect(ofKind(cautions(doc(pair(55)), undefined, aisc), 'hole-spacing').map((c) => c.severity)).toEqual(['note', 'note']);
    expect(ofKind(cautions(doc(pair(60)), undefined, aisc), 'hole-spacing')).toEqual([]);
  });
});

describe('ligaments', () => {
  const plate: Shape = { id: 'plate', name: 'Plate 200 × 100', type: 'rectangle', at: [0, 0], width: 200, height: 100 };

  it('a hole close to an edge leaves a thin ligament, measured exactly', () => {
    // Ø16 at (100, 90): 100 − 90 − 8 = 2 of material above the hole (< 0.5 · 16).
    const cs = ofKind(cautions(doc([plate, { id: 'h', name: 'Cable hole', type: 'circle', center: [100, 90], radius: 8, op: 'subtract' }])), 'thin-ligament');
    expect(cs).toHaveLength(1);
    close(cs[0].values!.width, 2, 1e-12);
    close(cs[0].at.x, 100, 1e-12);
    close(cs[0].at.y, 99, 1e-12);
    expect(cs[0].message).toMatch(/“Cable hole” \(h\)/);
  });

  it('a hole well inside the plate leaves no thin ligament, only the note with its width', () => {
    // Ø16 at (100, 50): 50 − 8 = 42 above and below.
    const cs = cautions(doc([plate, { id: 'h', type: 'circle', center: [100, 50], radius: 8, op: 'subtract' }]));
    expect(ofKind(cs, 'thin-ligament')).toEqual([]);
    const note = ofKind(cs, 'ligament');
    expect(note).toHaveLength(1);
    close(note[0].values!.width, 42, 1e-12);
  });

  it('a slot cut from the edge that leaves a thin web of material', () => {
    // Notch 30 wide from the top down to y = 4: 4 of material below it (< 0.5 · 30).
    const notch: Shape = { id: 'n', name: 'Slot', type: 'rectangle', at: [80, 4], width: 30, height: 120, op: 'subtract' };
    const cs = ofKind(cautions(doc([plate, notch])), 'thin-ligament');
    expect(cs).toHaveLength(1);
    close(cs[0].values!.width, 4, 1e-12);
  });
});

describe('plain mode without shapes', () => {
  it('works on a bare region and names no shape', () => {
    const ev = evaluateDocument(doc([{ id: 'p', type: 'rectangle', at: [0, 0], width: 200, height: 100 }, { id: 'h', type: 'circle', center: [15, 50], radius: 11, op: 'subtract' }]));
    const cs = analyseCutouts({ result: ev.region }).cautions;
    const edge = ofKind(cs, 'hole-edge-distance');
    expect(edge).toHaveLength(1);
    expect(edge[0].shape).toBeNull();
    expect(analyseCutouts({ result: [] }).cautions).toEqual([]);
  });
});

describe('what counts as a cut against a baseline', () => {
  it('the edges of an added plate are not cuts: no ligament is reported for them', () => {
    const plate: Shape = { id: 'plate', type: 'rectangle', at: [0, 0], width: 200, height: 100 };
    const stiffener: Shape = { id: 'stiff', name: 'Stiffener', type: 'rectangle', at: [95, 100], width: 10, height: 60 };
    const hole: Shape = { id: 'hole', name: 'Hole', type: 'circle', center: [40, 50], radius: 8, op: 'subtract' };
    const base = doc([plate]);
    const added = cautions(doc([plate, stiffener]), base);
    expect(added.filter((c) => c.kind === 'ligament' || c.kind === 'thin-ligament')).toEqual([]);
    const both = cautions(doc([plate, stiffener, hole]), base).filter((c) => c.kind === 'ligament' || c.kind === 'thin-ligament');
    expect(both.map((c) => c.shape?.id)).toEqual(['hole']);
    // 40 − 8 = 32 to the left edge is the narrowest material next to the hole.
    close(both[0].values!.width, 32, 1e-12);
  });
});

afterAll(() => {
  console.log(`cautions: largest relative error at tight tolerance ${worst.value.toExponential(2)}`);
});
