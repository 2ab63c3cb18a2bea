/**
 * The report's pages for materials, loads and the kern: the materials table, the centre of gravity
 * beside the centroid, the transformed section and the results per material, the plastic moments,
 * a figure of the section with its materials (or the stress map under load), C, G, the kern, the
 * neutral axis and numbered marks at the largest stresses, the load case with the sign convention,
 * τ at the cut, and the cautions. Nothing is added for a section of one material without loads
 * unless the kern is asked for.
 *
 * The figure is drawn to a standard scale like the main figure (paper millimetres as user units,
 * exact SVG arcs), and the stress map is one SVG linear gradient per material, as exact as the
 * field itself (σ is linear within a material).
 */
import type { SectionDocument } from '../document/types';
import type { Evaluation } from '../evaluate';
import { UNIT_IN_METRES, type Units } from '../units';
import { regionPathData } from '../exchange/svg-export';
import type { KernPoint } from '../kern/kern';
import { CODE_DEFERRAL, KERN_CAUTION, PLASTIC_CAUTION, STRESS_CAUTION, TRANSFORMED_CAUTION } from '../materials/cautions';
import type { MixedSection } from '../materials/mixed';
import { SIGN_CONVENTION } from '../materials/stress';
import type { StressPoint } from '../materials/extremes';
import { formatNumber, formatQuantity, sectionSize, unitText } from '../properties/catalog';
import { analyseLoadCase, axisAngle, noNormalLoad, tensionSide, type LoadCase } from '../analysis/load-case';
import { kernOfSection } from '../analysis/kern';
import { materialColours, stressColour, STRESS_INK, withAlpha } from '../analysis/palette';
import { plasticOfSection } from '../analysis/plastic';
import { stressSection } from '../analysis/stress-section';
import { documentLoadUnits } from '../analysis/units';
import { escapeHtml } from './escape';
import { chooseScale } from './scale';

export interface MaterialsReportInput {
  doc: SectionDocument;
  evaluation: Evaluation;
  cut?: { axis: 'x' | 'y'; at: number } | null;
  /** Draw the kern even for a section of one material without loads. */
  kern?: boolean;
}

/** True when the report has material, load or kern results to show. */
export function hasMaterialsReport(input: MaterialsReportInput): boolean {
  return !!input.evaluation.props && (!!input.doc.materials?.length || !noNormalLoad(input.doc.loads) || !!input.doc.loads?.V || !!input.kern);
}

const f = (v: number) => (Math.round(v * 1000) / 1000).toString();
const e = escapeHtml;

function row(cells: string[], cls: string[] = []): string {
  return `<tr>${cells.map((c, i) => `<td${cls[i] ? ` class="${cls[i]}"` : ''}>${c}</td>`).join('')}</tr>`;
}

function table(head: string[], rows: string[], cls = ''): string {
  return `<table class="props${cls ? ` ${cls}` : ''}"><thead><tr>${head.map((h) => `<th>${h}</th>`).join('')}</tr></thead><tbody>${rows.join('')}</tbody></table>`;
}

function materialsTable(doc: SectionDocument, s: MixedSection): string {
  const u = documentLoadUnits(doc);
  const colours = materialColours(doc.materials);
  const rows = (doc.materials ?? []).map((m) =>
    row(
      [
        `<span class="swatch" style="background:${colours.get(m.id)}"></span>${e(m.name || m.id)}${m.id === doc.reference ? ' (reference)' : ''}`,
        e(m.id),
        e(formatNumber(m.E)),
        e(formatNumber(m.fy)),
        e(formatNumber(m.density)),
        m.nu === undefined ? '—' : e(formatNumber(m.nu)),
        e(formatNumber(m.E / s.transformed.E)),
      ],
      ['', '', 'num', 'num', 'num', 'num', 'num'],
    ),
  );
  return (
    `<section class="block" data-report="materials"><h2>Materials</h2>` +
    table(['Material', 'Id', `E (${e(u.stress)})`, `fy (${e(u.stress)})`, 'Density (kg/m³)', 'ν', 'n = E/E<sub>ref</sub>'], rows) +
    `<p class="small">Each shape takes the material it names, or the reference; where shapes overlap the later one's material counts, a subtracted shape removes all material. fy is the strength the plastic moment uses.</p></section>`
  );
}

function gravityAndTransformed(doc: SectionDocument, s: MixedSection): string {
  const L = doc.units;
  const size = sectionSize(s.bounds);
  const q = (v: number, p: number) => e(formatQuantity(v, p, size));
  const t = s.transformed;
  const ref = doc.materials?.find((m) => m.id === t.reference);
  const left = table(
    ['Point', 'x', 'y', 'Unit'],
    [
      `<tr data-prop="centroid"><td>Centroid of the area C</td><td class="num">${q(s.centroid.x, 1)}</td><td class="num">${q(s.centroid.y, 1)}</td><td>${e(L)}</td></tr>`,
      `<tr data-prop="cg"><td>Centre of gravity G (by density)</td>${s.cg ? `<td class="num">${q(s.cg.x, 1)}</td><td class="num">${q(s.cg.y, 1)}</td>` : '<td colspan="2">— (every density is 0)</td>'}<td>${e(L)}</td></tr>`,
      `<tr data-prop="transformed.centroid"><td>Transformed centroid (elastic)</td><td class="num">${q(t.centroid.x, 1)}</td><td class="num">${q(t.centroid.y, 1)}</td><td>${e(L)}</td></tr>`,
      `<tr data-prop="mass_per_length"><td>Mass per length</td><td class="num" colspan="2">${e(formatNumber(s.massPerLength))}</td><td>kg/m</td></tr>`,
    ],
  );
  const tr = (key: string, label: string, sym: string, v: number, p: number, unit: string) =>
    `<tr data-prop="transformed.${key}"><td>${e(label)}</td><td>${e(sym)}</td><td class="num">${p === 0 ? e(formatNumber(v, 4, 90)) : q(v, p)}</td><td>${e(unit)}</td></tr>`;
  const right = table(
    ['Transformed section', 'Symbol', 'Value', 'Unit'],
    [
      tr('area', 'Area Σ n·A', 'At', t.area, 2, unitText(L, 2)),
      tr('Ix', 'Moment of inertia, x', 'Ix,t', t.Ix, 4, unitText(L, 4)),
      tr('Iy', 'Moment of inertia, y', 'Iy,t', t.Iy, 4, unitText(L, 4)),
      tr('Ixy', 'Product of inertia', 'Ixy,t', t.Ixy, 4, unitText(L, 4)),
      tr('I1', 'Major principal', 'I1,t', t.I1, 4, unitText(L, 4)),
      tr('I2', 'Minor principal', 'I2,t', t.I2, 4, unitText(L, 4)),
      tr('theta', 'Angle of I1,t from x', 'θt', t.theta, 0, '°'),
    ],
  );
  return (
    `<section class="block" data-report="transformed"><h2>Centre of gravity and transformed section</h2><div class="cols">${left}${right}</div>` +
    `<p class="small">Transformed to the reference material ${e(ref?.name || t.reference)} (E = ${e(formatNumber(t.E))} ${e(documentLoadUnits(doc).stress)}): each part counts n = E/E<sub>ref</sub> times its area; ` +
    `second moments about the transformed centroid by the parallel-axis theorem (Σ n (I + A d²)). Multiply by E<sub>ref</sub> for the bending stiffness.</p></section>`
  );
}

function perMaterial(doc: SectionDocument, s: MixedSection): string {
  const L = doc.units;
  const size = sectionSize(s.bounds);
  const mod = (v: number | null) => (v === null ? '—' : e(formatQuantity(v, 3, size)));
  const rows = s.parts.map((p) =>
    row(
      [
        e(p.material.name || p.material.id),
        e(formatNumber(p.n)),
        e(formatQuantity(p.area, 2, size)),
        `(${e(formatQuantity(p.centroid.x, 1, size))}, ${e(formatQuantity(p.centroid.y, 1, size))})`,
        e(formatNumber(p.massPerLength)),
        `${e(formatNumber(100 * p.stiffnessShare.x))} / ${e(formatNumber(100 * p.stiffnessShare.y))}`,
        `${mod(p.moduli.Sx_top)} / ${mod(p.moduli.Sx_bottom)}`,
        `${mod(p.moduli.Sy_left)} / ${mod(p.moduli.Sy_right)}`,
      ],
      ['', 'num', 'num', 'num', 'num', 'num', 'num', 'num'],
    ),
  );
  const pl = plasticOfSection(s, documentLoadUnits(doc));
  const plastic = pl.plastic
    ? `<p class="small" data-report="plastic">Plastic neutral axes and moments, each material at its fy: horizontal axis at y = ${e(formatQuantity(pl.plastic.x.at, 1, size))} ${e(L)}, ` +
      `Mp,x = ${e(formatNumber(pl.plastic.x.Mp))} ${e(pl.plastic.unit)}; vertical axis at x = ${e(formatQuantity(pl.plastic.y.at, 1, size))} ${e(L)}, Mp,y = ${e(formatNumber(pl.plastic.y.Mp))} ${e(pl.plastic.unit)}. ${e(PLASTIC_CAUTION)}</p>`
    : `<p class="small">Plastic moments: ${e(pl.message)}</p>`;
  return (
    `<section class="block" data-report="by-material"><h2>Results per material</h2>` +
    table(
      ['Material', 'n', `Area (${e(unitText(L, 2))})`, `Centroid (${e(L)})`, 'Mass (kg/m)', 'Share of EIx / EIy (%)', `Sx top / bottom (${e(unitText(L, 3))})`, `Sy left / right (${e(unitText(L, 3))})`],
      rows,
      'per-material',
    ) +
    `<p class="small">S to a material's extreme fibre is I<sub>t</sub>/(n·c), c from the transformed centroidal axis: |σ| = |M|/S there under a moment about that axis alone.</p>${plastic}</section>`
  );
}

interface Mark {
  n: number;
  what: string;
  p: StressPoint;
}

/** Numbered marks at the largest tension and compression, and each other material's worst stress. */
function stressMarks(lc: LoadCase): Mark[] {
  const out: Mark[] = [];
  const seen = new Set<string>();
  const add = (what: string, p: StressPoint | null) => {
    if (!p || seen.has(`${p.x},${p.y},${p.material}`)) return;
    seen.add(`${p.x},${p.y},${p.material}`);
    out.push({ n: out.length + 1, what, p });
  };
  add('largest tension', lc.extremes.maxTension);
  add('largest compression', lc.extremes.maxCompression);
  if (lc.extremes.byMaterial.length > 1) {
    for (const m of lc.extremes.byMaterial) {
      add('largest in this material', m.max);
      add('smallest in this material', m.min);
    }
  }
  return out;
}

/** The part of the line through p along d inside the box, or null (Liang–Barsky). */
function clipLine(p: { x: number; y: number }, d: { x: number; y: number }, b: { x0: number; x1: number; y0: number; y1: number }): [number, number, number, number] | null {
  let t0 = -Infinity, t1 = Infinity;
  for (const [o, dd, lo, hi] of [
    [p.x, d.x, b.x0, b.x1],
    [p.y, d.y, b.y0, b.y1],
  ] as const) {
    if (Math.abs(dd) < 1e-15) {
      if (o < lo || o > hi) return null;
      continue;
    }
    const a = (lo - o) / dd, c = (hi - o) / dd;
    t0 = Math.max(t0, Math.min(a, c));
    t1 = Math.min(t1, Math.max(a, c));
  }
  if (!(t1 > t0)) return null;
  return [p.x + t0 * d.x, p.y + t0 * d.y, p.x + t1 * d.x, p.y + t1 * d.y];
}

function figure(doc: SectionDocument, s: MixedSection, lc: LoadCase | null, kern: KernPoint[] | null, oneMaterial: boolean, marks: Mark[]): { svg: string; scale: string } {
  const b = s.bounds;
  const ext = Math.max(b.xmax - b.xmin, b.ymax - b.ymin);
  const pad = 0.04 * ext;
  const fr = { x0: b.xmin - pad, x1: b.xmax + pad, y0: b.ymin - pad, y1: b.ymax + pad };
  const unitMm = UNIT_IN_METRES[doc.units as Units] * 1000;
  const scale = chooseScale((fr.x1 - fr.x0) * unitMm, (fr.y1 - fr.y0) * unitMm, 120, 125);
  const k = scale.ratio * unitMm;
  // Margins: 3 mm, 8 mm on the right for the neutral axis label, 7 mm below for the scale bar.
  const M = 3, RIGHT = 8, BOTTOM = 7;
  const H = (fr.y1 - fr.y0) * k + M + BOTTOM;
  const X = (x: number) => M + (x - fr.x0) * k, Y = (y: number) => M + (fr.y1 - y) * k;
  const tx = M - fr.x0 * k, ty = M + fr.y1 * k;
  const mat = `matrix(${f(k)} 0 0 ${f(k)} ${f(tx)} ${f(ty)})`;
  const parts: string[] = [];
  const defs: string[] = [];
  const colours = materialColours(doc.materials);
  const map = lc && !lc.unloaded ? lc : null;
  s.parts.forEach((p, i) => {
    let fill = oneMaterial ? '#c9d6e2' : withAlpha(colours.get(p.material.id) ?? '#888888', 0.55);
    const g = map?.gradients.find((q) => q.material === p.material.id);
    if (map && g) {
      const peak = map.peak > 0 ? map.peak : 1;
      if (g.uniform) fill = stressColour(g.low / peak);
      else {
        const id = `sg${i}`;
        const stops = Array.from({ length: 9 }, (_, j) => j / 8);
        if (g.low < 0 && g.high > 0) stops.push(-g.low / (g.high - g.low));
        stops.sort((a, c) => a - c);
        // User-space gradient in the path's own (world, y flipped) coordinates.
        defs.push(
          `<linearGradient id="${id}" gradientUnits="userSpaceOnUse" x1="${g.from.x}" y1="${-g.from.y}" x2="${g.to.x}" y2="${-g.to.y}">` +
            stops.map((t) => `<stop offset="${f(t)}" stop-color="${stressColour((g.low + t * (g.high - g.low)) / peak)}"/>`).join('') +
            `</linearGradient>`,
        );
        fill = `url(#${id})`;
      }
    }
    parts.push(`<path transform="${mat}" d="${regionPathData(p.region)}" fill="${fill}" stroke="#111" stroke-width="${0.25 / k}" fill-rule="nonzero"/>`);
  });
  if (kern && kern.length >= 3) {
    parts.push(`<path class="kern" d="M${kern.map(([x, y]) => `${f(X(x))} ${f(Y(y))}`).join(' L')} Z" fill="rgba(29, 107, 82, 0.18)" stroke="${STRESS_INK.kern}" stroke-width="0.3"/>`);
  }
  if (map?.axis) {
    const seg = clipLine(map.axis.point, map.axis.direction, fr);
    if (seg) parts.push(`<path d="M${f(X(seg[0]))} ${f(Y(seg[1]))} L${f(X(seg[2]))} ${f(Y(seg[3]))}" fill="none" stroke="#111" stroke-width="0.3" stroke-dasharray="3 1 0.6 1"/><text x="${f(X(seg[0]) + 0.5)}" y="${f(Y(seg[1]) - 0.8)}">n.a.</text>`);
  }
  // C and G.
  const cx = X(s.centroid.x), cy = Y(s.centroid.y), r = 1.5;
  parts.push(
    `<circle cx="${f(cx)}" cy="${f(cy)}" r="${r}" fill="#fff" stroke="#111" stroke-width="0.18"/>` +
      `<path d="M${f(cx)} ${f(cy)} H${f(cx + r)} A${r} ${r} 0 0 0 ${f(cx)} ${f(cy - r)} Z M${f(cx)} ${f(cy)} H${f(cx - r)} A${r} ${r} 0 0 0 ${f(cx)} ${f(cy + r)} Z" fill="#111"/>` +
      `<text x="${f(cx + 2)}" y="${f(cy - 1.6)}">C</text>`,
  );
  if (!oneMaterial && s.cg) {
    const gx = X(s.cg.x), gy = Y(s.cg.y);
    parts.push(
      `<circle cx="${f(gx)}" cy="${f(gy)}" r="1.4" fill="#fff" stroke="${STRESS_INK.gravity}" stroke-width="0.3"/><circle cx="${f(gx)}" cy="${f(gy)}" r="0.45" fill="${STRESS_INK.gravity}"/>` +
        `<path d="M${f(gx)} ${f(gy + 1.4)} V${f(gy + 3.6)} M${f(gx - 0.7)} ${f(gy + 2.9)} L${f(gx)} ${f(gy + 3.8)} L${f(gx + 0.7)} ${f(gy + 2.9)}" fill="none" stroke="${STRESS_INK.gravity}" stroke-width="0.3"/>` +
        `<text x="${f(gx - 3.6)}" y="${f(gy + 1)}" fill="${STRESS_INK.gravity}">G</text>`,
    );
  }
  for (const m of marks) {
    const x = X(m.p.x), y = Y(m.p.y);
    const colour = m.p.value >= 0 ? STRESS_INK.tension : STRESS_INK.compression;
    parts.push(`<circle cx="${f(x)}" cy="${f(y)}" r="1.7" fill="${colour}" stroke="#fff" stroke-width="0.25"/><text x="${f(x)}" y="${f(y + 0.75)}" text-anchor="middle" fill="#fff" font-size="2.1" font-weight="bold">${m.n}</text>`);
  }
  // Scale bar: a round length near 20 mm of paper; the figure is wide enough for its text.
  const target = 20 / k;
  const p10 = Math.pow(10, Math.floor(Math.log10(target)));
  const bar = [1, 2, 5, 10].map((m) => m * p10).reduce((a, c) => (Math.abs(c * k - 20) < Math.abs(a * k - 20) ? c : a));
  const W = Math.max((fr.x1 - fr.x0) * k + M + RIGHT, 2 + bar * k + 32);
  parts.push(`<path d="M2 ${f(H - 2.2)} h${f(bar * k)} v1 h${f(-bar * k)} Z" fill="#111"/><text x="${f(2 + bar * k + 1.5)}" y="${f(H - 1.2)}">${e(formatNumber(bar))} ${e(doc.units)} (scale ${e(scale.label)})</text>`);
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(W)}mm" height="${f(H)}mm" viewBox="0 0 ${f(W)} ${f(H)}" data-scale="${e(scale.label)}" role="img" aria-label="Section with materials, kern and stresses, scale ${e(scale.label)}">` +
    `<style>text{font:2.6px sans-serif;fill:#111}</style><defs>${defs.join('')}</defs>${parts.join('')}</svg>`;
  return { svg, scale: scale.label };
}

function stressScaleBar(peak: number, unit: string): string {
  const stops = Array.from({ length: 11 }, (_, k) => `${stressColour(k / 5 - 1)} ${k * 10}%`).join(', ');
  return (
    `<div class="stress-bar"><div class="small">σ (${e(unit)}): compression − / tension +</div><div class="bar" style="background:linear-gradient(to right, ${stops})"></div>` +
    `<div class="ticks"><span>${e(formatNumber(-peak))}</span><span>0</span><span>${e(formatNumber(peak))}</span></div></div>`
  );
}

function loadsBlock(doc: SectionDocument, s: MixedSection, lc: LoadCase, marks: Mark[], oneMaterial: boolean): string {
  const u = lc.units;
  const L = doc.units;
  const size = sectionSize(s.bounds);
  const moment = `${u.force}·${u.momentLength ?? L}`;
  const name = (id: string) => (oneMaterial ? 'section' : doc.materials?.find((m) => m.id === id)?.name || id);
  const at = (p: { x: number; y: number }) => `(${e(formatQuantity(p.x, 1, size))}, ${e(formatQuantity(p.y, 1, size))})`;
  const loads = table(
    ['N', 'Mx', 'My', 'V'],
    [row([`${e(formatNumber(lc.loads.N))} ${e(u.force)}`, `${e(formatNumber(lc.loads.Mx))} ${e(moment)}`, `${e(formatNumber(lc.loads.My))} ${e(moment)}`, `${e(formatNumber(lc.loads.V))} ${e(u.force)}`], ['num', 'num', 'num', 'num'])],
    'loads',
  );
  const markRows = marks.map((m) => `<tr data-mark="${m.n}"><td class="num">${m.n}</td><td>${e(m.what)}</td><td>${e(name(m.p.material))}</td><td class="num">${e(formatNumber(m.p.value))}</td><td class="num">${at(m.p)}</td></tr>`);
  const stresses = lc.unloaded
    ? '<p class="small">N, Mx and My are zero: there is no normal stress.</p>'
    : table(['Mark', 'Stress', 'Material', `σ (${e(u.stress)})`, `At (${e(L)})`], markRows);
  const na = lc.axis
    ? `Neutral axis (σ = 0): through ${at(lc.axis.point)} ${e(L)}, at ${e(formatNumber(axisAngle(lc.axis.direction), 4, 90))}° from x; the fibres ${e(tensionSide(lc))} it are in tension.`
    : 'Neutral axis: none (no bending).';
  let shear = '';
  if (lc.shear && lc.loads.V !== 0) {
    const sh = lc.shear;
    shear = `<p class="small" data-report="shear">Shear at the cut ${sh.axis} = ${e(formatQuantity(sh.at, 1, size))} ${e(L)}: V = ${e(formatNumber(sh.V))} ${e(u.force)}, b = ${e(formatQuantity(sh.width, 1, size))} ${e(L)}, Q = ${e(formatQuantity(sh.Q, 3, size))} ${e(unitText(L, 3))} (transformed), τ = VQ/(I·b) = ${sh.tau === null ? '— (the cut misses the section)' : `${e(formatNumber(sh.tau))} ${e(u.stress)}`}${sh.tauUnsymmetric !== null && sh.tau !== null && Math.abs(sh.tauUnsymmetric - sh.tau) > 1e-9 * Math.abs(sh.tau) ? `; with Ixy included ${e(formatNumber(sh.tauUnsymmetric))} ${e(u.stress)}` : ''}.</p>`;
  } else if (lc.loads.V !== 0) shear = `<p class="small">V = ${e(formatNumber(lc.loads.V))} ${e(u.force)} is given; τ = VQ/(Ib) is reported at a cut line (report --cut y=VALUE, or the cut line shown in the editor).</p>`;
  return (
    `<section class="block" data-report="loads"><h2>Loads and stresses</h2>${loads}` +
    `<p class="small">Units: N and V in ${e(u.force)}, moments in ${e(moment)}, stresses in ${e(u.stress)}, coordinates in ${e(L)}.${oneMaterial ? ' The section has no materials: it is taken as one material.' : ''}</p>` +
    `${stresses}<p class="small" data-report="neutral-axis">${na}</p>${shear}` +
    `<p class="small" data-report="sign-convention"><b>Sign convention.</b> ${e(SIGN_CONVENTION)}</p></section>`
  );
}

/** The HTML the report adds for materials, loads and the kern ('' when there is nothing to add). */
export function renderMaterialsReport(input: MaterialsReportInput): string {
  if (!hasMaterialsReport(input)) return '';
  const { doc, evaluation } = input;
  const st = stressSection(doc, evaluation);
  if (!st.section) return `<section class="block"><h2>Materials</h2><p class="empty-message">${e(st.message ?? 'The section of several materials could not be computed.')}</p></section>`;
  const s = st.section;
  const out: string[] = [];
  if (!st.oneMaterial) out.push(materialsTable(doc, s), gravityAndTransformed(doc, s), perMaterial(doc, s));
  const units = documentLoadUnits(doc);
  const loaded = !noNormalLoad(doc.loads) || !!doc.loads?.V;
  let lc: LoadCase | null = null;
  let lcError: string | null = null;
  if (loaded) {
    try {
      lc = analyseLoadCase(s, doc.loads, units, input.cut ?? null);
    } catch (err) {
      lcError = err instanceof Error ? err.message : String(err);
    }
  }
  const kern = kernOfSection(s);
  const marks = lc && !lc.unloaded ? stressMarks(lc) : [];
  const fig = figure(doc, s, lc, kern.points, st.oneMaterial, marks);
  const bits = [
    `Drawn to scale ${fig.scale} on the printed page.`,
    st.oneMaterial ? 'C = centroid.' : `${marks.length ? '' : 'Fill = material (see the materials table); '}C = centroid of the area; G = centre of gravity.`,
    kern.points ? `Green = kern (core, of the ${st.oneMaterial ? '' : 'transformed '}section): an axial compression applied inside it causes no tension.` : `No kern: ${kern.message}`,
  ];
  if (lc && !lc.unloaded) bits.push('Colours = normal stress under the loads below (scale beside); n.a. = neutral axis; numbered marks = largest stresses, listed under Loads and stresses.');
  out.push(
    `<section class="block" data-report="materials-figure"><h2>${[st.oneMaterial ? '' : 'Materials', 'kern', lc && !lc.unloaded ? 'stresses' : ''].filter(Boolean).join(', ').replace(/^k/, 'K').replace(/, ([^,]+)$/, ' and $1')}</h2><div class="fig-row"><div class="figure">${fig.svg}</div>` +
      `<div class="fig-side"><p class="caption">${e(bits.join(' '))}</p>${lc && !lc.unloaded ? stressScaleBar(lc.peak, units.stress) : ''}</div></div></section>`,
  );
  if (lc) out.push(loadsBlock(doc, s, lc, marks, st.oneMaterial));
  if (lcError) out.push(`<section class="block"><h2>Loads and stresses</h2><p class="empty-message">${e(lcError)}</p></section>`);
  const cautions = new Set<string>();
  if (!st.oneMaterial) cautions.add(TRANSFORMED_CAUTION);
  for (const c of lc?.cautions ?? []) cautions.add(c);
  if (kern.points) cautions.add(KERN_CAUTION);
  cautions.add(STRESS_CAUTION);
  cautions.delete(CODE_DEFERRAL);
  cautions.add(CODE_DEFERRAL);
  out.push(`<section class="block materials-cautions" data-report="material-cautions"><ul class="caution-list">${[...cautions].map((c) => `<li>${e(c)}</li>`).join('')}</ul></section>`);
  return out.join('\n');
}

/** CSS the materials pages need (appended to the report's own). */
export const MATERIALS_CSS = `
.swatch { display: inline-block; width: 3mm; height: 3mm; border: 0.2mm solid #555; margin-right: 1.2mm; vertical-align: -0.4mm; }
.stress-bar .bar { height: 3mm; border: 0.2mm solid #555; margin-top: 0.8mm; }
.stress-bar .ticks { display: flex; justify-content: space-between; font-size: 7.5pt; }
table.loads { width: auto; margin: 1mm 0; }
table.per-material { font-size: 7.5pt; }
table.per-material td, table.per-material th { padding: 0.2mm 0.8mm; }
.caution-list { border: 0.4mm solid #111; padding: 1.5mm 2.5mm 1.5mm 6mm; margin: 3mm 0; font-size: 8pt; font-weight: 600; break-inside: avoid; }
`;
