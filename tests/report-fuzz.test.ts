/**
 * The report under fuzzed sections (no outside source: the robustness requirement of the engine):
 * whatever the geometry, rendering never throws and never prints NaN, Infinity or "undefined";
 * one-sided widths are finite and never negative; dimension texts never overlap.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateDocument, oneSidedWidths, validateDocument, type Region, type SectionDocument } from '../src';
import { findDimensionFeatures, layoutDimensions, renderReportHtml } from '../src/report';

const num = fc.oneof(fc.double({ min: -200, max: 200, noNaN: true }), fc.integer({ min: -50, max: 50 }));
const pt = fc.tuple(num, num);
const op = fc.constantFrom(undefined, 'add', 'subtract', 'intersect');
const shapeArb = fc.oneof(
  fc.record({ type: fc.constant('polygon'), points: fc.array(pt, { minLength: 3, maxLength: 7 }), op }),
  fc.record({ type: fc.constant('circle'), center: pt, radius: fc.double({ min: 0.5, max: 120, noNaN: true }), op }),
  fc.record({ type: fc.constant('rectangle'), at: pt, width: fc.double({ min: 0.5, max: 300, noNaN: true }), height: fc.double({ min: 0.5, max: 300, noNaN: true }), rotation: fc.option(num, { nil: undefined }), op }),
  fc.record({ type: fc.constant('path'), start: pt, segments: fc.array(fc.record({ to: pt, via: fc.option(pt, { nil: undefined }) }), { minLength: 2, maxLength: 5 }), op }),
);

function toDoc(shapes: Record<string, unknown>[]): unknown {
  return {
    format: 'kern-section',
    version: 2,
    units: 'mm',
    shapes: shapes.map((s, k) => {
      const out: Record<string, unknown> = { id: `s${k}`, ...s };
      for (const key of Object.keys(out)) if (out[key] === undefined) delete out[key];
      if (s.type === 'path') out.segments = [...(s.segments as { to: unknown; via?: unknown }[]).map((g) => (g.via ? g : { to: g.to })), { to: s.start }];
      return out;
    }),
  };
}

describe('fuzzed sections through the report', () => {
  it('render without throwing and without NaN, Infinity or undefined in the text', () => {
    let rendered = 0;
    fc.assert(
      fc.property(fc.array(shapeArb, { minLength: 1, maxLength: 4 }), fc.double({ min: 0, max: 1, noNaN: true }), (shapes, f) => {
        const r = validateDocument(toDoc(shapes as Record<string, unknown>[]));
        if (!r.ok) return;
        const doc: SectionDocument = r.doc;
        const ev = evaluateDocument(doc);
        const b = ev.props?.bounds;
        const at = b ? b.ymin + f * (b.ymax - b.ymin) : 0;
        const html = renderReportHtml({ doc, evaluation: ev, cut: { axis: f < 0.5 ? 'y' : 'x', at: b ? (f < 0.5 ? at : b.xmin + f * (b.xmax - b.xmin)) : 0 } });
        rendered++;
        const text = html.replace(/<style>[\s\S]*?<\/style>/g, '');
        expect(text).not.toMatch(/NaN|Infinity|undefined/);
        const w = oneSidedWidths(ev.region, 'y', at);
        expect(Number.isFinite(w.above) && w.above >= 0 && Number.isFinite(w.below) && w.below >= 0).toBe(true);
        const cuts: Region[] = doc.shapes.flatMap((s, i) => (s.op === 'subtract' ? [ev.shapes[i].region] : []));
        const l = layoutDimensions(findDimensionFeatures(ev.region, cuts), ev.region, { mm: 1 });
        for (let i = 0; i < l.texts.length; i++)
          for (let j = i + 1; j < l.texts.length; j++) {
            const p = l.texts[i].box, q = l.texts[j].box;
            const roles = [l.texts[i].role, l.texts[j].role];
            // The overall width and height are placed first and unconditionally; every other value
            // keeps clear of all the rest.
            if (roles.every((x) => x === 'width' || x === 'height')) continue;
            expect(p.xmin < q.xmax && p.xmax > q.xmin && p.ymin < q.ymax && p.ymax > q.ymin, `${l.texts[i].text} / ${l.texts[j].text}`).toBe(false);
          }
      }),
      { numRuns: 80 },
    );
    expect(rendered).toBeGreaterThan(20);
  });
});
