/**
 * The torsion results group: off until the user includes torsion in the section's results; then
 * the settings (mesh density, Poisson's ratio), the run's progress with a cancel button, and J,
 * the shear centre, Cw, the mesh and the convergence estimate, each with data-prop and data-value.
 * A result for an earlier section stays shown, greyed and marked, until the new one arrives.
 */
import { formatNumber, percentText, poissonText, TORSION_DENSITIES, torsionRows, type TorsionStage } from '../../src';
import { useEditor, useTorsion } from '../context';
import { CommandButton } from '../fields/CommandButton';
import { NumberField } from '../fields/NumberField';
import { setTorsionPoisson } from '../ops/torsion';
import type { ShownTorsion } from '../torsion/live';
import './torsion.css';

const STAGE: Record<TorsionStage, string> = {
  mesh: 'Meshing the section',
  'solve-coarse': 'Solving on the coarse mesh',
  refine: 'Refining the mesh',
  'solve-fine': 'Solving on the finer mesh',
  results: 'Collecting the results',
};

const DENSITY_WORDS: Record<(typeof TORSION_DENSITIES)[number], string> = { coarse: 'coarse (fastest)', normal: 'normal', fine: 'fine (slowest)' };

function Intro() {
  return (
    <>
      <p className="hint">
        The torsion constant J, the shear centre S and the warping constant Cw, solved by finite elements. Once included they are recomputed in the background whenever the section has been still for a
        moment, saved with the section and printed in the report.
      </p>
      <CommandButton name="torsion.include" className="primary-action">
        Include torsion
      </CommandButton>
    </>
  );
}

function Settings() {
  const editor = useEditor();
  const settings = useTorsion((t) => t.settings)!;
  return (
    <div className="torsion-settings">
      <label className="field">
        <span className="field-label">Mesh density</span>
        <select data-testid="torsion-density" value={settings.density} onChange={(e) => editor.run('torsion.density', e.target.value)}>
          {TORSION_DENSITIES.map((d) => (
            <option key={d} value={d}>
              {DENSITY_WORDS[d]}
            </option>
          ))}
        </select>
        <span />
      </label>
      <NumberField label="Poisson's ratio ν" field="torsion-poisson" value={settings.poisson} onCommit={(v) => setTorsionPoisson(editor.ctx, v)} />
      <p className="torsion-note">{poissonText(settings)}: for the shear centre only; J and Cw do not depend on it.</p>
    </div>
  );
}

function Status() {
  const status = useTorsion((t) => t.status);
  const progress = useTorsion((t) => t.progress);
  const stage = useTorsion((t) => t.stage);
  const stale = useTorsion((t) => t.stale);
  const shown = useTorsion((t) => t.shown);
  if (status === 'running')
    return (
      <div className="torsion-status running" data-testid="torsion-running">
        <progress max={1} value={progress} data-testid="torsion-progress" data-value={String(progress)} />
        <span className="torsion-stage">
          {stage ? STAGE[stage] : 'Starting'} · {Math.round(100 * progress)} %
        </span>
        <CommandButton name="torsion.cancel" className="small" />
      </div>
    );
  if (status === 'paused')
    return (
      <div className="torsion-status paused" data-testid="torsion-paused">
        <span>Cancelled. Automatic runs are paused{shown ? '; the results below are for an earlier section' : ''}.</span>
        <CommandButton name="torsion.compute" className="small" />
      </div>
    );
  if (status === 'waiting') return <div className="torsion-status waiting">{stale ? 'Waiting for the section to be still, then updating…' : 'Starting…'}</div>;
  if (status === 'done' && shown?.torsion.ok && shown.torsion.ms !== null)
    return (
      <div className="torsion-status done" data-testid="torsion-done">
        Computed in {formatNumber(shown.torsion.ms / 1000, 2)} s ({shown.torsion.settings.density} density)
      </div>
    );
  return null;
}

function Values({ shown, stale }: { shown: ShownTorsion; stale: boolean }) {
  const t = shown.torsion;
  if (!t.ok)
    return (
      <p className="result-message" data-testid="torsion-message">
        Torsion could not be computed: {t.message}
      </p>
    );
  const r = t.result;
  const rows = torsionRows(r, shown.units, shown.size, shown.centroid);
  const c = r.convergence;
  return (
    <div className={`torsion-values${stale ? ' stale' : ''}`} aria-disabled={stale}>
      {[...new Set(rows.map((row) => row.group))].map((g) => (
        <div key={g} className="prop-group">
          <h3>{g}</h3>
          {rows
            .filter((row) => row.group === g)
            .map((row) => (
              <div key={row.key} className="prop-row" title={row.label}>
                <span className="prop-symbol">{row.symbol}</span>
                <span className="prop-label">{row.label}</span>
                <span className="prop-value" data-prop={row.key} data-value={String(row.value)}>
                  {row.text}
                </span>
                <span className="prop-unit">{row.unit}</span>
              </div>
            ))}
        </div>
      ))}
      <p className="torsion-note" data-testid="torsion-convergence">
        J on the coarse mesh {formatNumber(c.Jcoarse)}, on the finer {formatNumber(c.Jfine)} {shown.units}⁴; extrapolated at order {formatNumber(c.order, 3)}, about {percentText(100 * c.estimatedError)} % may be left in J.
        Cw is taken about the centre of twist (the shear centre for ν = 0). S on the canvas is the shear centre.
        {t.basis.reference && ` J and Cw are in the reference material ${t.basis.reference.name}.`}
      </p>
      <div className="torsion-actions">
        <CommandButton name="view.stressMap" className="small">
          Stress map
        </CommandButton>
      </div>
      <ul className="torsion-cautions" data-testid="torsion-cautions">
        {t.cautions.map((x, i) => (
          <li key={i}>{x}</li>
        ))}
      </ul>
    </div>
  );
}

export function TorsionPanel() {
  const status = useTorsion((t) => t.status);
  const shown = useTorsion((t) => t.shown);
  const stale = useTorsion((t) => t.stale);
  return (
    <section className="panel-section torsion" data-testid="torsion" data-status={status} data-stale={stale ? 'true' : 'false'}>
      <div className="results-head">
        <h2>
          Torsion <span className="kind">finite elements</span>
          {stale && (
            <span className="stale-badge" data-testid="torsion-stale" title="These results belong to an earlier version of the section">
              stale
            </span>
          )}
        </h2>
        {status !== 'off' && (
          <CommandButton name="torsion.include" className="small">
            Leave out
          </CommandButton>
        )}
      </div>
      {status === 'off' ? (
        <Intro />
      ) : (
        <>
          <Settings />
          <Status />
          {shown && <Values shown={shown} stale={stale} />}
        </>
      )}
    </section>
  );
}
