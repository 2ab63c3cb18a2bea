/**
 * First pass over a DXF file, before any parser sees it: split it into (code, value) groups,
 * refuse what is not a complete ASCII DXF with a message that says where, and collect the few
 * facts the importer needs that dxf-parser drops (extrusion of CIRCLE, paper-space flags, entity
 * kinds it skips). Each entity is also cut out as a small DXF text of its own, so dxf-parser
 * reads one entity at a time (a damaged entity is reported alone), never sees the structures on
 * which it loops forever (a POLYLINE without SEQEND, stray records inside tables) and never gets
 * group codes it logs warnings about.
 *
 * Group codes and value types: AutoCAD DXF Reference (2012), "Group Code Value Types".
 */

export interface DxfGroup {
  code: number;
  value: string;
  /** 1-based line number of the group code in the file. */
  line: number;
}

/** One entity of the ENTITIES section as seen by the scanner. */
export interface ScannedEntity {
  type: string;
  handle: string | null;
  layer: string;
  line: number;
  /** Extrusion direction (group codes 210/220/230); default (0, 0, 1). */
  extrusion: [number, number, number];
  paperSpace: boolean;
  /** The entity alone (with its VERTEX and SEQEND records) as DXF text for dxf-parser; null for kinds not parsed. */
  text: string | null;
  /** Why the entity cannot be parsed safely (it is then reported, not parsed), or null. */
  damage: string | null;
  /** Number of vertex x groups (code 10) read, for checking LWPOLYLINE vertex counts. */
  vertexGroups: number;
}

export interface ScannedBlock {
  name: string;
  /** Base point (group 10/20 of the BLOCK record): the block's own origin. */
  base: [number, number];
  entities: ScannedEntity[];
}

export interface DxfScan {
  header: Map<string, string>;
  entities: ScannedEntity[];
  hasEntitiesSection: boolean;
  /** Layers that are off (negative colour, group 62) or frozen (group 70 bit 1) in the LAYER table. */
  hiddenLayers: Set<string>;
  blocks: Map<string, ScannedBlock>;
}

export type DxfScanResult = ({ ok: true } & DxfScan) | { ok: false; error: string };

/**
 * Entity kinds handed to dxf-parser 1.1.2: the outline kinds and the curve kinds whose points help
 * to show the user what was left out. Annotation kinds are never parsed.
 */
export const PARSER_ENTITY_TYPES = new Set(['ARC', 'CIRCLE', 'LINE', 'LWPOLYLINE', 'POLYLINE', 'ELLIPSE', 'SPLINE', 'INSERT']);

/** Group codes that have a value type in the DXF reference (others make dxf-parser log). */
function knownCode(c: number): boolean {
  return (
    (c >= -5 && c <= 59) || (c >= 60 && c <= 99) || (c >= 100 && c <= 109) || (c >= 110 && c <= 149) ||
    (c >= 160 && c <= 179) || (c >= 210 && c <= 239) || (c >= 270 && c <= 289) || (c >= 290 && c <= 299) ||
    (c >= 300 && c <= 481) || c === 999 || (c >= 1000 && c <= 1071)
  );
}

/** A short printable excerpt of untrusted text for an error message (never markup). */
export function excerpt(s: string, max = 24): string {
  // eslint-disable-next-line no-control-regex
  const clean = s.replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
  return clean.length > max ? clean.slice(0, max) + '…' : clean;
}

const CODE_RE = /^\s*-?\d{1,5}\s*$/;

export function scanDxf(text: unknown): DxfScanResult {
  if (typeof text !== 'string') return { ok: false, error: 'The DXF file could not be read as text.' };
  let src = text;
  if (src.charCodeAt(0) === 0xfeff) src = src.slice(1);
  if (src.trim() === '') return { ok: false, error: 'The DXF file is empty.' };
  if (src.startsWith('AutoCAD Binary DXF')) {
    return { ok: false, error: 'This is a binary DXF file; only ASCII (text) DXF can be read. Save the drawing as ASCII DXF and try again.' };
  }
  const binaryAt = findBinary(src);
  if (binaryAt >= 0) {
    const line = src.slice(0, binaryAt).split(/\r\n|\r|\n/).length;
    return { ok: false, error: `This is not a text DXF file: it contains binary data (line ${line}).` };
  }
  const lines = src.split(/\r\n|\r|\n/);
  while (lines.length > 0 && lines[lines.length - 1].trim() === '') lines.pop();

  const groups: DxfGroup[] = [];
  let sawEof = false;
  for (let i = 0; i < lines.length; i += 2) {
    const codeLine = lines[i];
    if (!CODE_RE.test(codeLine)) {
      return { ok: false, error: `This is not a valid DXF file: line ${i + 1} should hold a group code (an integer) but holds "${excerpt(codeLine.trim())}".` };
    }
    if (i + 1 >= lines.length) {
      return { ok: false, error: `The DXF file is truncated: the group code on line ${i + 1} has no value.` };
    }
    const code = parseInt(codeLine, 10);
    const value = lines[i + 1].trim();
    groups.push({ code, value, line: i + 1 });
    if (code === 0 && value === 'EOF') {
      sawEof = true;
      break;
    }
  }
  if (!sawEof) {
    return { ok: false, error: `The DXF file is truncated: it ends at line ${lines.length} without the closing "0 / EOF" group.` };
  }
  return structure(groups);
}

/** Index of the first character that no text DXF contains (NUL and other C0 controls), or −1. */
function findBinary(s: string): number {
  const n = Math.min(s.length, 1 << 20);
  for (let i = 0; i < n; i++) {
    const c = s.charCodeAt(i);
    if (c < 32 && c !== 9 && c !== 10 && c !== 13) return i;
    if (c === 0xfffd) return i; // replacement character: the bytes were not text
  }
  return -1;
}

function structure(groups: DxfGroup[]): DxfScanResult {
  const header = new Map<string, string>();
  const entities: ScannedEntity[] = [];
  const hiddenLayers = new Set<string>();
  const blocks = new Map<string, ScannedBlock>();
  let hasEntitiesSection = false;
  let k = 0;
  while (k < groups.length) {
    const g = groups[k];
    if (g.code === 0 && g.value === 'SECTION') {
      const name = groups[k + 1];
      if (!name || name.code !== 2) {
        return { ok: false, error: `This is not a valid DXF file: the SECTION on line ${g.line} has no name (group 2).` };
      }
      const end = findEndSec(groups, k + 2);
      if (end < 0) return { ok: false, error: `The DXF file is truncated: the ${excerpt(name.value)} section starting on line ${g.line} has no ENDSEC.` };
      if (name.value === 'HEADER') readHeader(groups, k + 2, end, header);
      else if (name.value === 'ENTITIES') {
        hasEntitiesSection = true;
        const r = readEntities(groups, k + 2, end, entities);
        if (r) return { ok: false, error: r };
      } else if (name.value === 'TABLES') readLayers(groups, k + 2, end, hiddenLayers);
      else if (name.value === 'BLOCKS') {
        const r = readBlocks(groups, k + 2, end, blocks);
        if (r) return { ok: false, error: r };
      }
      k = end + 1;
      continue;
    }
    k++;
  }
  return { ok: true, header, entities, hasEntitiesSection, hiddenLayers, blocks };
}

/** LAYER records of the TABLES section: names of layers that are off or frozen. */
function readLayers(groups: DxfGroup[], from: number, to: number, hidden: Set<string>): void {
  let inLayer = false;
  let name: string | null = null, off = false;
  const close = () => {
    if (inLayer && name !== null && off) hidden.add(name);
    name = null;
    off = false;
  };
  for (let i = from; i < to; i++) {
    const g = groups[i];
    if (g.code === 0) {
      close();
      inLayer = g.value === 'LAYER';
      continue;
    }
    if (!inLayer) continue;
    if (g.code === 2) name = g.value;
    else if (g.code === 62 && Number(g.value) < 0) off = true;
    else if (g.code === 70 && (Number(g.value) & 1) === 1) off = true;
  }
  close();
}

/** BLOCK ... ENDBLK definitions of the BLOCKS section, each with its base point and entities. */
function readBlocks(groups: DxfGroup[], from: number, to: number, blocks: Map<string, ScannedBlock>): string | null {
  let i = from;
  while (i < to) {
    const g = groups[i];
    if (!(g.code === 0 && g.value === 'BLOCK')) {
      i++;
      continue;
    }
    let name = '', bx = 0, by = 0;
    let j = i + 1;
    for (; j < to && groups[j].code !== 0; j++) {
      const h = groups[j];
      if (h.code === 2) name = h.value;
      else if (h.code === 10) bx = Number(h.value);
      else if (h.code === 20) by = Number(h.value);
    }
    let end = j;
    while (end < to && !(groups[end].code === 0 && groups[end].value === 'ENDBLK')) end++;
    const entities: ScannedEntity[] = [];
    const r = readEntities(groups, j, end, entities);
    if (r) return r;
    if (name && !blocks.has(name)) blocks.set(name, { name, base: [Number.isFinite(bx) ? bx : 0, Number.isFinite(by) ? by : 0], entities });
    i = end + 1;
  }
  return null;
}

function findEndSec(groups: DxfGroup[], from: number): number {
  for (let i = from; i < groups.length; i++) {
    const g = groups[i];
    if (g.code === 0 && (g.value === 'ENDSEC' || g.value === 'EOF')) return g.value === 'ENDSEC' ? i : -1;
  }
  return -1;
}

/** Header variables: `9 $NAME` followed by the value group(s); the first value is kept. */
function readHeader(groups: DxfGroup[], from: number, to: number, header: Map<string, string>): void {
  for (let i = from; i < to; i++) {
    const g = groups[i];
    if (g.code === 9 && i + 1 < to && groups[i + 1].code !== 9) header.set(g.value, groups[i + 1].value);
  }
}

const WRAP_HEAD = ['0', 'SECTION', '2', 'ENTITIES'];
const WRAP_TAIL = ['0', 'ENDSEC', '0', 'EOF'];

function readEntities(groups: DxfGroup[], from: number, to: number, entities: ScannedEntity[]): string | null {
  let out: string[] = [];
  const finish = () => {
    const last = entities[entities.length - 1];
    if (last && last.text === '' && out.length > 0) last.text = [...WRAP_HEAD, ...out, ...WRAP_TAIL].join('\n');
    else if (last && last.text === '') last.text = null;
    out = [];
  };
  let current: ScannedEntity | null = null; // the entity whose groups are being read (not a VERTEX)
  let passing = false; // whether the groups being read go on to dxf-parser
  let openPolyline: ScannedEntity | null = null;
  for (let i = from; i < to; i++) {
    const g = groups[i];
    if (g.code === 0) {
      if (openPolyline) {
        if (g.value === 'SEQEND') openPolyline = null;
        else if (g.value !== 'VERTEX') {
          return `This DXF file is damaged: the POLYLINE on line ${openPolyline.line} is not closed by SEQEND before line ${g.line}.`;
        }
        current = null;
        passing = true;
        out.push('0', g.value);
        continue;
      }
      finish();
      passing = PARSER_ENTITY_TYPES.has(g.value);
      current = {
        type: g.value, handle: null, layer: '0', line: g.line, extrusion: [0, 0, 1], paperSpace: false,
        text: passing ? '' : null, damage: null, vertexGroups: 0,
      };
      entities.push(current);
      if (g.value === 'POLYLINE') openPolyline = current;
      if (passing) out.push('0', g.value);
      continue;
    }
    if (current) {
      // dxf-parser's LWPOLYLINE reader loops forever when a vertex x (10) is not followed by its y (20).
      if (current.type === 'LWPOLYLINE' && g.code === 10) {
        current.vertexGroups++;
        const next = groups[i + 1];
        if ((!next || next.code !== 20) && !current.damage) current.damage = `its vertex on line ${g.line} has no y coordinate (group 20)`;
      }
      if (g.code === 5 && current.handle === null) current.handle = g.value;
      else if (g.code === 8) current.layer = g.value;
      else if (g.code === 67) current.paperSpace = g.value === '1';
      else if (g.code === 210 || g.code === 220 || g.code === 230) {
        const v = Number(g.value);
        if (Number.isFinite(v)) current.extrusion[(g.code - 210) / 10] = v;
      }
    }
    // Booleans (290-299) other than 0/1 make dxf-parser throw; drop them with unknown codes.
    const badBool = g.code >= 290 && g.code <= 299 && g.value !== '0' && g.value !== '1';
    if (passing && knownCode(g.code) && !badBool) out.push(String(g.code), g.value);
  }
  if (openPolyline) return `The DXF file is truncated: the POLYLINE on line ${openPolyline.line} has no SEQEND.`;
  finish();
  return null;
}
