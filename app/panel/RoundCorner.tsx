/**
 * "Round a corner" in the side panel, for one selected polygon, path, line element or strip: pick
 * the corner from the list or by clicking its handle on the canvas, type the radius, Round. The
 * corner becomes an exact tangent arc in one undo step (app/ops/round-corner.ts).
 */
import { useEffect, useRef, useState } from 'react';
import { formatNumber, type Shape } from '../../src';
import { useEditor, useEditorState, useTransient } from '../context';
import { evaluateExpression } from '../expr';
import { roundCorner } from '../ops/round-corner';
import { shapeCorners } from '../../src';

export function RoundCorner({ shape }: { shape: Shape }) {
  const editor = useEditor();
  const units = useEditorState((s) => s.doc.units);
  const picked = useTransient((t) => t.corner);
  const corners = shapeCorners(shape);
  const [corner, setCorner] = useState<number>(corners[0]?.index ?? 0);
  const [radius, setRadius] = useState('');
  const [err, setErr] = useState<string | null>(null);
  const box = useRef<HTMLDivElement>(null);
  // A click on a corner's handle picks it here, and brings this box into view (below a long point list).
  useEffect(() => {
    if (picked && picked.id === shape.id) {
      setCorner(picked.index);
      box.current?.scrollIntoView?.({ block: 'nearest' });
    }
  }, [picked, shape.id]);
  if (corners.length === 0) return null;
  const current = corners.some((c) => c.index === corner) ? corner : corners[0].index;
  const choose = (index: number) => {
    setCorner(index);
    editor.transient.setState({ corner: { id: shape.id, index } });
  };
  const go = () => {
    const r = evaluateExpression(radius);
    if (!r.ok) return setErr(`Radius: ${r.message}`);
    const e = roundCorner(editor.ctx, { id: shape.id, corner: current, radius: r.value });
    setErr(e);
    if (!e) editor.transient.setState({ corner: null });
  };
  const xy = (p: readonly number[]) => `(${formatNumber(p[0], 6)}, ${formatNumber(p[1], 6)})`;
  return (
    <div className="round-corner" data-testid="round-corner" ref={box}>
      <div className="round-corner-head">Round a corner</div>
      <div className="round-corner-row">
        <select aria-label="Corner to round" data-field="corner" value={current} onChange={(e) => choose(Number(e.target.value))}>
          {corners.map((c) => (
            <option key={c.index} value={c.index}>
              {c.label} {xy(c.p)}
            </option>
          ))}
        </select>
        <label className={`field inline${err ? ' invalid' : ''}`}>
          <span className="field-label">radius</span>
          <input
            data-field="corner-radius"
            value={radius}
            placeholder="r"
            spellCheck={false}
            onChange={(e) => setRadius(e.target.value)}
            onKeyDown={(e) => {
              e.stopPropagation();
              if (e.key === 'Enter') go();
            }}
          />
          <span className="field-suffix">{units}</span>
        </label>
        <button className="btn" data-testid="round-corner-apply" onClick={go} disabled={radius.trim() === ''}>
          Round
        </button>
      </div>
      {err ? (
        <span className="field-error" role="alert" data-testid="round-corner-error">
          {err}
        </span>
      ) : (
        <p className="hint small">Or click the corner’s handle on the canvas. The corner becomes an exact arc tangent to both sides.</p>
      )}
    </div>
  );
}
