/**
 * Kern's command line: `kern props FILE`, `kern cut FILE --y VALUE`, `kern report FILE ...`,
 * `kern compare BASE PROPOSED`, `kern netsection FILE --from X,Y --to X,Y`, `kern weld FILE`, `kern stress FILE --Mx ...`.
 * Run with `npm run -s cli -- <command> ...`. Exit codes: 0 ok, 2 bad input or usage, 1 internal.
 */
import { readFileSync } from 'node:fs';
import {
  CAUTION_TEXT,
  cutSection,
  evaluateDocument,
  formatIssue,
  formatNumber,
  formatShapeIssue,
  formatProperty,
  inertiaAboutAxis,
  oneSidedWidths,
  parseDocument,
  propertiesJson,
  sectionExtrasJson,
  sectionOf,
  VariantError,
  PROPERTY_CATALOG,
  type Evaluation,
  type SectionDocument,
  type SectionProperties,
} from '../src';
import { cutRows } from './cut-table';

const USAGE = `Usage:
  kern props FILE [--json] [--variant NAME]
                                           section properties of a section document (.json): its
                                           baseline, or the proposal NAME
      [--torsion [--density coarse|normal|fine] [--poisson NU]]
                                           also J, shear centre and Cw by finite elements
  kern cut FILE (--y VALUE | --x VALUE) [--json]
                                           width, area, centroid and Q of the part above y = VALUE
                                           (or right of x = VALUE)
  kern inertia FILE --through X,Y --angle DEG [--json]
                                           moment of inertia about the axis through (X, Y) at DEG
                                           degrees from +x (parallel-axis transfer)
  kern report FILE --out report.html [--pdf out.pdf] [--cut y=VALUE|x=VALUE] [--paper a4|letter]
              [--variant NAME]             self-contained HTML report, optionally printed to PDF; with
                                           proposals, the cutout check of NAME (else the active one,
                                           else the first) after the baseline
  kern compare BASE.json PROPOSED.json [--json] [--rules en1993|aisc360] [--limits FILE]
  kern compare FILE --variant NAME [...]   a proposal against its baseline: every property before
                                           and after, limits with a within/beyond verdict, cautions
  kern netsection FILE --from X,Y --to X,Y [--json]
                                           gross and net length along a line, each hole or gap
  kern weld FILE [--group NAME] [--at X,Y --fx FX --fy FY [--m M]] [--json]
                                           elastic weld-group forces (weld as a line): the
                                           document's weld loads, or one load given here (force
                                           in the document's force unit, kN if unset; M + CCW in
                                           force x momentLength); the largest force per length
  kern schema [--version 1|2]              JSON Schema of the section document, for editors
  kern stress FILE [--N F] [--Mx M] [--My M] [--at X,Y]... [--V F --cut y=VALUE|x=VALUE] [--json]
                                           normal stresses under N, Mx, My (loads not given come
                                           from the document), largest tension and compression,
                                           neutral axis, σ at points, τ = VQ/(Ib) at a cut; units
                                           as the document states or --force U --stress U
                                           --moment-length U
Options: --units U  (mm, cm, m, in, ft) for a DXF file that does not state its units
         --variant NAME  (props, cut, inertia, weld) a proposal of the document instead of its baseline
Line elements: props gives each line group (length, centroid, Ix, Iy, Ixy, J per unit
thickness; JSON "lines" and "line_groups"); a document of line elements only has its area
properties absent ("area_properties": "absent") and exits 0.`;

export class UsageError extends Error {}

interface Parsed {
  positional: string[];
  flags: Map<string, string | true>;
}

export function parseArgs(args: string[], valued: string[]): Parsed {
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      const name = eq > 0 ? a.slice(2, eq) : a.slice(2);
      if (eq > 0) flags.set(name, a.slice(eq + 1));
      else if (valued.includes(name)) {
        if (i + 1 >= args.length) throw new UsageError(`--${name} needs a value`);
        flags.set(name, args[++i]);
      } else flags.set(name, true);
    } else positional.push(a);
  }
  return { positional, flags };
}

export type Loaded = { ok: true; doc: SectionDocument; warnings: string[] } | { ok: false; messages: string[] };

/** Read and validate a section file. DXF files are handled by the exchange module when present. */
export async function loadFile(path: string, units?: string): Promise<Loaded> {
  if (/\.dxf$/i.test(path)) {
    const mod = await import('./dxf-input');
    return mod.loadSectionFile(path, units);
  }
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    return { ok: false, messages: [`cannot read ${path}: ${(e as NodeJS.ErrnoException).code ?? String(e)}`] };
  }
  const r = parseDocument(text);
  if (!r.ok) return { ok: false, messages: r.errors.map(formatIssue) };
  return { ok: true, doc: r.doc, warnings: r.warnings.map(formatIssue) };
}

/**
 * Read and validate a file and pick its baseline, or the proposal named by --variant. A file that
 * cannot be read or a proposal that is not there is said on stderr, and gives null.
 */
export async function loadSection(file: string, units: string | undefined, variant: string | undefined): Promise<{ doc: SectionDocument; warnings: string[] } | null> {
  const loaded = await loadFile(file, units);
  if (!loaded.ok) {
    err(`${file}: the section cannot be read:`);
    for (const m of loaded.messages) err(`  ${m}`);
    return null;
  }
  if (variant === undefined) return { doc: loaded.doc, warnings: loaded.warnings };
  try {
    return { doc: sectionOf(loaded.doc, variant), warnings: loaded.warnings };
  } catch (e) {
    if (!(e instanceof VariantError)) throw e;
    err(`${file}: ${e.message}`);
    return null;
  }
}

/** `props --json`: the units, every catalogue property (full precision) and the warnings. */
function propsJson(doc: SectionDocument, ev: Evaluation, p: SectionProperties, warnings: string[]) {
  return { units: doc.units, ...propertiesJson(p), ...sectionExtrasJson(doc, ev), warnings: [...warnings, ...ev.warnings.map((w) => formatShapeIssue(w, doc.shapes))] };
}

function table(rows: [string, string, string][]): string {
  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  return rows.map(([a, b, c]) => `${a.padEnd(w0)}  ${b.padStart(w1)} ${c}`.trimEnd()).join('\n');
}

function out(s: string): void {
  process.stdout.write(s.endsWith('\n') ? s : s + '\n');
}
function err(s: string): void {
  process.stderr.write(s.endsWith('\n') ? s : s + '\n');
}

/**
 * Read, validate and evaluate a file: its baseline, or the proposal named by --variant. With
 * `linesOnly`, a section of line elements only (no area) is not an error: its props are null.
 */
async function evaluateFile(file: string | undefined, flags: Parsed['flags']): Promise<{ doc: SectionDocument; ev: Evaluation; props: SectionProperties; warnings: string[] } | null>;
async function evaluateFile(file: string | undefined, flags: Parsed['flags'], linesOnly: true): Promise<{ doc: SectionDocument; ev: Evaluation; props: SectionProperties | null; warnings: string[] } | null>;
async function evaluateFile(file: string | undefined, flags: Parsed['flags'], linesOnly = false) {
  if (!file) throw new UsageError('missing FILE');
  const units = flags.get('units');
  const variant = flags.get('variant');
  if (variant === true) throw new UsageError('--variant needs the name of a proposal');
  const loaded = await loadSection(file, typeof units === 'string' ? units : undefined, variant);
  if (!loaded) return null;
  const doc = loaded.doc;
  const ev = evaluateDocument(doc);
  if (!ev.props && !(linesOnly && ev.lines.length > 0)) {
    err(`${file}: ${ev.message ?? 'the section has no area'}`);
    for (const w of ev.warnings) err(`  warning: ${formatShapeIssue(w, doc.shapes)}`);
    return null;
  }
  return { doc, ev, props: ev.props, warnings: loaded.warnings };
}


export async function main(argv: string[]): Promise<number> {
  const [cmd, ...rest] = argv;
  try {
    if (cmd === 'props') {
      const a = parseArgs(rest, ['units', 'variant', 'density', 'poisson']);
      const tor = a.flags.has('torsion') || a.flags.has('density') || a.flags.has('poisson') ? await import('./torsion') : null;
      const req = tor?.torsionRequest(a.flags) ?? null;
      const r = await evaluateFile(a.positional[0], a.flags, true);
      if (!r) return 2;
      const lines = await import('./lines');
      const props = r.props;
      const t = tor && req && props ? tor.runTorsion(a.positional[0], r.doc, r.ev, req) : null;
      if (req && props && !t) return 2;
      if (a.flags.has('json')) {
        const area = props ? propsJson(r.doc, r.ev, props, r.warnings) : { units: r.doc.units, area_properties: 'absent', message: r.ev.message, warnings: [...r.warnings, ...r.ev.warnings.map(formatIssue)] };
        out(JSON.stringify({ ...area, ...lines.linesJson(r.ev), ...(t ? tor!.torsionJson(t) : {}) }, null, 2));
        return 0;
      }
      out(`${r.doc.name ?? a.positional[0]} (${r.doc.units})`);
      if (props) {
        const rows: [string, string, string][] = PROPERTY_CATALOG.map((info) => {
          const f = formatProperty(info, props, r.doc.units);
          return [info.label, f.text, f.unit];
        });
        out(table(rows));
      } else out(`Area properties: absent. ${r.ev.message ?? ''}`.trim());
      for (const line of (await import('./materials-props')).materialsPropsText(r.doc, r.ev)) out(line);
      if (t && props) out(tor!.torsionText(t, r.doc, props));
      if (r.ev.lines.length) out(lines.linesTable(r.ev, r.doc.units));
      for (const w of [...r.warnings, ...r.ev.warnings.map((i) => formatShapeIssue(i, r.doc.shapes))]) out(`warning: ${w}`);
      out(CAUTION_TEXT);
      return 0;
    }
    if (cmd === 'cut') {
      const a = parseArgs(rest, ['x', 'y', 'units', 'variant']);
      const xs = a.flags.get('x'), ys = a.flags.get('y');
      if ((xs === undefined) === (ys === undefined)) throw new UsageError('give exactly one of --y VALUE or --x VALUE');
      const raw = (xs ?? ys) as string | true;
      const at = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : NaN;
      if (!Number.isFinite(at)) throw new UsageError(`--${xs !== undefined ? 'x' : 'y'} needs a finite number, got "${raw === true ? '' : raw}"`);
      const r = await evaluateFile(a.positional[0], a.flags);
      if (!r) return 2;
      const c = cutSection(r.ev.region, xs !== undefined ? 'x' : 'y', at, r.props);
      // One-sided widths at a level where b jumps (src/moments/width.ts): just above/below, or right/left for --x.
      const sides = oneSidedWidths(r.ev.region, xs !== undefined ? 'x' : 'y', at);
      const result = { at: c.at, width: c.width, width_above: sides.above, width_below: sides.below, area: c.area, centroid: c.centroid, Q: c.Q };
      if (a.flags.has('json')) out(JSON.stringify(result, null, 2));
      else {
        const side = xs !== undefined ? `right of x = ${at}` : `above y = ${at}`;
        out(`Part ${side} (${r.doc.units}):`);
        out(table(cutRows(r.ev.region, r.props, xs !== undefined ? 'x' : 'y', at, r.doc.units)));
      }
      return 0;
    }
    if (cmd === 'inertia') {
      const a = parseArgs(rest, ['through', 'angle', 'units', 'variant']);
      const through = String(a.flags.get('through') ?? '0,0').split(',').map((v) => (v.trim() === '' ? NaN : Number(v)));
      const angle = Number(a.flags.get('angle') ?? 0);
      if (through.length !== 2 || !through.every(Number.isFinite)) throw new UsageError('--through needs two numbers, e.g. --through 0,12.5');
      if (!Number.isFinite(angle)) throw new UsageError('--angle needs a number of degrees');
      const r = await evaluateFile(a.positional[0], a.flags);
      if (!r) return 2;
      const I = inertiaAboutAxis(r.props, through[0], through[1], (angle * Math.PI) / 180);
      if (a.flags.has('json')) out(JSON.stringify({ through: { x: through[0], y: through[1] }, angle, I }, null, 2));
      else out(`I about the axis through (${through[0]}, ${through[1]}) at ${angle}°: ${formatNumber(I)} ${r.doc.units}⁴`);
      return 0;
    }
    if (cmd === 'report') {
      const mod = await import('./report');
      return await mod.reportCommand(rest);
    }
    if (cmd === 'compare') return await (await import('./compare')).compareCommand(rest);
    if (cmd === 'netsection') return await (await import('./netsection')).netsectionCommand(rest);
    if (cmd === 'weld') return await (await import('./lines')).weldCommand(rest);
    if (cmd === 'schema') return (await import('./schema')).schemaCommand(rest);
    if (cmd === 'stress') return await (await import('./stress')).stressCommand(rest);
    if (cmd === undefined || cmd === 'help' || cmd === '--help' || cmd === '-h') {
      out(USAGE);
      return cmd === undefined ? 2 : 0;
    }
    throw new UsageError(`unknown command "${cmd}"`);
  } catch (e) {
    if (e instanceof UsageError) {
      err(`kern: ${e.message}\n${USAGE}`);
      return 2;
    }
    err(`kern: internal error: ${e instanceof Error ? e.message : String(e)}`);
    return 1;
  }
}

const isEntry = process.argv[1] && /cli[\\/]main\.ts$/.test(process.argv[1]);
if (isEntry) {
  // A closed pipe (`kern props f | head`) ends output quietly.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(0);
  });
  main(process.argv.slice(2)).then((code) => {
    process.exitCode = code;
  });
}
