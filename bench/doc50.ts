/**
 * A 50-shape section for benchmarks and the drag test: an invented service-platform frame made of
 * plates, rolled profiles and circular holes (circles and profiles with fillets included).
 */
import type { SectionDocument, Shape } from '../src';

export function fiftyShapeDocument(): SectionDocument {
  const shapes: Shape[] = [];
  // 10 I-profiles in a row on a base plate, each with a cover plate, plus holes and round bars.
  shapes.push({ id: 'base', type: 'rectangle', at: [-20, -12], width: 1240, height: 12 });
  for (let k = 0; k < 10; k++) {
    const x = k * 120;
    shapes.push({ id: `i${k}`, type: 'i-beam', at: [x, 0], depth: 200, flangeWidth: 100, flangeThickness: 8.5, webThickness: 5.6, rootRadius: 12 });
    shapes.push({ id: `cover${k}`, type: 'rectangle', at: [x - 5, 200], width: 110, height: 8 });
    shapes.push({ id: `bar${k}`, type: 'circle', center: [x + 50, 225], radius: 15 });
  }
  for (let k = 0; k < 9; k++) shapes.push({ id: `tube${k}`, type: 'round-tube', at: [k * 120 + 110, 60], outerDiameter: 40, wall: 4 });
  for (let k = 0; k < 10; k++) shapes.push({ id: `hole${k}`, type: 'circle', center: [k * 120 + 50, 100], radius: 2, op: 'subtract' });
  shapes.push({ id: 'angle', type: 'angle', at: [1230, 0], legVertical: 150, legHorizontal: 90, thickness: 10, rootRadius: 11 });
  return { format: 'kern-section', version: 2, units: 'mm', name: 'Platform frame (benchmark)', shapes };
}
