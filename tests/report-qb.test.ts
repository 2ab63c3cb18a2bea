/**
 * The Q/b diagram in the report (src/report/qb-chart.ts): one-sided widths at a junction, the
 * off-scale marks near a hole edge, and the caution for rotated principal axes.
 *
 * Sources: IPE 300 nominal dimensions (EN 10365: h 300, b 150, tw 7.1, tf 10.7, r 15 mm; from
 * memory); Q of the flange b tf (h − tf)/2 and the junction stress taken in the web (Gere & Goodno,
 * Mechanics of Materials, shear stresses in the webs of beams with flanges); Q/b of a rectangle
 * h²/8 at the neutral axis (same, shear formula); the product of inertia of a rectangle turned by
 * β, Ixy' = (Ix − Iy)/2 · sin 2β (Gere & Goodno, transformation equations for moments of inertia).
 */
import { describe, expect, test } from 'vitest';
import { evaluateDocument, formatQuantity, sectionSize, type SectionDocument, type Shape } from '../src';
import { renderReportHtml } from '../src/report';
import { CAP_FACTOR, qbCurve, qbScale, renderQbDiagram } from '../src/report/qb-chart';
import { PRINCIPAL_TURN_DEG, shearFormulaCaution } from '../src/report/caution';
import { close } from './helpers';

const doc = (shapes: Shape[]): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes });
const IPE = doc([{ id: 'i', type: 'i-beam', at: [-75, 0], depth: 300, flangeWidth: 150, flangeThickness: 10.7, webThickness: 7.1, rootRadius: 15 }]);

/** The text of a value cell by its label in the Q/b values table. */
function cell(html: string, label: string): string | undefined {
  return new RegExp(`<td>${label.replace(/[()/]/g, (c) => `\\${c}`)}</td><td class="num">([^<]*)</td>`).exec(html)?.[1];
}

describe('a cut at the flange underside of an IPE 300', () => {
  const ev = evaluateDocument(IPE);
  const p = ev.props!;
  const size = sectionSize(p.bounds);
  const html = renderReportHtml({ doc: IPE, evaluation: ev, cut: { axis: 'y', at: 300 - 10.7 } });

  test('both one-sided widths are printed, and Q/b uses the web side', () => {
    expect(cell(html, 'Cut width b just above the cut')).toBe('150');
    expect(cell(html, 'Cut width b just below the cut')).toBe('37.1'); // tw + 2r (circle geometry)
    const Q = (150 * 10.7 * (300 - 10.7)) / 2; // Gere & Goodno
    expect(cell(html, 'First moment Q of that area about the centroidal axis')).toBe(formatQuantity(Q, 3, size));
    expect(cell(html, 'Q/b, with b just below the cut (the smaller width)')).toBe(formatQuantity(Q / 37.1, 2, size));
    expect(html).toContain('the width jumps here');
  });

  test('the diagram has a step at the junction: two points at the level, Q/b with each width', () => {
    const curve = qbCurve(ev.region, 'y', p);
    const at = curve.filter((c) => c.at === 300 - 10.7);
    expect(at).toHaveLength(2);
    const Q = (150 * 10.7 * (300 - 10.7)) / 2;
    close(at[0].value, Q / 37.1, 1e-12); // from below first (the web and fillets)
    close(at[1].value, Q / 150, 1e-12); // then above (the flange)
    // Points are in order along the depth.
    for (let i = 1; i < curve.length; i++) expect(curve[i].at).toBeGreaterThanOrEqual(curve[i - 1].at);
  });

  test('no caution for a doubly symmetric section (θ = 0)', () => {
    expect(shearFormulaCaution(p)).toBeNull();
    expect(html).not.toContain('data-caution');
  });

  test('a rectangle at its neutral axis still reads Q/b = h²/8 with no step (Gere & Goodno)', () => {
    const r = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 50 }]);
    const h = renderReportHtml({ doc: r, evaluation: evaluateDocument(r), cut: { axis: 'y', at: 25 } });
    expect(cell(h, 'Cut width b')).toBe('100');
    expect(cell(h, 'Q/b')).toBe(formatQuantity(50 ** 2 / 8, 2, 100));
    expect(h).not.toContain('the width jumps here');
  });
});

describe('off scale near a hole edge', () => {
  // A bar 40 wide with a Ø39.8 hole: at the hole's mid-height only two 0.1 mm ligaments remain,
  // so b → 0.2 while Q stays that of the half bar: Q/b spikes over a sliver of the depth.
  const bar = doc([
    { id: 'b', type: 'rectangle', at: [0, 0], width: 40, height: 200 },
    { id: 'h', type: 'circle', center: [20, 100], radius: 19.9, op: 'subtract' },
  ]);
  const ev = evaluateDocument(bar);
  const p = ev.props!;

  test('the scale is capped, the spike is marked and the largest value written out', () => {
    const curve = qbCurve(ev.region, 'y', p);
    const { vmax, cap } = qbScale(curve.map((c) => c.value));
    expect(cap).not.toBeNull();
    expect(vmax).toBe(cap);
    const peak = Math.max(...curve.map((c) => c.value).filter(Number.isFinite));
    expect(peak).toBeGreaterThan(cap!); // the spike is real ...
    const html = renderQbDiagram(ev.region, p, 'mm', { axis: 'y', at: 150 });
    expect(html).toMatch(/data-off-scale="/); // ... and marked, not drawn off the chart
    expect(html).toContain(`capped at ${CAP_FACTOR} × the 90th percentile`);
    expect(html).toContain('▲');
    // Every plotted point lies within the chart frame (y from 4 to 31 mm on the 40 mm chart).
    const d = /<path class="curve" d="([^"]*)"/.exec(html)![1];
    for (const m of d.matchAll(/[ML]([\d.]+) ([\d.]+)/g)) {
      expect(Number(m[2])).toBeGreaterThanOrEqual(4 - 1e-9);
      expect(Number(m[2])).toBeLessThanOrEqual(31 + 1e-9);
    }
  });

  test('a smooth section is not capped: the whole parabola of a rectangle is drawn', () => {
    const r = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 50 }]);
    const e = evaluateDocument(r);
    expect(qbScale(qbCurve(e.region, 'y', e.props!).map((c) => c.value)).cap).toBeNull();
  });
});

describe('the caution for principal axes turned from x and y', () => {
  const turned = (deg: number) => {
    const d = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 20, rotation: deg }]);
    return evaluateDocument(d).props!;
  };

  test('a 100 × 20 rectangle turned 5° raises it; turned 0.5° does not (threshold 1°)', () => {
    expect(PRINCIPAL_TURN_DEG).toBe(1);
    const p5 = turned(5);
    // Ixy = (Ix − Iy)/2 · sin 2β for the turned rectangle, here about its own axes (Gere & Goodno).
    const Ix0 = (100 * 20 ** 3) / 12, Iy0 = (20 * 100 ** 3) / 12;
    close(Math.abs(p5.Ixy), Math.abs(((Ix0 - Iy0) / 2) * Math.sin((2 * 5 * Math.PI) / 180)), 1e-9);
    expect(shearFormulaCaution(p5)).toMatch(/turned 5° from x and y/); // through the one formatter: 5, not 5.0
    expect(shearFormulaCaution(turned(0.5))).toBeNull();
    expect(shearFormulaCaution(turned(90))).toBeNull(); // principal axes along y and x again
  });

  test('an unequal angle prints the caution with its Q/b diagram', () => {
    const a = doc([{ id: 'a', type: 'angle', at: [0, 0], legVertical: 150, legHorizontal: 90, thickness: 10, rootRadius: 12 }]);
    const html = renderReportHtml({ doc: a, evaluation: evaluateDocument(a), cut: { axis: 'y', at: 40 } });
    expect(html).toContain('data-caution="principal-axes"');
    expect(html).toMatch(/assume bending about a principal axis/);
    expect(html).toMatch(/more than 1° from x and y/); // the threshold is stated with it
  });

  test('a nearly isotropic section with an ill-defined θ does not raise it', () => {
    // A square with a tiny notch: Ix ≈ Iy, so θ may be anything, but Ixy is negligible.
    const p = evaluateDocument(
      doc([
        { id: 's', type: 'rectangle', at: [0, 0], width: 100, height: 100 },
        { id: 'n', type: 'rectangle', at: [99, 99], width: 2, height: 2, op: 'subtract' },
      ]),
    ).props!;
    expect(Math.abs(p.theta)).toBeGreaterThan(1);
    expect(shearFormulaCaution(p)).toBeNull();
  });
});
