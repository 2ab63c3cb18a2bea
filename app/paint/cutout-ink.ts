/**
 * The cutout check's colours, Kern's own, chosen to stay apart from the editor's palette
 * (ink.ts): the baseline a faint grey-green dashed outline; removed material a warm amber with a
 * dense hatch; added material a sea green; caution markers a deep red triangle (warnings) or a
 * slate circle (notes); net-section lines an indigo. The panel, the legend and the report use the
 * same values.
 */
export const CUTOUT_INK = {
  baselineLine: 'rgba(82, 104, 96, 0.75)',
  baselineFill: 'rgba(120, 140, 132, 0.10)',
  removedFill: 'rgba(222, 128, 26, 0.30)',
  removedHatch: 'rgba(196, 98, 0, 0.75)',
  removedLine: '#b35f00',
  addedFill: 'rgba(38, 150, 110, 0.28)',
  addedLine: '#1f7a58',
  warning: '#a3231a',
  note: '#3d5a6c',
  markerText: '#ffffff',
  netLine: '#3f3d9e',
  netGap: 'rgba(63, 61, 158, 0.45)',
} as const;

const hatches = new WeakMap<CanvasRenderingContext2D, CanvasPattern | null>();

/** A dense diagonal hatch for the removed material (drawn at a different angle from the subtract hatch). */
export function removedHatch(ctx: CanvasRenderingContext2D): CanvasPattern | string {
  if (!hatches.has(ctx)) {
    let p: CanvasPattern | null = null;
    if (typeof document !== 'undefined') {
      const c = document.createElement('canvas');
      c.width = c.height = 6;
      const g = c.getContext('2d');
      if (g) {
        g.strokeStyle = CUTOUT_INK.removedHatch;
        g.lineWidth = 1.2;
        g.beginPath();
        // Falling diagonal (the subtract hatch rises), so the two read apart.
        g.moveTo(-1, -1);
        g.lineTo(7, 7);
        g.moveTo(-1, 5);
        g.lineTo(1, 7);
        g.moveTo(5, -1);
        g.lineTo(7, 1);
        g.stroke();
        p = ctx.createPattern(c, 'repeat');
      }
    }
    hatches.set(ctx, p);
  }
  return hatches.get(ctx) ?? CUTOUT_INK.removedFill;
}
