/**
 * Drawing exports of the evaluated section: SVG (exact arcs, true size), DXF (closed polylines
 * with arc segments), PNG at a chosen resolution, and the section document JSON. Each file is
 * handed to the browser as a Blob download.
 */
import { regionBounds, serialiseDocumentText, type Region, type SectionDocument, type Units } from '../../src';
import { exportDxf, exportSvg } from '../../src/exchange';
import type { CommandContext } from '../commands/registry';
import { documentFileName } from '../ops/document';
import { traceRegion } from '../paint/trace';

/** Largest PNG side and pixel count we offer (common practice, no source: browsers refuse far larger canvases). */
export const PNG_MAX_SIDE = 8192;
export const PNG_MAX_PIXELS = 32_000_000;

export function downloadBlob(name: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** 'Canopy-edge-beam.svg' from the document's name. */
export function exportFileName(doc: SectionDocument, ext: string): string {
  return documentFileName(doc).replace(/\.json$/, `.${ext}`);
}

function sectionRegion(ctx: CommandContext): Region | null {
  const doc = ctx.store.getState().doc;
  const r = ctx.evaluate(doc).region;
  return r.length > 0 && regionBounds(r) ? r : null;
}

export function canExport(ctx: CommandContext): boolean {
  return sectionRegion(ctx) !== null;
}

function refuse(ctx: CommandContext, what: string) {
  ctx.store.setState({ notice: { kind: 'error', title: `Nothing to export as ${what}: the section is empty.`, lines: ['Draw or import a section first.'] } });
}

export function exportSvgFile(ctx: CommandContext): boolean {
  const region = sectionRegion(ctx);
  if (!region) return (refuse(ctx, 'SVG'), false);
  const doc = ctx.store.getState().doc;
  // scale 1: the SVG's physical size is the section's real size (1:1).
  const svg = exportSvg(region, { units: doc.units, scale: 1, title: doc.name ?? 'Section' });
  downloadBlob(exportFileName(doc, 'svg'), new Blob([svg], { type: 'image/svg+xml' }));
  return true;
}

export function exportDxfFile(ctx: CommandContext): boolean {
  const region = sectionRegion(ctx);
  if (!region) return (refuse(ctx, 'DXF'), false);
  const doc = ctx.store.getState().doc;
  downloadBlob(exportFileName(doc, 'dxf'), new Blob([exportDxf(region, doc.units)], { type: 'application/dxf' }));
  return true;
}

export function exportJsonFile(ctx: CommandContext): void {
  const doc = ctx.store.getState().doc;
  downloadBlob(documentFileName(doc), new Blob([serialiseDocumentText(doc)], { type: 'application/json' }));
}

/** Pixel size of the PNG at `pxPerUnit`, with a margin of 4 % of the larger extent. */
export function pngSize(region: Region, pxPerUnit: number): { width: number; height: number; margin: number } | null {
  const b = regionBounds(region);
  if (!b || !(pxPerUnit > 0) || !Number.isFinite(pxPerUnit)) return null;
  const margin = 0.04 * Math.max(b.xmax - b.xmin, b.ymax - b.ymin);
  return {
    width: Math.ceil((b.xmax - b.xmin + 2 * margin) * pxPerUnit),
    height: Math.ceil((b.ymax - b.ymin + 2 * margin) * pxPerUnit),
    margin,
  };
}

/** A resolution that makes the larger side about 2000 px, rounded to 1, 2 or 5 × 10ⁿ px per unit. */
export function defaultPxPerUnit(region: Region): number {
  const b = regionBounds(region);
  if (!b) return 1;
  const raw = 2000 / (1.08 * Math.max(b.xmax - b.xmin, b.ymax - b.ymin));
  const e = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / e;
  return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * e;
}

export function pngProblem(size: { width: number; height: number } | null): string | null {
  if (!size) return 'Give a resolution greater than 0.';
  if (size.width > PNG_MAX_SIDE || size.height > PNG_MAX_SIDE) return `The image would be ${size.width} × ${size.height} px; the largest side allowed is ${PNG_MAX_SIDE} px.`;
  if (size.width * size.height > PNG_MAX_PIXELS) return `The image would have ${size.width * size.height} pixels; at most ${PNG_MAX_PIXELS} are allowed.`;
  return null;
}

/** Paint the section on an offscreen canvas, white paper, at `pxPerUnit`. */
export function renderPng(region: Region, pxPerUnit: number): HTMLCanvasElement | string {
  const size = pngSize(region, pxPerUnit);
  const problem = pngProblem(size);
  if (problem || !size) return problem ?? 'No size.';
  const b = regionBounds(region)!;
  const c = document.createElement('canvas');
  c.width = size.width;
  c.height = size.height;
  const g = c.getContext('2d');
  if (!g) return 'The browser could not create a drawing surface for the image.';
  g.fillStyle = '#ffffff';
  g.fillRect(0, 0, c.width, c.height);
  const v = { scale: pxPerUnit, ox: (size.margin - b.xmin) * pxPerUnit, oy: (b.ymax + size.margin) * pxPerUnit };
  g.beginPath();
  traceRegion(g, region, v);
  g.fillStyle = '#b7c7cf';
  g.fill('nonzero');
  g.strokeStyle = '#1d2b36';
  g.lineWidth = Math.max(1, Math.min(c.width, c.height) / 800);
  g.lineJoin = 'round';
  g.stroke();
  return c;
}

export function exportPngFile(ctx: CommandContext, pxPerUnit: number): Promise<string | null> {
  const region = sectionRegion(ctx);
  if (!region) {
    refuse(ctx, 'PNG');
    return Promise.resolve('The section is empty.');
  }
  const c = renderPng(region, pxPerUnit);
  if (typeof c === 'string') return Promise.resolve(c);
  const doc = ctx.store.getState().doc;
  return new Promise((resolve) =>
    c.toBlob((blob) => {
      if (!blob) return resolve('The browser could not encode the image.');
      downloadBlob(exportFileName(doc, 'png'), blob);
      resolve(null);
    }, 'image/png'),
  );
}

export function unitName(u: Units): string {
  return { mm: 'millimetre', cm: 'centimetre', m: 'metre', in: 'inch', ft: 'foot' }[u];
}
