/**
 * `kern props FILE --torsion [--density coarse|normal|fine] [--poisson NU] [--json]`: adds the
 * torsion constant J, the shear centre, the warping constant Cw, the mesh size and the convergence
 * estimate (src/torsion/ by finite elements) to the section properties. The document's own torsion
 * settings apply unless the flags override them. Bad options are usage errors (exit 2); a section
 * the engine cannot mesh is reported with its reason (exit 2).
 */
import {
  computeSectionTorsion,
  poissonText,
  sectionSize,
  TORSION_DENSITIES,
  torsionJson,
  torsionRows,
  type Evaluation,
  type SectionDocument,
  type SectionProperties,
  type SectionTorsion,
  type TorsionDensity,
} from '../src';
import { poissonIssue } from '../src/document/torsion-settings';
import { UsageError } from './main';

export interface TorsionRequest {
  density?: TorsionDensity;
  poisson?: number;
}

/** The torsion flags of a command line: null without --torsion; usage errors for bad values. */
export function torsionRequest(flags: Map<string, string | true>): TorsionRequest | null {
  const density = flags.get('density'), poisson = flags.get('poisson');
  if (!flags.has('torsion')) {
    if (density !== undefined || poisson !== undefined) throw new UsageError('--density and --poisson go with --torsion');
    return null;
  }
  if (flags.get('torsion') !== true) throw new UsageError('--torsion takes no value; set the mesh with --density coarse|normal|fine');
  const req: TorsionRequest = {};
  if (density !== undefined) {
    if (density === true || !(TORSION_DENSITIES as readonly string[]).includes(density)) throw new UsageError(`--density must be one of ${TORSION_DENSITIES.join(', ')}, got "${density === true ? '' : density}"`);
    req.density = density as TorsionDensity;
  }
  if (poisson !== undefined) {
    const v = poisson === true || poisson.trim() === '' ? NaN : Number(poisson);
    const problem = poissonIssue(v);
    if (problem) throw new UsageError(`--poisson: ${problem.replace(/got .*$/, `got "${poisson === true ? '' : poisson}"`)}`);
    req.poisson = v;
  }
  return req;
}

/** Run torsion for an evaluated section; a section the engine cannot take prints its reason and gives null. */
export function runTorsion(file: string, doc: SectionDocument, ev: Evaluation, req: TorsionRequest): Extract<SectionTorsion, { ok: true }> | null {
  const t = computeSectionTorsion(doc, ev, req);
  if (t.ok) return t;
  process.stderr.write(`${file}: torsion cannot be computed: ${t.message}\n`);
  return null;
}

export { torsionJson };

/** The torsion rows as the props table prints them, with the settings and the cautions. */
export function torsionText(t: Extract<SectionTorsion, { ok: true }>, doc: SectionDocument, props: SectionProperties): string {
  const rows = torsionRows(t.result, doc.units, sectionSize(props.bounds), props.centroid).map((r) => [r.label, r.text, r.unit]);
  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  const lines = [
    '',
    `Torsion by finite elements (${t.settings.density} density, ${poissonText(t.settings)}${t.basis.reference ? `; J and Cw in ${t.basis.reference.name}` : ''}):`,
    ...rows.map(([a, b, c]) => `${a.padEnd(w0)}  ${b.padStart(w1)} ${c}`.trimEnd()),
    ...t.cautions.map((c) => `torsion: ${c}`),
  ];
  return lines.join('\n');
}

/**
 * `kern report ... [--torsion] [--density D] [--poisson NU]`: the report includes torsion when the
 * document has torsion settings or any of these flags is given (the flags override the document's
 * settings). Returns the request (null: no torsion asked for by the flags) or a usage message.
 */
export function reportTorsionRequest(flags: Map<string, string>): (TorsionRequest & { asked: boolean }) | string {
  const asked = flags.has('torsion') || flags.has('density') || flags.has('poisson');
  const f = new Map<string, string | true>([...flags].filter(([k]) => k === 'density' || k === 'poisson'));
  f.set('torsion', true);
  try {
    return { ...torsionRequest(f)!, asked };
  } catch (e) {
    if (e instanceof UsageError) return e.message;
    throw e;
  }
}

/** Torsion for the report, run now: when the document asks for it or the flags do, and the section has area. */
export function reportTorsion(doc: SectionDocument, ev: Evaluation, req: TorsionRequest & { asked: boolean }): SectionTorsion | null {
  if (!ev.props || !(req.asked || doc.torsion)) return null;
  const t = computeSectionTorsion(doc, ev, { density: req.density, poisson: req.poisson });
  if (!t.ok) process.stderr.write(`warning: torsion cannot be computed: ${t.message}; the report says so\n`);
  return t;
}
