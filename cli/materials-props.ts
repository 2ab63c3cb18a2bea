/**
 * The lines `kern props FILE` prints after the geometric table: the kern's reach, and for a
 * document with materials the materials, the centre of gravity beside the centroid, the mass per
 * length, the transformed section, the results per material and the plastic moments, with the
 * cautions of a transformed section. Every number through the one formatter.
 */
import {
  formatNumber,
  formatQuantity,
  kernOfSection,
  plasticOfSection,
  TRANSFORMED_CAUTION,
  sectionSize,
  stressSection,
  unitText,
  documentLoadUnits,
  type Evaluation,
  type SectionDocument,
} from '../src';

function rows(list: [string, string][]): string[] {
  const w = Math.max(...list.map((r) => r[0].length));
  return list.map(([a, b]) => `${a.padEnd(w)}  ${b}`);
}

export function materialsPropsText(doc: SectionDocument, ev: Evaluation): string[] {
  const s = stressSection(doc, ev);
  if (!s.section) return s.oneMaterial ? [] : [`Materials: ${s.message}`];
  const sec = s.section;
  const L = doc.units;
  const size = sectionSize(sec.bounds);
  const q = (v: number, power: number) => `${formatQuantity(v, power, size)} ${unitText(L, power)}`;
  const xy = (p: { x: number; y: number }) => `(${formatQuantity(p.x, 1, size)}, ${formatQuantity(p.y, 1, size)}) ${L}`;
  const out: string[] = [];
  const kern = kernOfSection(sec);
  if (kern.points) {
    const xs = kern.points.map((p) => p[0]), ys = kern.points.map((p) => p[1]);
    out.push(`Kern (compression inside it causes no tension${s.oneMaterial ? '' : '; transformed section'}): x ${formatQuantity(Math.min(...xs), 1, size)} to ${formatQuantity(Math.max(...xs), 1, size)}, y ${formatQuantity(Math.min(...ys), 1, size)} to ${formatQuantity(Math.max(...ys), 1, size)} ${L}; props --json lists its boundary`);
  } else out.push(`Kern: none (${kern.message})`);
  if (s.oneMaterial) return out;

  const u = documentLoadUnits(doc);
  const t = sec.transformed;
  const ref = sec.parts.find((p) => p.material.id === t.reference)?.material ?? doc.materials?.find((m) => m.id === t.reference);
  out.push('', `Materials (E and fy in ${u.stress}, density in kg/m³; n = E / E of the reference, ${ref?.name || t.reference})`);
  for (const m of doc.materials ?? []) {
    out.push(`  ${m.id === t.reference ? '*' : ' '} ${m.name || m.id} [${m.id}]: E = ${formatNumber(m.E)}, fy = ${formatNumber(m.fy)}, density = ${formatNumber(m.density)}${m.nu !== undefined ? `, ν = ${formatNumber(m.nu)}` : ''}, n = ${formatNumber(m.E / t.E)}`);
  }
  out.push(
    '',
    ...rows([
      ['Centroid of the area C', xy(sec.centroid)],
      ['Centre of gravity G', sec.cg ? xy(sec.cg) : '— (every density is 0)'],
      ['Mass per length', `${formatNumber(sec.massPerLength)} kg/m`],
    ]),
    '',
    `Transformed section (reference ${ref?.name || t.reference}, E = ${formatNumber(t.E)} ${u.stress})`,
    ...rows([
      ['  Transformed area At', q(t.area, 2)],
      ['  Centroid x̄t, ȳt', xy(t.centroid)],
      ['  Ix, Iy', `${q(t.Ix, 4)}, ${q(t.Iy, 4)}`],
      ['  Ixy', q(t.Ixy, 4)],
      ['  I1, I2', `${q(t.I1, 4)}, ${q(t.I2, 4)}`],
      ['  θ', `${formatNumber(t.theta, 4, 90)}°`],
    ]),
    '',
    'Per material',
  );
  for (const p of sec.parts) {
    const m = p.moduli;
    const mod = (v: number | null) => (v === null ? '—' : formatQuantity(v, 3, size));
    out.push(
      `  ${p.material.name || p.material.id}: A = ${q(p.area, 2)}, centroid ${xy(p.centroid)}, ${formatNumber(p.massPerLength)} kg/m, ` +
        `share of EIx ${formatNumber(100 * p.stiffnessShare.x)} %, of EIy ${formatNumber(100 * p.stiffnessShare.y)} %; ` +
        `S to its extreme fibres (top, bottom, left, right) ${mod(m.Sx_top)}, ${mod(m.Sx_bottom)}, ${mod(m.Sy_left)}, ${mod(m.Sy_right)} ${unitText(L, 3)}`,
    );
  }
  const pl = plasticOfSection(sec, u);
  if (pl.plastic) {
    const p = pl.plastic;
    out.push('', ...rows([
      ['Plastic neutral axis, horizontal', `y = ${formatQuantity(p.x.at, 1, size)} ${L}, Mp = ${formatNumber(p.x.Mp)} ${p.unit}`],
      ['Plastic neutral axis, vertical', `x = ${formatQuantity(p.y.at, 1, size)} ${L}, Mp = ${formatNumber(p.y.Mp)} ${p.unit}`],
    ]), p.caution);
  } else out.push(`Plastic moment: ${pl.message}`);
  if (sec.parts.length > 1) out.push(TRANSFORMED_CAUTION);
  return out;
}
