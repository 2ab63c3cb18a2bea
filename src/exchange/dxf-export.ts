/**
 * DXF export: each contour of a region as one closed LWPOLYLINE whose vertex bulges are the
 * contour's own (Kern's bulge = DXF bulge = tan(sweep/4), positive counter-clockwise, in a y-up
 * drawing with extrusion (0, 0, 1)), so lines and arcs leave exactly as they are. Holes keep their
 * clockwise direction. The header states the units ($INSUNITS) so our own import, and CAD
 * programs, read the drawing at the right size.
 *
 * Source: AutoCAD DXF Reference (2012): HEADER variables $ACADVER, $INSUNITS, $MEASUREMENT;
 * LWPOLYLINE groups 90 (vertex count), 70 (bit 1 = closed), 10/20 (vertex), 42 (bulge).
 */
import type { Region } from '../geometry/contour';
import type { Units } from '../document/types';

/** $INSUNITS code of each document unit (DXF reference: 1 in, 2 ft, 4 mm, 5 cm, 6 m). */
export const INSUNITS_CODE: Readonly<Record<Units, number>> = { in: 1, ft: 2, mm: 4, cm: 5, m: 6 };

/** Shortest text that reads back as the same double (no precision is lost). */
export function dxfNumber(v: number): string {
  if (Object.is(v, -0) || v === 0) return '0';
  return String(v);
}

export interface DxfExportOptions {
  /** Layer of the polylines; default '0'. */
  layer?: string;
}

export function exportDxf(region: Region, units: Units, opts: DxfExportOptions = {}): string {
  const layer = (opts.layer ?? '0').replace(/[\r\n]/g, ' ') || '0';
  const out: string[] = [];
  const g = (code: number, value: string | number) => out.push(String(code), typeof value === 'number' ? dxfNumber(value) : value);
  const metric = units === 'mm' || units === 'cm' || units === 'm';
  let handle = 0x100;

  g(0, 'SECTION');
  g(2, 'HEADER');
  g(9, '$ACADVER');
  g(1, 'AC1015');
  g(9, '$INSUNITS');
  g(70, INSUNITS_CODE[units]);
  g(9, '$MEASUREMENT');
  g(70, metric ? 1 : 0);
  const seedAt = out.length;
  g(0, 'ENDSEC');

  g(0, 'SECTION');
  g(2, 'ENTITIES');
  for (const c of region) {
    const n = c.xy.length >> 1;
    if (n < 2 || !c.xy.every(Number.isFinite) || (c.bulge && !c.bulge.every(Number.isFinite))) continue;
    g(0, 'LWPOLYLINE');
    g(5, (handle++).toString(16).toUpperCase());
    g(100, 'AcDbEntity');
    g(8, layer);
    g(100, 'AcDbPolyline');
    g(90, n);
    g(70, 1);
    for (let i = 0; i < n; i++) {
      g(10, c.xy[2 * i]);
      g(20, c.xy[2 * i + 1]);
      const b = c.bulge ? c.bulge[i] : 0;
      if (b !== 0) g(42, b);
    }
  }
  g(0, 'ENDSEC');
  g(0, 'EOF');
  // The next free handle, as CAD programs expect in the header.
  out.splice(seedAt, 0, '9', '$HANDSEED', '5', handle.toString(16).toUpperCase());
  return out.join('\n') + '\n';
}
