/**
 * The names of the selected shapes on the canvas, above each one's own outline, in the one
 * naming of the panel, the report and the CLI (`shapeDisplayName`: its own name, else its kind
 * and place in the list, "Path 1"). At most MAX_NAMES are written, so a box selection of many
 * shapes does not bury the drawing.
 */
import { shapeDisplayName } from '../../../src';
import { useEditor, useEditorState } from '../../context';
import { INK, label } from '../../paint/ink';
import { chainPoints, regionPolylines } from '../../paint/trace';
import { activeSection } from '../../store/section';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

const MAX_NAMES = 12;

/** Top-left corner of points given as flat [x, y, ...] lists (world), or null. */
function topLeft(polys: readonly ArrayLike<number>[]): [number, number] | null {
  let x = Infinity, y = -Infinity;
  for (const p of polys) {
    for (let i = 0; i + 1 < p.length; i += 2) {
      x = Math.min(x, p[i]);
      y = Math.max(y, p[i + 1]);
    }
  }
  return Number.isFinite(x) && Number.isFinite(y) ? [x, y] : null;
}

export function ShapeNamesNode({ v }: { v: ViewTransform }) {
  const editor = useEditor();
  const selected = useEditorState((s) => s.selected);
  const section = useEditorState((s) => activeSection(s.doc));
  const results = editor.results.shapesOf(section);
  const sel = new Set(selected);
  const picked = section.shapes.flatMap((s, i) => (sel.has(s.id) ? [{ name: shapeDisplayName(s, i), r: results[i] }] : [])).slice(0, MAX_NAMES);
  if (picked.length === 0) return null;
  return (
    <Paint
      paint={(ctx) => {
        const tol = 1 / v.scale;
        for (const { name, r } of picked) {
          if (!r) continue;
          const corner = topLeft(r.chains ? r.chains.map((c) => chainPoints(c, tol)) : regionPolylines(r.region, tol));
          if (!corner) continue;
          label(ctx, name, screenX(v, corner[0]), screenY(v, corner[1]) - 8, INK.selection);
        }
      }}
    />
  );
}
