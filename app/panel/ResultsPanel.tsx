/**
 * Live results: every property of the engine's catalogue, formatted by the engine's one
 * formatter. Each value carries data-prop (its key) and data-value (the full-precision number).
 */
import { CAUTION_TEXT, emptySectionText, formatProperty, formatShapeIssue, PROPERTY_CATALOG, UNITS, type PropertyInfo, type Units } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { activeSection } from '../store/section';

const GROUPS = [...new Set(PROPERTY_CATALOG.map((p) => p.group))];

/** The one caution wording, shared with the CLI and the report. */
export const CAUTION = CAUTION_TEXT;

function Row({ info }: { info: PropertyInfo }) {
  const props = useResults((r) => r.evaluation.props);
  const units = useResults((r) => r.doc.units);
  if (!props) return null;
  const f = formatProperty(info, props, units);
  return (
    <div className="prop-row" title={info.label}>
      <span className="prop-symbol">{info.symbol}</span>
      <span className="prop-label">{info.label}</span>
      <span className="prop-value" data-prop={info.key} data-value={String(f.value)}>
        {f.text}
      </span>
      <span className="prop-unit">{f.unit}</span>
    </div>
  );
}

export function UnitSwitch() {
  const editor = useEditor();
  const units = useEditorState((s) => s.doc.units);
  return (
    <label className="unit-switch">
      <span>Units</span>
      <select data-testid="units" value={units} onChange={(e) => editor.run('units.set', e.target.value as Units)}>
        {UNITS.map((u) => (
          <option key={u} value={u}>
            {u}
          </option>
        ))}
      </select>
    </label>
  );
}

/** Shown while the results trail the document (during a drag the engine runs beside the pointer). */
function Pending() {
  const docNow = useEditorState((s) => activeSection(s.doc));
  const docShown = useResults((r) => r.doc);
  return (
    <span className={`pending${docNow === docShown ? '' : ' on'}`} data-testid="results-pending" aria-live="off">
      updating
    </span>
  );
}

export function ResultsPanel() {
  const ev = useResults((r) => r.evaluation);
  const section = useResults((r) => r.doc);
  const ms = useResults((r) => r.lastMs);
  return (
    <section className="panel-section results" data-testid="results">
      <div className="results-head">
        <h2>
          Section properties <Pending />
        </h2>
        <UnitSwitch />
      </div>
      {ev.message && (
        // Line elements only: the area results are absent, which is not an error.
        <p className={`result-message${!ev.props && ev.lines.length ? ' absent' : ''}`} data-testid="result-message" data-absent={!ev.props && ev.lines.length ? 'area' : undefined}>
          {ev.props || ev.lines.length ? ev.message : emptySectionText(section.shapes.length, ev.message)}
        </p>
      )}
      {ev.warnings.length > 0 && (
        <ul className="warnings" data-testid="warnings">
          {ev.warnings.map((w, i) => (
            <li key={i}>{formatShapeIssue(w, section.shapes)}</li>
          ))}
        </ul>
      )}
      {ev.props &&
        GROUPS.map((g) => (
          <div key={g} className="prop-group">
            <h3>{g}</h3>
            {PROPERTY_CATALOG.filter((p) => p.group === g).map((p) => (
              <Row key={p.key} info={p} />
            ))}
          </div>
        ))}
      <p className="eval-time" title="Time of the last evaluation">
        evaluated in {ms < 1 ? '<1' : Math.round(ms)} ms
      </p>
    </section>
  );
}

export function Caution() {
  return (
    <p className="caution" data-testid="caution" role="note">
      {CAUTION}
    </p>
  );
}
