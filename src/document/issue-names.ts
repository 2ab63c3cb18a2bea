/**
 * Issues about a shape, written with the shape's display name (the one naming rule,
 * `shapeDisplayName`): "Path 3 (shapes[2].segments[4].via): expected a point". The path stays,
 * so a reader can still find the exact place in the file; the name says which shape it is in
 * the words the panel, the canvas and the report use. Issues about anything else are unchanged.
 */
import { formatIssue, type Issue } from '../shapes/check';
import { shapeDisplayName } from '../shapes/ops';
import type { Shape } from '../shapes/shape';

const SHAPE_PATH = /^shapes\[(\d+)\]/;

/** The display name of the shape an issue's path starts in, or null. */
export function issueShapeName(issue: Issue, shapes: readonly Shape[]): string | null {
  const m = SHAPE_PATH.exec(issue.path);
  if (!m) return null;
  const k = Number(m[1]);
  const s = shapes[k];
  if (!s || typeof s !== 'object') return null;
  try {
    return shapeDisplayName(s, k);
  } catch {
    // A record of no known kind (the validator reports it): no kind to name it by.
    return typeof s.name === 'string' && s.name.trim() ? s.name : null;
  }
}

/** formatIssue with the shape's display name in front of a path into `shapes`. */
export function formatShapeIssue(issue: Issue, shapes: readonly Shape[]): string {
  const name = issueShapeName(issue, shapes);
  return name ? `${name} (${issue.path}): ${issue.message}` : formatIssue(issue);
}
