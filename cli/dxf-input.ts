/**
 * Reading a section for the command line from a section document (.json) or a DXF drawing
 * (.dxf). A DXF that does not state its units needs --units; nothing is guessed.
 */
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { formatIssue, parseDocument, UNITS, validateDocument, type SectionDocument, type Units } from '../src';
import { importDxf } from '../src/exchange';

export type LoadedSection = { ok: true; doc: SectionDocument; warnings: string[] } | { ok: false; messages: string[] };

function readText(path: string): { ok: true; text: string } | { ok: false; message: string } {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch (e) {
    return { ok: false, message: `cannot read ${path}: ${(e as NodeJS.ErrnoException).code ?? String(e)}` };
  }
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true }).decode(bytes) };
  } catch {
    // Older DXF files are written in the drawing's ANSI code page; Latin-1 keeps every byte.
    return { ok: true, text: bytes.toString('latin1') };
  }
}

export function loadSectionFile(path: string, unitsFlag?: string): LoadedSection {
  let units: Units | undefined;
  if (unitsFlag !== undefined) {
    if (!(UNITS as readonly string[]).includes(unitsFlag)) {
      return { ok: false, messages: [`--units must be one of ${UNITS.join(', ')}; got "${unitsFlag}"`] };
    }
    units = unitsFlag as Units;
  }
  const read = readText(path);
  if (!read.ok) return { ok: false, messages: [read.message] };

  if (!/\.dxf$/i.test(path)) {
    const r = parseDocument(read.text);
    if (!r.ok) return { ok: false, messages: r.errors.map(formatIssue) };
    const warnings = r.warnings.map(formatIssue);
    if (units && units !== r.doc.units) warnings.push(`--units ${units} ignored: the section document states its units (${r.doc.units})`);
    return { ok: true, doc: r.doc, warnings };
  }

  const im = importDxf(read.text, { units, targetUnits: units });
  if (!im.ok) return { ok: false, messages: [im.error] };
  const warnings: string[] = [...im.warnings];
  if (im.units === null) {
    return {
      ok: false,
      messages: [`${basename(path)} does not state its units ($INSUNITS); pass --units with one of ${UNITS.join(', ')}`, ...warnings],
    };
  }
  if (im.unitsFromFile && units && im.unitsFromFile !== units) {
    warnings.push(`the drawing is in ${im.unitsFromFile}; it was converted to ${units} as asked by --units`);
  }
  for (const p of im.problems) warnings.push(`left out: ${p.message}`);
  for (const g of im.ignored) warnings.push(`ignored ${g.count} ${g.type} ${g.count === 1 ? 'entity' : 'entities'} (not outline geometry)`);
  if (im.shapes.length === 0) {
    return { ok: false, messages: [`${basename(path)} contains no closed outline to use as a section`, ...warnings] };
  }
  const doc: SectionDocument = { format: 'kern-section', version: 2, units: im.units, name: basename(path), shapes: im.shapes };
  const v = validateDocument(JSON.parse(JSON.stringify(doc)));
  if (!v.ok) return { ok: false, messages: v.errors.map(formatIssue) };
  return { ok: true, doc: v.doc, warnings: [...warnings, ...v.warnings.map(formatIssue)] };
}
