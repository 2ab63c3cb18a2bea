/**
 * Net sections along the document's lines: for each line, the gross length inside the material
 * (first entry to last exit), the net length (material only) and every hole or gap on it, exact
 * from the boundary. With a proposal shown, the baseline's net length stands beside it. The
 * purpose is stated (the net width of tension checks) with the caution that the code's rules
 * for staggered holes and effective net area still apply. Lines are drawn with the "Net section"
 * tool or typed; they are kept in the document and printed in the report.
 */
import { describeGap, formatNumber, NET_SECTION_CAUTION, NET_SECTION_PURPOSE, type NetLine, type NetSection } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { CommandButton } from '../fields/CommandButton';
import { PointFields } from '../fields/PointFields';
import { netLineLabel, netLinesWithChange } from '../ops/net-lines';
import { netSectionOf } from '../store/cutout';
import '../ui/cutout.css';

const EMPTY: NetLine[] = [];

function LineCard({ line, index }: { line: NetLine; index: number }) {
  const editor = useEditor();
  const units = useResults((r) => r.doc.units);
  const region = useResults((r) => r.evaluation.region);
  const base = useResults((r) => r.baseline?.evaluation.region ?? null);
  const r = netSectionOf(region, line);
  const b = base ? netSectionOf(base, line) : null;
  const L = Math.hypot(line.to[0] - line.from[0], line.to[1] - line.from[1]);
  const f = (v: number) => formatNumber(v, 4, L);
  const set = (arg: Record<string, unknown>) => {
    const plan = netLinesWithChange(editor.store.getState().doc, { index, ...arg });
    if (typeof plan === 'string') return plan;
    editor.run('netline.set', { index, ...arg });
    return null;
  };
  const value = (x: NetSection | string | null, key: 'grossLength' | 'netLength') => (x === null ? null : typeof x === 'string' ? '—' : f(x[key]));
  return (
    <div className="net-line" data-testid="net-line" data-index={index}>
      <div className="net-line-head">
        <input
          key={line.name ?? ''}
          aria-label="Line name"
          defaultValue={line.name ?? ''}
          placeholder={netLineLabel(line, index)}
          onKeyDown={(e) => {
            e.stopPropagation();
            if (e.key === 'Enter') (e.target as HTMLInputElement).blur();
          }}
          onBlur={(e) => set({ name: e.target.value })}
        />
        <button className="btn small" title="Delete this line" data-testid={`net-delete-${index}`} onClick={() => editor.run('netline.delete', index)}>
          ×
        </button>
      </div>
      <div className="net-points">
        <PointFields label="From" p={line.from} field={`net-${index}-from`} units={units} onPoint={(p) => set({ from: p })} />
        <PointFields label="To" p={line.to} field={`net-${index}-to`} units={units} onPoint={(p) => set({ to: p })} />
      </div>
      {typeof r === 'string' ? (
        <p className="result-message">{r}</p>
      ) : (
        <>
          <div className="prop-row">
            <span className="prop-symbol">g</span>
            <span className="prop-label">Gross length in the material{b !== null ? ` (baseline ${value(b, 'grossLength')})` : ''}</span>
            <span className="prop-value" data-net="gross" data-value={String(r.grossLength)}>
              {f(r.grossLength)}
            </span>
            <span className="prop-unit">{units}</span>
          </div>
          <div className="prop-row">
            <span className="prop-symbol">n</span>
            <span className="prop-label">Net length, material only{b !== null ? ` (baseline ${value(b, 'netLength')})` : ''}</span>
            <span className="prop-value" data-net="net" data-value={String(r.netLength)}>
              {f(r.netLength)}
            </span>
            <span className="prop-unit">{units}</span>
          </div>
          {r.gaps.length > 0 && (
            <ol className="net-gaps" data-testid="net-gaps">
              {r.gaps.map((g, k) => (
                <li key={k} data-gap-kind={g.kind} data-value={String(g.length)}>
                  {describeGap(g, f)} {units}
                </li>
              ))}
            </ol>
          )}
          {r.notes.map((n, k) => (
            <p key={k} className="hint">
              {n}
            </p>
          ))}
        </>
      )}
    </div>
  );
}

export function NetSectionPanel() {
  const lines = useEditorState((s) => s.doc.netLines ?? EMPTY);
  return (
    <section className="panel-section net-panel" data-testid="net-panel">
      <h2>Net section</h2>
      <p className="net-purpose">{NET_SECTION_PURPOSE}</p>
      {lines.length === 0 && <p className="hint">Draw a line across the section (through a row of holes, say) with the Net section tool (N), or type its two points while the tool is on.</p>}
      {lines.map((l, k) => (
        <LineCard key={k} line={l} index={k} />
      ))}
      <CommandButton name="tool.netline">Draw a net-section line</CommandButton>
      <p className="caution-standing">{NET_SECTION_CAUTION}</p>
    </section>
  );
}
