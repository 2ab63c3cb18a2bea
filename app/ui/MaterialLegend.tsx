/**
 * The canvas legend, bottom right: each material's fill (with the reference marked), the marks
 * C, G and the kern when shown, and the stress colour scale with its values when the stress map
 * is on.
 */
import { formatNumber } from '../../src';
import { useEditorState, useResults } from '../context';
import { useLoadCase, useStressSection } from '../materials/derived';
import { materialColours, stressColour, STRESS_INK } from '../paint/materials';
import '../materials/materials.css';

function StressScale({ peak, unit }: { peak: number; unit: string }) {
  const stops = Array.from({ length: 11 }, (_, k) => `${stressColour(k / 5 - 1)} ${k * 10}%`).join(', ');
  return (
    <div className="stress-scale" data-testid="stress-scale" data-peak={String(peak)}>
      <div>σ ({unit})</div>
      <div className="bar" style={{ background: `linear-gradient(to right, ${stops})` }} />
      <div className="ticks">
        <span>{formatNumber(-peak)}</span>
        <span>0</span>
        <span>{formatNumber(peak)}</span>
      </div>
      <div className="ends">
        <span>compression</span>
        <span>tension</span>
      </div>
    </div>
  );
}

export function MaterialLegend() {
  const materials = useResults((r) => r.doc.materials);
  const reference = useResults((r) => r.doc.reference);
  const unit = useResults((r) => r.doc.stressUnit ?? 'MPa');
  const overlays = useEditorState((s) => s.overlays);
  const { section, oneMaterial } = useStressSection();
  const lc = useLoadCase();
  const map = overlays.stress && lc && !('error' in lc) && !lc.unloaded ? lc : null;
  const showG = overlays.centroid && !oneMaterial && !!section?.cg;
  if (!materials?.length && !map && !overlays.kern) return null;
  const colours = materialColours(materials);
  return (
    <div className="mat-legend" data-testid="material-legend" aria-label="Legend">
      {!!materials?.length && (
        <ul>
          {materials.map((m) => (
            <li key={m.id} data-legend-material={m.id}>
              <span className="material-swatch" style={{ background: colours.get(m.id) }} />
              {m.name || m.id}
              {m.id === reference && <span className="ref">(reference)</span>}
            </li>
          ))}
        </ul>
      )}
      {(showG || overlays.kern) && (
        <ul>
          {showG && (
            <li>
              <span style={{ color: STRESS_INK.gravity, fontWeight: 700 }}>G</span> centre of gravity · <b>C</b> centroid of the area
            </li>
          )}
          {overlays.kern && (
            <li>
              <span className="material-swatch" style={{ background: 'rgba(29, 107, 82, 0.25)', borderColor: STRESS_INK.kern }} /> kern: compression inside it causes no tension
            </li>
          )}
        </ul>
      )}
      {map && <StressScale peak={map.peak} unit={unit} />}
    </div>
  );
}
