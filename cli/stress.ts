/**
 * `kern stress FILE [--N F] [--Mx M] [--My M] [--V F --cut y=VALUE|x=VALUE] [--at X,Y]... [--json]
 *                   [--force N|kN|MN|lbf|kip] [--stress MPa|kPa|Pa|GPa|psi|ksi] [--moment-length U]
 *                   [--variant NAME] [--units U]`
 *
 * Normal stresses under an axial force and two bending moments (general bending formula on the
 * transformed section; a document without materials is one material), the largest tension and
 * compression with their places, per material too, the neutral axis, the stress at each --at
 * point, and τ = VQ/(Ib) at a cut. Loads come from the flags; a load not given on the command line
 * is taken from the document's `loads` (none: 0). Units are the document's, or the flags'; loads
 * read from the document are converted to the flags' units. Exit codes: 0 done, 2 invalid input.
 */
import {
  analyseLoadCase,
  axisAngle,
  tensionSide,
  documentLoadUnits,
  formatIssue,
  formatNumber,
  FORCE_UNIT_IN_NEWTONS,
  FORCE_UNITS,
  ONE_MATERIAL_ID,
  SIGN_CONVENTION,
  stressAt,
  stressJson,
  stressSection,
  STRESS_UNITS,
  UNIT_IN_METRES,
  UNITS,
  evaluateDocument,
  momentUnitText,
  type ForceUnit,
  type LoadCase,
  type LoadUnits,
  type Loads,
  type SectionDocument,
  type StressPoint,
  type StressUnit,
  type Units,
} from '../src';
import { loadSection, parseArgs, UsageError } from './main';

function out(s: string): void {
  process.stdout.write(s.endsWith('\n') ? s : s + '\n');
}
function err(s: string): void {
  process.stderr.write(s.endsWith('\n') ? s : s + '\n');
}

const LOAD_FLAGS = ['N', 'Mx', 'My', 'V'] as const;

/** Take every `--at X,Y` (or `--at=X,Y`) out of the arguments: the flag may be repeated. */
export function takeRepeated(args: string[], name: string): { rest: string[]; values: string[] } {
  const rest: string[] = [], values: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === `--${name}`) {
      if (i + 1 >= args.length) throw new UsageError(`--${name} needs a value`);
      values.push(args[++i]);
    } else if (a.startsWith(`--${name}=`)) values.push(a.slice(name.length + 3));
    else rest.push(a);
  }
  return { rest, values };
}

function number(raw: string | true | undefined, flag: string): number | undefined {
  if (raw === undefined) return undefined;
  const v = raw === true || raw.trim() === '' ? NaN : Number(raw);
  if (!Number.isFinite(v)) throw new UsageError(`--${flag} needs a finite number, got "${raw === true ? '' : raw}"`);
  return v;
}

function point(raw: string): [number, number] {
  const parts = raw.split(',').map((v) => (v.trim() === '' ? NaN : Number(v)));
  if (parts.length !== 2 || !parts.every(Number.isFinite)) throw new UsageError(`--at needs two numbers X,Y, got "${raw}"`);
  return [parts[0], parts[1]];
}

function oneOf<T extends string>(raw: string | true | undefined, flag: string, allowed: readonly T[]): T | undefined {
  if (raw === undefined) return undefined;
  if (raw === true || !(allowed as readonly string[]).includes(raw)) throw new UsageError(`--${flag} must be one of ${allowed.join(', ')}, got "${raw === true ? '' : raw}"`);
  return raw as T;
}

function parseCut(raw: string | true | undefined): { axis: 'x' | 'y'; at: number } | null {
  if (raw === undefined) return null;
  const m = raw === true ? null : /^\s*([xy])\s*=\s*(.+)$/.exec(raw);
  const at = m ? Number(m[2]) : NaN;
  if (!m || m[2].trim() === '' || !Number.isFinite(at)) throw new UsageError(`--cut needs y=VALUE or x=VALUE with a finite number, got "${raw === true ? '' : raw}"`);
  return { axis: m[1] as 'x' | 'y', at };
}

/** Loads of the document, re-expressed from its units in `to` (force and moment length). */
export function convertLoads(loads: Loads, from: LoadUnits, to: LoadUnits): Loads {
  const f = FORCE_UNIT_IN_NEWTONS[from.force] / FORCE_UNIT_IN_NEWTONS[to.force];
  const m = (f * UNIT_IN_METRES[from.momentLength ?? from.length]) / UNIT_IN_METRES[to.momentLength ?? to.length];
  const out: Loads = {};
  if (loads.N !== undefined) out.N = loads.N * f;
  if (loads.V !== undefined) out.V = loads.V * f;
  if (loads.Mx !== undefined) out.Mx = loads.Mx * m;
  if (loads.My !== undefined) out.My = loads.My * m;
  return out;
}

const at = (p: { x: number; y: number }, size: number) => `(${formatNumber(p.x, 6, size)}, ${formatNumber(p.y, 6, size)})`;

function materialName(doc: SectionDocument, id: string): string {
  if (id === ONE_MATERIAL_ID && !doc.materials?.length) return 'the section';
  return doc.materials?.find((m) => m.id === id)?.name || id;
}

function printText(doc: SectionDocument, file: string, lc: LoadCase, points: ReturnType<typeof stressAt>[], size: number): void {
  const u = lc.units;
  const L = doc.units;
  const s = (v: number) => `${formatNumber(v)} ${u.stress}`;
  const pt = (p: StressPoint | null) => (p ? `σ = ${s(p.value)} at ${at(p, size)} ${L}${doc.materials?.length ? ` in ${materialName(doc, p.material)}` : ''}` : 'none');
  out(`Stresses in ${doc.name ?? file} (σ in ${u.stress}, tension +; N, V in ${u.force}; Mx, My in ${momentUnitText(u)}; coordinates in ${L})`);
  out(`Loads: N = ${formatNumber(lc.loads.N)} ${u.force}, Mx = ${formatNumber(lc.loads.Mx)} ${momentUnitText(u)}, My = ${formatNumber(lc.loads.My)} ${momentUnitText(u)}${lc.loads.V ? `, V = ${formatNumber(lc.loads.V)} ${u.force}` : ''}`);
  out(`Largest tension       ${pt(lc.extremes.maxTension)}`);
  out(`Largest compression   ${pt(lc.extremes.maxCompression)}`);
  if (doc.materials?.length && lc.extremes.byMaterial.length > 1) {
    for (const e of lc.extremes.byMaterial) out(`  ${materialName(doc, e.material)}: largest ${s(e.max.value)} at ${at(e.max, size)}, smallest ${s(e.min.value)} at ${at(e.min, size)}`);
  }
  const na = lc.axis;
  out(na ? `Neutral axis          through ${at(na.point, size)} ${L}, at ${formatNumber(axisAngle(na.direction), 4, 90)}° from x; the fibres ${tensionSide(lc)} it are in tension` : 'Neutral axis          none (no bending: the stress is the same everywhere in each material)');
  for (const p of points) {
    if (!p.inside) out(`At ${at(p, size)}: outside the section`);
    else out(`At ${at(p, size)}: ${p.stresses.map((q) => `σ = ${s(q.value)}${doc.materials?.length ? ` (${materialName(doc, q.material)})` : ''}`).join(', ')}`);
  }
  if (lc.shear) {
    const sh = lc.shear;
    const where = sh.axis === 'y' ? `y = ${formatNumber(sh.at, 6, size)}` : `x = ${formatNumber(sh.at, 6, size)}`;
    out(`Shear at the cut ${where}: V = ${formatNumber(sh.V)} ${u.force}, b = ${formatNumber(sh.width)} ${L}, τ = VQ/(Ib) = ${sh.tau === null ? '— (the cut misses the section)' : s(sh.tau)}`);
  }
  out(`Sign convention: ${SIGN_CONVENTION}`);
  for (const c of lc.cautions) out(c);
}

export async function stressCommand(args: string[]): Promise<number> {
  const { rest, values } = takeRepeated(args, 'at');
  const a = parseArgs(rest, [...LOAD_FLAGS, 'cut', 'force', 'stress', 'moment-length', 'variant', 'units']);
  for (const k of a.flags.keys()) if (![...LOAD_FLAGS, 'cut', 'force', 'stress', 'moment-length', 'variant', 'units', 'json'].includes(k)) throw new UsageError(`unknown option --${k}`);
  if (a.positional.length !== 1) throw new UsageError(a.positional.length ? `stress takes one FILE, got ${a.positional.length}` : 'missing FILE');
  const given: Loads = {};
  for (const k of LOAD_FLAGS) {
    const v = number(a.flags.get(k), k);
    if (v !== undefined) given[k] = v;
  }
  const points = values.map(point);
  const cut = parseCut(a.flags.get('cut'));
  const force = oneOf<ForceUnit>(a.flags.get('force'), 'force', FORCE_UNITS);
  const stress = oneOf<StressUnit>(a.flags.get('stress'), 'stress', STRESS_UNITS);
  const momentLength = oneOf<Units>(a.flags.get('moment-length'), 'moment-length', UNITS);
  const variant = a.flags.get('variant');
  if (variant === true) throw new UsageError('--variant needs the name of a proposal');
  if (given.V !== undefined && !cut) throw new UsageError('--V needs a cut line for τ = VQ/(Ib): add --cut y=VALUE (V along y) or --cut x=VALUE (V along x)');

  const file = a.positional[0];
  const units = a.flags.get('units');
  const loaded = await loadSection(file, typeof units === 'string' ? units : undefined, variant);
  if (!loaded) return 2;
  const doc = loaded.doc;
  const docUnits = documentLoadUnits(doc);
  const lu: LoadUnits = documentLoadUnits({ ...doc, ...(force ? { forceUnit: force } : {}), ...(stress ? { stressUnit: stress } : {}), ...(momentLength ? { momentLength } : {}) });
  const loads: Loads = { ...convertLoads(doc.loads ?? {}, docUnits, lu), ...given };

  const ev = evaluateDocument(doc);
  const s = stressSection(doc, ev);
  if (!s.section) {
    err(`${file}: ${s.message ?? 'the section has no area'}`);
    for (const w of ev.warnings) err(`  warning: ${formatIssue(w)}`);
    return 2;
  }
  const lc = analyseLoadCase(s.section, loads, lu, cut);
  const size = Math.max(s.section.bounds.xmax - s.section.bounds.xmin, s.section.bounds.ymax - s.section.bounds.ymin);
  const shown = points.map(([x, y]) => stressAt(lc.field, x, y));
  for (const w of [...loaded.warnings, ...ev.warnings.map(formatIssue)]) err(`warning: ${w}`);
  if (a.flags.has('json')) {
    const j = stressJson(s.section, lc.field, points);
    const sh = lc.shear;
    out(
      JSON.stringify(
        {
          ...j,
          units: { length: doc.units, ...j.units },
          one_material: s.oneMaterial,
          loads: { ...j.loads, V: lc.loads.V },
          shear: sh && { axis: sh.axis, at: sh.at, V: sh.V, width: sh.width, Q: sh.Q, q: sh.q, tau: sh.tau, tau_unsymmetric: sh.tauUnsymmetric },
          cautions: lc.cautions,
        },
        null,
        2,
      ),
    );
    return 0;
  }
  printText(doc, file, lc, shown, size);
  return 0;
}
