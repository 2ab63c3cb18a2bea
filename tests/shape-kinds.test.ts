/**
 * The shape-kind structure: every kind the engine registers has exactly one editor module in the
 * app, every editor edits only registered kinds, and each kind module is complete. Project
 * rules (a new kind is one module on each side), no outside source.
 */
import { describe, expect, it } from 'vitest';
import { SHAPE_KINDS, SHAPE_TYPES, shapeContours, scaleShape, translateShape, regionMoments, type Shape } from '../src';
import { SHAPE_EDITORS, editorForType } from '../app/shapes';
import { registry } from '../app/command-table';

const SAMPLES: Record<string, Shape> = {
  polygon: { id: 'a', type: 'polygon', points: [[0, 0], [4, 0], [4, 3]] },
  circle: { id: 'a', type: 'circle', center: [1, 2], radius: 3 },
  path: { id: 'a', type: 'path', start: [0, 0], segments: [{ to: [4, 0] }, { to: [0, 0], via: [2, 2] }] },
};

describe('shape kinds', () => {
  it('every engine kind has one editor module, and every editor edits registered kinds', () => {
    for (const t of SHAPE_TYPES) expect(SHAPE_EDITORS.filter((e) => e.types.includes(t)).length, t).toBe(1);
    for (const e of SHAPE_EDITORS) for (const t of e.types) expect(SHAPE_KINDS).toHaveProperty(t);
    for (const t of SHAPE_TYPES) expect(editorForType(t)).toBeDefined();
  });

  it('every kind module is complete: label, validation, outline, transforms, schedule', () => {
    for (const t of SHAPE_TYPES) {
      const k = SHAPE_KINDS[t];
      expect(k.type).toBe(t);
      expect(k.label.length).toBeGreaterThan(0);
      for (const f of ['validate', 'contours', 'mapPoints', 'scaled', 'schedule'] as const) expect(typeof k[f], `${t}.${f}`).toBe('function');
    }
  });

  it('every drawing tool of every editor is a command, with the key it declares', () => {
    for (const e of SHAPE_EDITORS) {
      for (const t of e.tools) {
        const cmd = registry.get(`tool.${t.id}`);
        expect(cmd, t.id).toBeDefined();
        if (t.key) expect(registry.forKey(t.key)?.name).toBe(`tool.${t.id}`);
      }
    }
  });

  it('moves and unit scaling go through the kind: area is kept by a move and scales by k² (exact identities)', () => {
    for (const s of Object.values(SAMPLES)) {
      const A = regionMoments(shapeContours(s)).m00;
      expect(regionMoments(shapeContours(translateShape(s, 7, -3))).m00).toBeCloseTo(A, 12);
      expect(regionMoments(shapeContours(scaleShape(s, 10))).m00).toBeCloseTo(100 * A, 9);
    }
  });
});
