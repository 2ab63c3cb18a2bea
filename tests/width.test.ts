/**
 * One-sided cut widths (src/moments/width.ts) and `cut --json`'s width_above / width_below.
 *
 * Sources:
 * - IPE 300 nominal dimensions, EN 10365: h = 300, b = 150, tw = 7.1, tf = 10.7, r = 15 mm
 *   (from memory; tabulated A = 53.81 cm², which the check of the area below confirms).
 * - Width in the root fillets: the fillet is a quarter circle of radius r tangent to the web and to
 *   the flange underside, so at a distance s below the underside the width is
 *   tw + 2(r − √(r² − (r − s)²)), which is tw + 2r at the tangent level s = 0 (circle geometry).
 * - First moment of the flange about the neutral axis, Q = b tf (h − tf)/2, and the shear stress at
 *   the flange–web junction taken in the web (Gere & Goodno, Mechanics of Materials, shear
 *   stresses in the webs of beams with flanges).
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { cutWithSides, evaluateDocument, momentsAbove, oneSidedWidths, qbWidth, type Region, type SectionDocument, type Shape } from '../src';
import { reverseContour, transformContour } from '../src/geometry/contour';
import { close } from './helpers';

const IPE300 = { h: 300, b: 150, tw: 7.1, tf: 10.7, r: 15 };
const ipeDoc = (at: [number, number] = [0, 0], rotation = 0): SectionDocument => ({
  format: 'kern-section',
  version: 2,
  units: 'mm',
  shapes: [{ id: 'ipe', type: 'i-beam', at, rotation, depth: IPE300.h, flangeWidth: IPE300.b, flangeThickness: IPE300.tf, webThickness: IPE300.tw, rootRadius: IPE300.r }],
});

/** The section mirrored top to bottom (y → −y), loops turned back to CCW outer / CW holes. */
const mirrorY = (r: Region): Region => r.map((c) => reverseContour(transformContour(c, 1, 0, 0, -1, 0, 0)));

describe('IPE 300 at the flange underside (EN 10365 dimensions)', () => {
  const { h, b, tw, tf, r } = IPE300;
  const ev = evaluateDocument(ipeDoc());
  const p = ev.props!;

  test('the area is the tabulated 53.81 cm² (EN 10365, IPE 300; from memory)', () => {
    // A = 2 b tf + (h − 2 tf) tw + (4 − π) r², within the table's rounding.
    close(p.area, 2 * b * tf + (h - 2 * tf) * tw + (4 - Math.PI) * r * r, 1e-12);
    expect(Math.abs(p.area / 5381 - 1)).toBeLessThan(5e-4);
  });

  test('width_above = flange width, width_below = web plus both fillets at the tangent level, exactly', () => {
    const c = h - tf;
    const w = oneSidedWidths(ev.region, 'y', c);
    expect(w.onEdge).toBe(true);
    close(w.above, b, 1e-14);
    close(w.below, tw + 2 * r, 1e-14); // circle geometry: tw + 2r at s = 0
    // The bottom flange's upper face mirrors it: web and fillets above, flange below.
    const bottom = oneSidedWidths(ev.region, 'y', tf);
    close(bottom.above, tw + 2 * r, 1e-14);
    close(bottom.below, b, 1e-14);
  });

  test('Q is the same from both sides of the junction: b tf (h − tf)/2 (Gere & Goodno)', () => {
    const c = h - tf;
    const cut = cutWithSides(ev.region, 'y', c, p);
    const expected = (b * tf * (h - tf)) / 2;
    close(cut.Q, expected, 1e-12);
    // From below: the part under the line, integrated on its own (the mirrored section above −c),
    // about the same centroidal axis. Its first moment is −Q: the same magnitude from either side.
    const under = momentsAbove(mirrorY(ev.region), -c);
    const qBelow = -under.m01 - under.m00 * p.centroid.y;
    close(-qBelow, expected, 1e-12);
    close(cut.Q, -qBelow, 1e-12);
    // Q/b uses the smaller width, the web side: the governing shear stress at the junction.
    expect(cut.qbSide).toBe('below');
    close(cut.widthForQb, tw + 2 * r, 1e-14);
    close(cut.qOverB, expected / (tw + 2 * r), 1e-12);
  });

  test('in the fillet and in the web the two sides agree with the closed form', () => {
    for (const s of [r / 2, r * 0.999, 1e-6]) {
      const w = oneSidedWidths(ev.region, 'y', h - tf - s);
      expect(w.onEdge).toBe(false);
      expect(w.below).toBe(w.above);
      close(w.above, tw + 2 * (r - Math.sqrt(r * r - (r - s) ** 2)), 1e-12);
    }
    const mid = oneSidedWidths(ev.region, 'y', h / 2);
    close(mid.above, tw, 1e-13);
    expect(mid.below).toBe(mid.above);
  });

  test('top and bottom faces: nothing beyond, the full flange on the inside', () => {
    const top = oneSidedWidths(ev.region, 'y', h), bot = oneSidedWidths(ev.region, 'y', 0);
    expect(top.above).toBe(0);
    close(top.below, b, 1e-14);
    close(bot.above, b, 1e-14);
    expect(bot.below).toBe(0);
    expect(oneSidedWidths(ev.region, 'y', h + 1)).toEqual({ above: 0, below: 0, onEdge: false });
  });

  test('a vertical cut at the web face: right of it the web, left of it flanges and fillets only', () => {
    const x = b / 2 - tw / 2; // left face of the web (the I's local origin is bottom left)
    const w = oneSidedWidths(ev.region, 'x', x);
    close(w.above, h, 1e-14); // just right: through the whole depth
    close(w.below, 2 * tf + 2 * r, 1e-14); // just left: both flanges and the two fillets' tangent ends
  });

  test('the same limits with the section moved far off the origin and turned 90° (exact quarter turn)', () => {
    const moved = evaluateDocument(ipeDoc([1e5, -2e5]));
    const w = oneSidedWidths(moved.region, 'y', -2e5 + h - tf);
    // The vertices themselves are only placed to an ulp of 2e5 (3e-11): relative to that position.
    close(w.above, b, 1e-15, 2e5);
    close(w.below, tw + 2 * r, 1e-15, 2e5);
    // Turned by 90°: the flanges are vertical, so a vertical cut meets the flange's inner face.
    const turned = evaluateDocument(ipeDoc([0, 0], 90));
    const bx = turned.props!.bounds;
    // Local y = h − tf lands at x = −(h − tf) after the +90° turn; "right of" is then the web side.
    const wt = oneSidedWidths(turned.region, 'x', bx.xmin + tf);
    close(wt.above, tw + 2 * r, 1e-9);
    close(wt.below, b, 1e-9);
  });
});

describe('other junctions', () => {
  const plate = (extra: Shape[]): SectionDocument => ({
    format: 'kern-section',
    version: 2,
    units: 'mm',
    shapes: [{ id: 'p', type: 'rectangle', at: [0, 0], width: 200, height: 100 }, ...extra],
  });

  test('the top edge of a rectangular hole: the full plate above, the plate less the hole below', () => {
    const ev = evaluateDocument(plate([{ id: 'h', type: 'rectangle', at: [50, 30], width: 60, height: 20, op: 'subtract' }]));
    const w = oneSidedWidths(ev.region, 'y', 50);
    expect(w).toEqual({ above: 200, below: 140, onEdge: true });
    const cut = cutWithSides(ev.region, 'y', 50, ev.props!);
    expect(cut.qbSide).toBe('below');
  });

  test('a circular hole touching the cut line from above: no jump, the full width on both sides', () => {
    const ev = evaluateDocument(plate([{ id: 'h', type: 'circle', center: [100, 60], radius: 20, op: 'subtract' }]));
    const w = oneSidedWidths(ev.region, 'y', 40);
    expect(w.onEdge).toBe(false);
    close(w.above, 200, 1e-14);
    expect(w.below).toBe(w.above);
    // Through the hole's centre the chord is the diameter.
    close(oneSidedWidths(ev.region, 'y', 60).above, 200 - 40, 1e-13);
  });

  test('qbWidth: the smaller non-zero side, or the one non-zero side at a face', () => {
    expect(qbWidth(150, 37.1)).toEqual({ width: 37.1, side: 'below' });
    expect(qbWidth(37.1, 150)).toEqual({ width: 37.1, side: 'above' });
    expect(qbWidth(0, 150)).toEqual({ width: 150, side: 'below' });
    expect(qbWidth(150, 0)).toEqual({ width: 150, side: 'above' });
    expect(qbWidth(7, 7)).toEqual({ width: 7, side: 'both' });
    expect(qbWidth(0, 0)).toEqual({ width: 0, side: 'both' });
  });
});

describe('against the integrating cut (src/moments/cut.ts)', () => {
  test('away from edges on the line, both sides equal the width momentsAbove integrates', () => {
    const ev = evaluateDocument({
      format: 'kern-section',
      version: 2,
      units: 'mm',
      shapes: [
        { id: 'a', type: 'path', start: [0, 0], segments: [{ to: [120, 0] }, { to: [120, 40], via: [140, 20] }, { to: [60, 90] }, { to: [0, 40], via: [20, 80] }, { to: [0, 0] }] },
        { id: 'h', type: 'circle', center: [60, 35], radius: 12, op: 'subtract' },
      ],
    });
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 89.999, noNaN: true }), (c) => {
        const w = oneSidedWidths(ev.region, 'y', c);
        if (w.onEdge) return;
        close(w.above, momentsAbove(ev.region, c).width, 1e-9, 100);
        expect(w.below).toBe(w.above);
      }),
      { numRuns: 300 },
    );
  });

  test('at a jump the one-sided widths are the limits of the integrated width from each side', () => {
    const ev = evaluateDocument(ipeDoc());
    const c = IPE300.h - IPE300.tf;
    const w = oneSidedWidths(ev.region, 'y', c);
    // b(c + δ) is the flange; b(c − δ) follows the fillet: tw + 2r − O(√δ) (circle geometry).
    for (const d of [1e-3, 1e-6]) {
      expect(Math.abs(momentsAbove(ev.region, c + d).width - w.above)).toBeLessThan(1e-9);
      expect(Math.abs(momentsAbove(ev.region, c - d).width - w.below)).toBeLessThan(3 * Math.sqrt(2 * IPE300.r * d));
    }
  });
});

describe('kern cut --json', () => {
  test('width_above and width_below at the flange underside, full precision', () => {
    const dir = mkdtempSync(join(tmpdir(), 'kern-width-'));
    const file = join(dir, 'ipe300.json');
    writeFileSync(file, JSON.stringify(ipeDoc()));
    const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', 'cut', file, '--y', String(IPE300.h - IPE300.tf), '--json'], { encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout);
    close(j.width_above, IPE300.b, 1e-14); // EN 10365 flange width
    close(j.width_below, IPE300.tw + 2 * IPE300.r, 1e-14); // web plus both fillets (circle geometry)
    close(j.Q, (IPE300.b * IPE300.tf * (IPE300.h - IPE300.tf)) / 2, 1e-12); // Gere & Goodno
    // JSON keeps full precision: the number is the double itself, not a rounded text.
    expect(typeof j.Q).toBe('number');
    expect(String(j.Q).replace('.', '').length).toBeGreaterThan(6);
  });
});
