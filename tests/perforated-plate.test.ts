/**
 * Perforated plates: a plate with N = 10, 100 and 1000 circular holes, subtracted one shape each,
 * against the composite closed form.
 *
 * Sources: Gere & Goodno, Mechanics of Materials, App. E (rectangle, case 1: bh³/12; circle,
 * case 9: πr⁴/4) combined by the composite-area method and the parallel-axis theorem (Gere &
 * Goodno Sec. 12.5; Hibbeler, Statics, composite bodies): A = A_plate − N·πr², and each moment is
 * the plate's less each hole's own moment plus its area times its squared offset.
 */
import { afterAll, describe, it } from 'vitest';
import { evaluateDocument, type SectionDocument, type Shape } from '../src';
import { close, worst } from './helpers';

interface Hole {
  x: number;
  y: number;
}

/** Holes of radius r on a staggered grid inside a W × H plate, none touching another or the edge. */
function holes(n: number, W: number, H: number, r: number): Hole[] {
  const cols = Math.ceil(Math.sqrt((n * W) / H));
  const rows = Math.ceil(n / cols);
  const px = W / cols, py = H / rows;
  const out: Hole[] = [];
  for (let k = 0; k < n; k++) {
    const i = k % cols, j = Math.floor(k / cols);
    // Odd rows shifted by a quarter pitch: the pattern has no symmetry to hide an error behind.
    out.push({ x: (i + 0.5 + (j % 2) * 0.25) * px, y: (j + 0.5) * py });
  }
  // The closed form holds for holes that touch nothing: keep them apart and off the edges.
  if (!(0.25 * px > r && py > 2 * r && px > 2 * r)) throw new Error('holes too large for the plate');
  return out;
}

function composite(W: number, H: number, r: number, hs: Hole[]) {
  const Ap = W * H, Ah = Math.PI * r * r;
  const A = Ap - hs.length * Ah;
  let sx = Ap * (W / 2), sy = Ap * (H / 2);
  for (const h of hs) {
    sx -= Ah * h.x;
    sy -= Ah * h.y;
  }
  const xc = sx / A, yc = sy / A;
  // Parallel-axis theorem about the composite centroid.
  let Ix = (W * H ** 3) / 12 + Ap * (H / 2 - yc) ** 2;
  let Iy = (H * W ** 3) / 12 + Ap * (W / 2 - xc) ** 2;
  let Ixy = Ap * (W / 2 - xc) * (H / 2 - yc);
  const Ic = (Math.PI * r ** 4) / 4;
  for (const h of hs) {
    Ix -= Ic + Ah * (h.y - yc) ** 2;
    Iy -= Ic + Ah * (h.x - xc) ** 2;
    Ixy -= Ah * (h.x - xc) * (h.y - yc);
  }
  return { A, xc, yc, Ix, Iy, Ixy };
}

describe('perforated plates against the composite closed form', () => {
  for (const n of [10, 100, 1000]) {
    it(`${n} holes`, () => {
      const W = 1200, H = 600, r = n === 1000 ? 4.5 : 9;
      const hs = holes(n, W, H, r);
      const shapes: Shape[] = [{ id: 'plate', type: 'rectangle', at: [0, 0], width: W, height: H }];
      hs.forEach((h, k) => shapes.push({ id: `h${k}`, type: 'circle', center: [h.x, h.y], radius: r, op: 'subtract' }));
      const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes };
      const ev = evaluateDocument(doc);
      const p = ev.props!;
      const want = composite(W, H, r, hs);
      close(p.area, want.A, 1e-12);
      close(p.centroid.x, want.xc, 1e-12);
      close(p.centroid.y, want.yc, 1e-12);
      close(p.Ix, want.Ix, 1e-12);
      close(p.Iy, want.Iy, 1e-12);
      close(p.Ixy, want.Ixy, 1e-12, want.Ix + want.Iy);
      // Every hole comes back as its own loop, with the plate's outline.
      close(ev.region.length, n + 1, 0);
    });
  }

  it('1000 holes 1e6 away from the origin', () => {
    const W = 1200, H = 600, r = 4.5, off = 1e6;
    const hs = holes(1000, W, H, r);
    const shapes: Shape[] = [{ id: 'plate', type: 'rectangle', at: [off, -off], width: W, height: H }];
    hs.forEach((h, k) => shapes.push({ id: `h${k}`, type: 'circle', center: [off + h.x, -off + h.y], radius: r, op: 'subtract' }));
    const p = evaluateDocument({ format: 'kern-section', version: 2, units: 'mm', shapes }).props!;
    const want = composite(W, H, r, hs);
    close(p.area, want.A, 1e-12);
    close(p.Ix, want.Ix, 1e-9);
    close(p.Iy, want.Iy, 1e-9);
    close(p.Ixy, want.Ixy, 1e-9, want.Ix + want.Iy);
  });
});

afterAll(() => {
  console.log(`perforated-plate: largest relative error ${worst.value.toExponential(2)}`);
});
