/**
 * JSON-shaped results for the CLI (`props --json`, `stress --json`) and any other consumer, so the
 * CLI only parses arguments, calls these and prints. Keys are snake_case where the CLI spec names
 * them (`mass_per_length`, `by_material`, `max_tension`, `neutral_axis`), points are {x, y} and the
 * kern is a list of [x, y] pairs.
 */
import type { KernPoint } from '../kern/kern';
import { sectionCautions, stressCautions } from './cautions';
import { stressExtremes, type StressPoint } from './extremes';
import type { MixedSection } from './mixed';
import type { CompositePlastic } from './plastic';
import { neutralAxis, SIGN_CONVENTION, stressAt, type StressField } from './stress';
import { momentUnitText } from './units';

export interface MixedPropsJson {
  cg: { x: number; y: number } | null;
  mass_per_length: number;
  transformed: {
    reference: string;
    E: number;
    area: number;
    centroid: { x: number; y: number };
    Ix: number;
    Iy: number;
    Ixy: number;
    I1: number;
    I2: number;
    theta: number;
  };
  by_material: Record<
    string,
    {
      name: string;
      n: number;
      area: number;
      centroid: { x: number; y: number };
      mass_per_length: number;
      stiffness_share: { x: number; y: number };
      moduli: { Sx_top: number | null; Sx_bottom: number | null; Sy_left: number | null; Sy_right: number | null };
    }
  >;
  plastic?: { x: { axis_y: number; Mp: number }; y: { axis_x: number; Mp: number } };
  kern?: KernPoint[];
  cautions: string[];
}

/** The material part of `props --json`: merge it into the geometric properties object. */
export function mixedPropsJson(section: MixedSection, extras: { plastic?: CompositePlastic | null; kern?: KernPoint[] | null } = {}): MixedPropsJson {
  const t = section.transformed;
  const by: MixedPropsJson['by_material'] = {};
  for (const p of section.parts) {
    by[p.material.id] = {
      name: p.material.name,
      n: p.n,
      area: p.area,
      centroid: { ...p.centroid },
      mass_per_length: p.massPerLength,
      stiffness_share: { ...p.stiffnessShare },
      moduli: { ...p.moduli },
    };
  }
  const out: MixedPropsJson = {
    cg: section.cg && { ...section.cg },
    mass_per_length: section.massPerLength,
    // θ + 0 turns the −0 of a symmetric section into the 0 that JSON prints anyway.
    transformed: { reference: t.reference, E: t.E, area: t.area, centroid: { ...t.centroid }, Ix: t.Ix, Iy: t.Iy, Ixy: t.Ixy, I1: t.I1, I2: t.I2, theta: t.theta + 0 },
    by_material: by,
    cautions: sectionCautions(section),
  };
  if (extras.plastic) out.plastic = { x: { axis_y: extras.plastic.x.at, Mp: extras.plastic.x.Mp }, y: { axis_x: extras.plastic.y.at, Mp: extras.plastic.y.Mp } };
  if (extras.kern) out.kern = extras.kern.map((p) => [p[0], p[1]]);
  return out;
}

export interface StressJson {
  units: { stress: string; force: string; moment: string } | null;
  sign_convention: string;
  loads: { N: number; Mx: number; My: number };
  max_tension: StressPoint | null;
  max_compression: StressPoint | null;
  neutral_axis: { point: { x: number; y: number }; direction: { x: number; y: number } } | null;
  by_material: Record<string, { max: StressPoint; min: StressPoint }>;
  at: { x: number; y: number; inside: boolean; stresses: { material: string; value: number }[] }[];
  cautions: string[];
}

/** Everything `stress --json` prints, for a field and the points given with --at. */
export function stressJson(section: MixedSection, field: StressField, at: readonly (readonly [number, number])[] = []): StressJson {
  const ext = stressExtremes(field);
  const by: StressJson['by_material'] = {};
  for (const e of ext.byMaterial) by[e.material] = { max: { ...e.max }, min: { ...e.min } };
  const u = field.units;
  return {
    units: u && { stress: u.stress, force: u.force, moment: momentUnitText(u) },
    sign_convention: SIGN_CONVENTION,
    loads: { ...field.loads },
    max_tension: ext.maxTension && { ...ext.maxTension },
    max_compression: ext.maxCompression && { ...ext.maxCompression },
    neutral_axis: neutralAxis(field),
    by_material: by,
    at: at.map(([x, y]) => stressAt(field, x, y)),
    cautions: stressCautions(section, field, ext),
  };
}
