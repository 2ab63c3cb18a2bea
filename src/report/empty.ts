/**
 * What the panel and the report say when there is no section to show: no shapes at all, only
 * line elements, or shapes that combine to nothing (a subtraction that removes everything, a
 * zero-area outline). One wording for both, so neither draws or implies a section that is not there.
 */

/** The message for a section without properties, from the shape count and the evaluator's message. */
export function emptySectionText(shapeCount: number, message: string | null): string {
  if (shapeCount === 0) return 'The section is empty: the document has no shapes, so there is nothing to draw and there are no properties.';
  // The evaluator's own reason when it says more than "no area" (line elements only, a bad outline).
  if (message && !/^The section (is empty|has zero area)/.test(message)) return `${message} There is nothing to draw.`;
  return (
    `The section has no area, so there is nothing to draw and there are no properties. ${shapeCount === 1 ? 'Its shape encloses' : `Its ${shapeCount} shapes, applied in order, leave`} no material: ` +
    'check each shape’s operation (add, subtract, intersect) and their order.'
  );
}
