/**
 * Live results of the line groups (weld groups per unit throat, centrelines per unit thickness):
 * one group of rows per line group, from the engine's line-property catalogue and formatter. Each
 * value carries data-line="<group>.<key>" and data-value (full precision). Under each group, its
 * weld loads (WeldLoads.tsx).
 */
import { formatLineProperty, LINE_GROUP_CAUTION, LINE_PROPERTY_CATALOG, type LineGroupResult, type Units } from '../../src';
import { useResults } from '../context';
import { WeldLoads } from './WeldLoads';

const GROUPS = [...new Set(LINE_PROPERTY_CATALOG.map((p) => p.group))];

function LineGroup({ g, units }: { g: LineGroupResult; units: Units }) {
  const n = g.ids.length;
  return (
    <div className="line-group" data-line-group={g.group}>
      <h3 className="line-group-head">
        <span className="line-swatch" aria-hidden />
        Line group “{g.group}”
        <span className="kind">
          {n} element{n === 1 ? '' : 's'} · per unit thickness
        </span>
      </h3>
      {g.message && (
        <p className="result-message" data-line-message={g.group}>
          {g.message}
        </p>
      )}
      {g.props &&
        GROUPS.map((grp) => (
          <div key={grp} className="prop-group">
            <h3>{grp}</h3>
            {LINE_PROPERTY_CATALOG.filter((i) => i.group === grp).map((info) => {
              const f = formatLineProperty(info, g.props!, units);
              return (
                <div key={info.key} className="prop-row" title={info.label}>
                  <span className="prop-symbol">{info.symbol}</span>
                  <span className="prop-label">{info.label}</span>
                  <span className="prop-value" data-line={`${g.group}.${info.key}`} data-value={String(f.value)}>
                    {f.text}
                  </span>
                  <span className="prop-unit">{f.unit}</span>
                </div>
              );
            })}
          </div>
        ))}
      <WeldLoads group={g} />
    </div>
  );
}

export function LineResults() {
  const lines = useResults((r) => r.evaluation.lines);
  const units = useResults((r) => r.doc.units);
  if (lines.length === 0) return null;
  return (
    <section className="panel-section results line-results" data-testid="line-results">
      <h2>Line groups</h2>
      <p className="hint line-caution" role="note">
        {LINE_GROUP_CAUTION}
      </p>
      {lines.map((g) => (
        <LineGroup key={g.group} g={g} units={units} />
      ))}
    </section>
  );
}
