/**
 * `kern netsection FILE --from X,Y --to X,Y [--json] [--variant NAME]`
 *
 * The net section along a straight line across the section: the gross length inside the material
 * (first entry to last exit), the net length (material only) and each hole or gap on the line,
 * exact from the boundary. The net width that tension checks use; the code's staggered-hole rules
 * and effective net area factors still apply (printed with the result).
 * Exit codes: 0 done, 2 invalid input or usage.
 */
import { formatIssue, formatNumber, type SectionDocument } from '../src';
import { describeGap, netSection, NetSectionError, type NetSection } from '../src/netsection';
import { CompareInputError, evaluateSide, proposalOf } from './compare';
import { loadFile, parseArgs, UsageError } from './main';

function out(s: string): void {
  process.stdout.write(s.endsWith('\n') ? s : s + '\n');
}
function err(s: string): void {
  process.stderr.write(s.endsWith('\n') ? s : s + '\n');
}

/** "X,Y" as a point, or a usage error naming the flag. */
export function parsePoint(raw: string | true | undefined, flag: string): { x: number; y: number } {
  if (raw === undefined || raw === true) throw new UsageError(`--${flag} X,Y is required, e.g. --${flag} 0,50`);
  const parts = raw.split(',').map((v) => (v.trim() === '' ? NaN : Number(v)));
  if (parts.length !== 2 || !parts.every(Number.isFinite)) throw new UsageError(`--${flag} needs two numbers X,Y, got "${raw}"`);
  return { x: parts[0], y: parts[1] };
}

/** The JSON record the CLI prints. */
export function netSectionJson(r: NetSection, units: string) {
  return {
    units,
    from: r.from,
    to: r.to,
    gross_length: r.grossLength,
    net_length: r.netLength,
    gaps: r.gaps.map((g) => ({ from: g.from, to: g.to, length: g.length, kind: g.kind, diameter: g.diameter, centre: g.centre, start: g.start, end: g.end })),
    material: r.material,
    entry: r.entry,
    exit: r.exit,
    notes: r.notes,
    purpose: r.purpose,
    caution: r.caution,
  };
}

export async function netsectionCommand(args: string[]): Promise<number> {
  const a = parseArgs(args, ['from', 'to', 'variant', 'units']);
  if (a.positional.length !== 1) throw new UsageError('netsection needs one FILE');
  const from = parsePoint(a.flags.get('from'), 'from');
  const to = parsePoint(a.flags.get('to'), 'to');
  const file = a.positional[0];
  const loaded = await loadFile(file, a.flags.get('units') as string | undefined);
  if (!loaded.ok) {
    err(`${file}: the section cannot be read:`);
    for (const m of loaded.messages) err(`  ${m}`);
    return 2;
  }
  let doc: SectionDocument = loaded.doc;
  const variant = a.flags.get('variant');
  if (variant === true) throw new UsageError('--variant needs a name');
  if (variant !== undefined) {
    try {
      doc = proposalOf(loaded.doc, variant);
    } catch (e) {
      if (!(e instanceof CompareInputError)) throw e;
      err(`${file}: ${e.message}`);
      return 2;
    }
  }
  const side = evaluateSide(file, doc, loaded.warnings);
  if (typeof side === 'string') {
    err(side);
    return 2;
  }
  let r: NetSection;
  try {
    r = netSection(side.ev.region, from, to);
  } catch (e) {
    if (!(e instanceof NetSectionError)) throw e;
    throw new UsageError(e.message);
  }
  if (a.flags.has('json')) {
    out(JSON.stringify(netSectionJson(r, doc.units), null, 2));
    return 0;
  }
  const u = doc.units;
  const f = (v: number) => formatNumber(v, 6, r.lineLength);
  out(`Net section of ${doc.name ?? file} along (${f(from.x)}, ${f(from.y)}) → (${f(to.x)}, ${f(to.y)}) (${u}):`);
  out(`  Gross length inside the material  ${f(r.grossLength)} ${u}`);
  out(`  Net length (material only)        ${f(r.netLength)} ${u}`);
  if (r.gaps.length) out(`  Gaps along the line (distances from the start point):`);
  for (const g of r.gaps) out(`    ${describeGap(g, f)} ${u}`);
  for (const n of r.notes) out(`note: ${n}`);
  for (const w of side.warnings) out(`warning: ${formatIssue({ path: '', message: w })}`);
  out(r.purpose);
  out(r.caution);
  return 0;
}
