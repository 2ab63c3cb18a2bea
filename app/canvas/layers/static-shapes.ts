/**
 * The shapes a drag leaves where they are, painted once into an offscreen bitmap and then copied
 * in one call per frame. In a plate of 4000 holes each hole is a hatched fill and a dashed
 * stroke, and painting them all again on every pointer move took about 100 ms a frame without a
 * GPU; the copy takes about a millisecond. The bitmap is redrawn whenever a shape, the view or
 * the canvas changes, so it never shows anything but what a full repaint would.
 */
import type { ShapeResult } from '../../../src';

export interface StaticPaint {
  /** The shapes' results, compared by identity: the same records give the same picture. */
  items: readonly ShapeResult[];
  /** Anything else the picture depends on (view, operations, errors), compared by value. */
  key: string;
}

interface Cache {
  canvas: HTMLCanvasElement;
  items: readonly ShapeResult[];
  key: string;
}

const caches = new WeakMap<HTMLCanvasElement, Cache>();

function sameItems(a: readonly ShapeResult[], b: readonly ShapeResult[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/**
 * Paint `what` into `ctx` through a bitmap kept per target canvas: `paint` runs only when the
 * items, the key, the canvas size or the context's transform changed since the last call.
 */
export function paintCached(ctx: CanvasRenderingContext2D, what: StaticPaint, paint: (ctx: CanvasRenderingContext2D) => void): void {
  const target = ctx.canvas;
  const t = ctx.getTransform();
  const key = `${what.key}|${target.width}x${target.height}|${t.a},${t.b},${t.c},${t.d},${t.e},${t.f}`;
  let cache = caches.get(target);
  if (!cache || cache.key !== key || !sameItems(cache.items, what.items)) {
    const canvas = cache?.canvas ?? document.createElement('canvas');
    canvas.width = target.width;
    canvas.height = target.height;
    const off = canvas.getContext('2d');
    if (!off) {
      paint(ctx); // no offscreen context: paint directly
      return;
    }
    off.setTransform(t);
    paint(off);
    cache = { canvas, items: what.items, key };
    caches.set(target, cache);
  }
  ctx.save();
  ctx.setTransform(1, 0, 0, 1, 0, 0);
  ctx.drawImage(cache.canvas, 0, 0);
  ctx.restore();
}
