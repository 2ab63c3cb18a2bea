/**
 * Line elements on the command line: the line groups in `kern props` (JSON and table), and
 * `kern weld FILE [--group NAME] [--at X,Y --fx FX --fy FY [--m M]] [--json] [--variant NAME]`,
 * the elastic weld-group forces for the document's weld loads or for one load given on the line.
 *
 * JSON of `props`: `lines` is the first line group (the only one in most documents; its name in
 * `lines.group`) with length, centroid{x,y}, Ix, Iy, Ixy, J, the principal values and the line
 * section moduli, per unit thickness; `line_groups` lists every group by name. A document of line
 * elements only gives `area_properties: "absent"` with the reason instead of the area keys.
 * Exit codes: 0 done, 2 invalid input or usage.
 */
import {
  evaluateDocument,
  formatIssue,
  formatLineProperty,
  formatNumber,
  formatQuantity,
  LINE_GROUP_CAUTION,
  LINE_PROPERTY_CATALOG,
  linePropertiesJson,
  sectionSize,
  WELD_GROUP_CAUTION,
  weldResult,
  type Evaluation,
  type LineGroupResult,
  type SectionDocument,
  type WeldLoadCase,
  type WeldResult,
} from '../src';
import { loadSection, parseArgs, UsageError } from './main';
import { parsePoint } from './netsection';

function out(s: string): void {
  process.stdout.write(s.endsWith('\n') ? s : s + '\n');
}
function err(s: string): void {
  process.stderr.write(s.endsWith('\n') ? s : s + '\n');
}

function groupJson(g: LineGroupResult) {
  return { group: g.group, elements: g.ids, ...(g.props ? linePropertiesJson(g.props) : { message: g.message }) };
}

/** The line groups for `props --json` ({} when the section has no line elements). */
export function linesJson(ev: Evaluation) {
  if (ev.lines.length === 0) return {};
  return { lines: groupJson(ev.lines[0]), line_groups: Object.fromEntries(ev.lines.map((g) => [g.group, groupJson(g)])) };
}

function table(rows: [string, string, string][]): string {
  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  return rows.map(([a, b, c]) => `${a.padEnd(w0)}  ${b.padStart(w1)} ${c}`.trimEnd()).join('\n');
}

/** The line groups as tables for `props` ('' when there are none). */
export function linesTable(ev: Evaluation, units: SectionDocument['units']): string {
  if (ev.lines.length === 0) return '';
  const parts: string[] = [];
  for (const g of ev.lines) {
    const n = g.ids.length;
    parts.push(`Line group "${g.group}" (${n} line element${n === 1 ? '' : 's'}), per unit thickness:`);
    if (!g.props) parts.push(`  ${g.message}`);
    else parts.push(table(LINE_PROPERTY_CATALOG.map((info) => {
      const f = formatLineProperty(info, g.props!, units);
      return [info.label, f.text, f.unit];
    })));
  }
  parts.push(LINE_GROUP_CAUTION);
  return parts.join('\n');
}

/** One weld result as the JSON record the CLI prints (forces per length in force unit / length unit). */
export function weldJson(w: WeldResult) {
  const r = w.result;
  const point = (p: { x: number; y: number; fx: number; fy: number; f: number }) => ({ x: p.x, y: p.y, fx: p.fx, fy: p.fy, f: p.f });
  return {
    index: w.index,
    ...(w.load.name ? { name: w.load.name } : {}),
    group: w.group,
    load: { at: { x: w.load.at[0], y: w.load.at[1] }, Fx: w.load.Fx, Fy: w.load.Fy, M: w.load.M ?? 0 },
    units: { force: w.units.force, length: w.units.length, moment: w.units.moment, force_per_length: w.units.perLength },
    ...(r
      ? {
          length: r.properties.length,
          centroid: { ...r.properties.centroid },
          J: r.properties.J,
          moment_about_centroid: w.moment,
          direct: { ...r.direct },
          critical: point(r.critical),
          also_critical: r.alsoCritical.map(point),
          uniform: r.uniform,
        }
      : { message: w.message }),
  };
}

/** One weld result as text. */
export function weldText(w: WeldResult, units: SectionDocument['units']): string {
  const r = w.result;
  const u = w.units;
  const name = w.load.name ? ` "${w.load.name}"` : '';
  const head = `Weld load ${w.index + 1}${name} on line group "${w.group}": F = (${formatNumber(w.load.Fx)}, ${formatNumber(w.load.Fy)}) ${u.force} at (${formatNumber(w.load.at[0], 6)}, ${formatNumber(w.load.at[1], 6)}) ${units}` +
    (w.load.M ? `, M = ${formatNumber(w.load.M)} ${u.moment}` : '');
  if (!r) return `${head}\n  ${w.message}`;
  const size = sectionSize(r.properties.bounds);
  const len = (v: number) => formatQuantity(v, 1, size, 6);
  const pt = (p: { x: number; y: number }) => `(${len(p.x)}, ${len(p.y)}) ${units}`;
  const fl = (v: number) => formatNumber(v);
  const rows: [string, string, string][] = [
    ['Length L', formatQuantity(r.properties.length, 1, size), units],
    ['Centroid', pt(r.properties.centroid), ''],
    ['Polar moment J (per unit throat)', formatQuantity(r.properties.J, 3, size), `${units}³`],
    ['Moment about the centroid (+ CCW)', fl(w.moment!), u.moment],
    ['Direct force per length F/L', `(${fl(r.direct.fx)}, ${fl(r.direct.fy)})`, u.perLength],
    ['Largest force per length', fl(r.critical.f), u.perLength],
    ['  at', pt(r.critical), ''],
    ['  components (fx, fy)', `(${fl(r.critical.fx)}, ${fl(r.critical.fy)})`, u.perLength],
  ];
  for (const p of r.alsoCritical) rows.push(['  the same at', pt(p), '']);
  const lines = [head, table(rows)];
  if (r.uniform) lines.push('  The load passes through the centroid: every point carries F/L.');
  return lines.join('\n');
}

/** A one-off load from the flags, or null when none is given. */
function flagLoad(flags: Map<string, string | true>): Omit<WeldLoadCase, 'group'> | null {
  const given = ['at', 'fx', 'fy', 'm'].filter((k) => flags.has(k));
  if (given.length === 0) return null;
  if (!flags.has('at')) throw new UsageError('a weld load needs --at X,Y (the point where the force acts) with --fx, --fy or --m');
  if (!['fx', 'fy', 'm'].some((k) => flags.has(k))) throw new UsageError('a weld load needs a force or a moment: --fx, --fy (force unit) or --m (force × momentLength)');
  const at = parsePoint(flags.get('at'), 'at');
  // A component left out is 0.
  const num = (k: string) => {
    const raw = flags.get(k);
    if (raw === undefined) return undefined;
    const v = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : NaN;
    if (!Number.isFinite(v)) throw new UsageError(`--${k} needs a finite number, got "${raw === true ? '' : raw}"`);
    return v;
  };
  const M = num('m');
  return { at: [at.x, at.y], Fx: num('fx') ?? 0, Fy: num('fy') ?? 0, ...(M !== undefined ? { M } : {}) };
}

export async function weldCommand(args: string[]): Promise<number> {
  const a = parseArgs(args, ['group', 'at', 'fx', 'fy', 'm', 'variant', 'units']);
  if (a.positional.length !== 1) throw new UsageError('weld needs one FILE');
  const file = a.positional[0];
  const oneOff = flagLoad(a.flags);
  const groupFlag = a.flags.get('group');
  if (groupFlag === true) throw new UsageError('--group needs the name of a line group');
  const variant = a.flags.get('variant');
  if (variant === true) throw new UsageError('--variant needs the name of a proposal');
  const loaded = await loadSection(file, a.flags.get('units') as string | undefined, variant);
  if (!loaded) return 2;
  const doc = loaded.doc;
  for (const w of loaded.warnings) err(`warning: ${w}`);
  const ev = evaluateDocument(doc);
  const groups = ev.lines.map((g) => g.group);
  if (groups.length === 0) {
    err(`${file}: the section has no line elements, so there is no weld group to load`);
    return 2;
  }
  if (groupFlag !== undefined && !groups.includes(groupFlag.trim())) {
    err(`${file}: there is no line group "${groupFlag}"; the section's line groups are ${groups.map((g) => `"${g}"`).join(', ')}`);
    return 2;
  }
  let results: WeldResult[];
  if (oneOff) {
    const group = groupFlag?.trim() ?? (groups.length === 1 ? groups[0] : null);
    if (group === null) throw new UsageError(`the section has ${groups.length} line groups (${groups.map((g) => `"${g}"`).join(', ')}): name one with --group`);
    results = [weldResult(doc, { group, ...oneOff }, 0, ev.lines.find((g) => g.group === group))];
  } else {
    results = ev.welds.filter((w) => groupFlag === undefined || w.group === groupFlag.trim());
    if (results.length === 0) {
      err(`${file}: the document has no weld loads${groupFlag !== undefined ? ` on "${groupFlag}"` : ''}; give one with --at X,Y --fx FX --fy FY [--m M]`);
      return 2;
    }
  }
  if (a.flags.has('json')) {
    out(JSON.stringify({ units: doc.units, welds: results.map(weldJson), warnings: ev.warnings.map(formatIssue), caution: WELD_GROUP_CAUTION }, null, 2));
  } else {
    out(`${doc.name ?? file} (${doc.units})`);
    for (const w of results) out(weldText(w, doc.units));
    for (const w of ev.warnings) out(`warning: ${formatIssue(w)}`);
    out(WELD_GROUP_CAUTION);
  }
  return results.some((w) => !w.result) ? 2 : 0;
}
