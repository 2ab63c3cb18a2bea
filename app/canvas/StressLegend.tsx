/**
 * The stress map's scale, over the canvas corner: the colour ramp from 0 to the peak |τ| under a
 * unit torque, how to turn it into a stress, and a mark when the map belongs to an earlier
 * section. It lets the pointer through to the canvas.
 */
import { formatNumber } from '../../src';
import { useEditorState, useTorsion } from '../context';
import { rampGradientCss } from '../paint/stress-ramp';

const GRADIENT = rampGradientCss();

export function StressLegend() {
  const on = useEditorState((s) => s.overlays.stressMap);
  const shown = useTorsion((t) => t.shown);
  const stale = useTorsion((t) => t.stale);
  const status = useTorsion((t) => t.status);
  if (!on || status === 'off') return null;
  const r = shown?.torsion.ok ? shown.torsion.result : null;
  const u = shown?.units ?? 'mm';
  return (
    <div className={`stress-legend${stale ? ' stale' : ''}`} data-testid="stress-legend" aria-label="Stress map scale">
      <div className="stress-legend-title">
        Shear stress |τ| under a unit torque{stale && <span className="stale-mark"> · earlier section</span>}
      </div>
      {r ? (
        <>
          <div className="stress-legend-bar" style={{ background: GRADIENT }} />
          <div className="stress-legend-ticks">
            <span>0</span>
            <span>{formatNumber(r.stress.max / 2)}</span>
            <span data-prop="torsion.legendMax" data-value={String(r.stress.max)}>
              {formatNumber(r.stress.max)} {u}⁻³
            </span>
          </div>
          <div className="stress-legend-note">
            τ = value × T (T in force·{u} gives τ in force/{u}²)
          </div>
        </>
      ) : (
        <div className="stress-legend-note">No torsion result yet: the map appears when the run is done.</div>
      )}
    </div>
  );
}
