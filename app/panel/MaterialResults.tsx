/**
 * Results of a section of several materials: the centre of gravity beside the area centroid, the
 * mass per length, the transformed section relative to the reference material, each material's
 * area, centroid, share of the bending stiffness and elastic moduli to its extreme fibres, and the
 * plastic neutral axes and moments from each material's fy (computed when the editor rests).
 * Keys follow `props --json`: cg.x, mass_per_length, transformed.Ix, by_material.<id>.area, ...
 */
import { formatNumber, formatQuantity, PLASTIC_CAUTION, sectionSize, TRANSFORMED_CAUTION, unitText, type MixedSection, type Units } from '../../src';
import { useEditor, useResults } from '../context';
import { usePlastic, useStressSection } from '../materials/derived';
import { materialColours } from '../paint/materials';
import { ValueRow } from './ValueRow';
import '../materials/materials.css';

function Transformed({ s, units, size }: { s: MixedSection; units: Units; size: number }) {
  const t = s.transformed;
  const q = (key: string, symbol: string, label: string, v: number, power: number) => (
    <ValueRow key={key} prop={`transformed.${key}`} symbol={symbol} label={label} value={v} text={power === 0 ? formatNumber(v, 4, 90) : formatQuantity(v, power, size)} unit={power === 0 ? '°' : unitText(units, power)} />
  );
  return (
    <>
      {q('area', 'At', 'Transformed area Σ n·A', t.area, 2)}
      {q('centroid.x', 'x̄t', 'Transformed centroid x', t.centroid.x, 1)}
      {q('centroid.y', 'ȳt', 'Transformed centroid y', t.centroid.y, 1)}
      {q('Ix', 'Ix,t', 'Moment of inertia x, transformed', t.Ix, 4)}
      {q('Iy', 'Iy,t', 'Moment of inertia y, transformed', t.Iy, 4)}
      {q('Ixy', 'Ixy,t', 'Product of inertia, transformed', t.Ixy, 4)}
      {q('I1', 'I1,t', 'Major principal, transformed', t.I1, 4)}
      {q('I2', 'I2,t', 'Minor principal, transformed', t.I2, 4)}
      {q('theta', 'θt', 'Angle of I1,t from x', t.theta, 0)}
    </>
  );
}

function PerMaterial({ s, units, size, colours }: { s: MixedSection; units: Units; size: number; colours: Map<string, string> }) {
  return (
    <>
      {s.parts.map((p) => {
        const id = p.material.id;
        const k = (key: string) => `by_material.${id}.${key}`;
        const mod = (key: 'Sx_top' | 'Sx_bottom' | 'Sy_left' | 'Sy_right', symbol: string, label: string) => {
          const v = p.moduli[key];
          return v === null ? null : <ValueRow prop={k(`moduli.${key}`)} symbol={symbol} label={label} value={v} text={formatQuantity(v, 3, size)} unit={unitText(units, 3)} />;
        };
        return (
          <div key={id} className="mat-part" data-material={id}>
            <div className="mat-head">
              <span className="material-swatch" style={{ background: colours.get(id) }} aria-hidden />
              {p.material.name || id}
              <span className="xc-muted">n = {formatNumber(p.n)}</span>
            </div>
            <ValueRow prop={k('area')} symbol="Ai" label="Area" value={p.area} text={formatQuantity(p.area, 2, size)} unit={unitText(units, 2)} />
            <ValueRow prop={k('centroid.x')} symbol="x̄i" label="Centroid x" value={p.centroid.x} text={formatQuantity(p.centroid.x, 1, size)} unit={units} />
            <ValueRow prop={k('centroid.y')} symbol="ȳi" label="Centroid y" value={p.centroid.y} text={formatQuantity(p.centroid.y, 1, size)} unit={units} />
            <ValueRow prop={k('mass_per_length')} symbol="mi" label="Mass per length" value={p.massPerLength} text={formatNumber(p.massPerLength)} unit="kg/m" />
            <ValueRow prop={k('stiffness_share.x')} symbol="EIx" label="Share of the bending stiffness about x" value={p.stiffnessShare.x} text={formatNumber(100 * p.stiffnessShare.x)} unit="%" />
            <ValueRow prop={k('stiffness_share.y')} symbol="EIy" label="Share of the bending stiffness about y" value={p.stiffnessShare.y} text={formatNumber(100 * p.stiffnessShare.y)} unit="%" />
            {mod('Sx_top', 'Sx,top', 'Elastic modulus x to its top fibre, It/(n·c)')}
            {mod('Sx_bottom', 'Sx,bot', 'Elastic modulus x to its bottom fibre')}
            {mod('Sy_left', 'Sy,left', 'Elastic modulus y to its left fibre')}
            {mod('Sy_right', 'Sy,right', 'Elastic modulus y to its right fibre')}
          </div>
        );
      })}
    </>
  );
}

function Plastic({ units, size }: { units: Units; size: number }) {
  const { value, stale } = usePlastic(true);
  if (!value) return <p className="mat-note">Plastic moments: computing…</p>;
  if (!value.plastic) return <p className="mat-note">Plastic moments: {value.message}</p>;
  const p = value.plastic;
  return (
    <div className={stale ? 'stale' : ''}>
      <ValueRow prop="plastic.x.axis_y" symbol="yp" label="Plastic neutral axis, horizontal (y)" value={p.x.at} text={formatQuantity(p.x.at, 1, size)} unit={units} />
      <ValueRow prop="plastic.x.Mp" symbol="Mp,x" label="Plastic moment about the horizontal axis" value={p.x.Mp} text={formatNumber(p.x.Mp)} unit={p.unit} />
      <ValueRow prop="plastic.y.axis_x" symbol="xp" label="Plastic neutral axis, vertical (x)" value={p.y.at} text={formatQuantity(p.y.at, 1, size)} unit={units} />
      <ValueRow prop="plastic.y.Mp" symbol="Mp,y" label="Plastic moment about the vertical axis" value={p.y.Mp} text={formatNumber(p.y.Mp)} unit={p.unit} />
      {stale && <p className="mat-note">updating when the section rests…</p>}
    </div>
  );
}

export function MaterialResults() {
  const editor = useEditor();
  const doc = useResults((r) => r.doc);
  const { section, oneMaterial, message } = useStressSection();
  const open = (
    <button className="btn small" data-command="materials.open" onClick={() => editor.run('materials.open')}>
      Materials…
    </button>
  );
  if (oneMaterial) {
    return (
      <section className="panel-section mat-results" data-testid="material-results">
        <div className="results-head">
          <h2>Materials</h2>
          {open}
        </div>
        <p className="mat-note">One material: the properties above are geometric. Add materials for the centre of gravity, the mass per length, the transformed section and plastic moments.</p>
      </section>
    );
  }
  const units = doc.units;
  const colours = materialColours(doc.materials);
  const ref = doc.materials?.find((m) => m.id === doc.reference);
  const size = section ? sectionSize(section.bounds) : 0;
  return (
    <section className="panel-section mat-results" data-testid="material-results">
      <div className="results-head">
        <h2>Materials and centre of gravity</h2>
        {open}
      </div>
      {!section ? (
        <p className="result-message">{message}</p>
      ) : (
        <>
          <div className="prop-group">
            <h3>Centroid and centre of gravity</h3>
            <ValueRow prop="area_centroid.x" symbol="C x" label="Centroid of the area x (geometry)" value={section.centroid.x} text={formatQuantity(section.centroid.x, 1, size)} unit={units} />
            <ValueRow prop="area_centroid.y" symbol="C y" label="Centroid of the area y (geometry)" value={section.centroid.y} text={formatQuantity(section.centroid.y, 1, size)} unit={units} />
            {section.cg ? (
              <>
                <ValueRow prop="cg.x" symbol="G x" label="Centre of gravity x (by density)" value={section.cg.x} text={formatQuantity(section.cg.x, 1, size)} unit={units} />
                <ValueRow prop="cg.y" symbol="G y" label="Centre of gravity y (by density)" value={section.cg.y} text={formatQuantity(section.cg.y, 1, size)} unit={units} />
              </>
            ) : (
              <p className="mat-note">No centre of gravity: every density is 0.</p>
            )}
            <ValueRow prop="mass_per_length" symbol="m" label="Mass per length" value={section.massPerLength} text={formatNumber(section.massPerLength)} unit="kg/m" />
          </div>
          <div className="prop-group">
            <h3>Transformed section</h3>
            <p className="mat-note">
              Relative to the reference {ref?.name || doc.reference} (E = {formatNumber(section.transformed.E)} {doc.stressUnit ?? 'MPa'}): each part counts n = E/E_ref times.
            </p>
            <Transformed s={section} units={units} size={size} />
          </div>
          <div className="prop-group">
            <h3>Per material</h3>
            <PerMaterial s={section} units={units} size={size} colours={colours} />
          </div>
          <div className="prop-group">
            <h3>Plastic (each material at its fy)</h3>
            <Plastic units={units} size={size} />
          </div>
          <ul className="mat-cautions">
            <li>{TRANSFORMED_CAUTION}</li>
            <li>{PLASTIC_CAUTION}</li>
          </ul>
        </>
      )}
    </section>
  );
}
