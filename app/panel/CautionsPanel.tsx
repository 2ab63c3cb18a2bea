/**
 * The structural cautions of the shown section, numbered as the markers on the canvas, each
 * naming the shape and the place with the rule it uses: with a proposal shown, what the proposal
 * raises that the baseline does not, then (folded) what the baseline has already; with the
 * baseline shown, the section on its own. The hole rule set is chosen here and kept in the
 * document. The standing cautions close the list: a geometric screen, geometry checks only, and
 * the deferral to the applicable code and a qualified engineer.
 */
import { CAUTION_TEXT, CUTOUT_CAUTION_TEXT, HOLE_CHECK_NOTE, HOLE_RULE_SETS, SECTION_CAUTION_TEXT, type Caution, type Shape } from '../../src';
import { numberedCautions, useActiveProposal, useCautions } from '../cutout-hooks';
import { useEditor, useEditorState } from '../context';
import '../ui/cutout.css';

const KIND_TEXT: Record<Caution['kind'], string> = {
  're-entrant-corner': 'Sharp inside corner',
  'radiused-corner': 'Radiused inside corner',
  joint: 'Joint between parts',
  'separate-parts': 'Separate parts',
  'hole-edge-distance': 'Hole near an edge',
  'hole-spacing': 'Holes close together',
  'thin-ligament': 'Thin ligament',
  ligament: 'Ligament',
};

const isRoundHole = (s: Shape | string) => typeof s !== 'string' && s.type === 'circle' && s.op === 'subtract';

function Item({ c, n, faint }: { c: Caution; n: number; faint?: boolean }) {
  return (
    <li className={`caution-item ${c.severity}${faint ? ' faint' : ''}`} data-caution-kind={c.kind} data-severity={c.severity} data-number={n} data-x={String(c.at.x)} data-y={String(c.at.y)}>
      <span className="caution-num" aria-label={`${c.severity} ${n}`}>
        {n}
      </span>
      <span>
        <b>{KIND_TEXT[c.kind]}.</b> {c.message}
        {c.source && <span className="caution-source">Rule: {c.source}</span>}
      </span>
    </li>
  );
}

export function CautionsPanel() {
  const editor = useEditor();
  const proposal = useActiveProposal();
  const rules = useEditorState((s) => s.doc.holeRules ?? 'en1993');
  const { cautions, stale } = useCautions();
  const { all, own } = numberedCautions(cautions);
  const mine = all.slice(0, own), before = all.slice(own);
  const warnings = mine.filter((c) => c.severity === 'warning').length;
  // The hole rules and their limits are shown when there are round holes to check.
  const roundHoles = useEditorState((s) => s.doc.shapes.some(isRoundHole) || (s.doc.variants ?? []).some((v) => v.shapes.some(isRoundHole)));
  const holes = roundHoles || all.some((c) => c.kind === 'hole-edge-distance' || c.kind === 'hole-spacing');
  return (
    <section className="panel-section cautions-panel" data-testid="cautions-panel">
      <h2>
        Cautions{' '}
        <span className="kind">
          {cautions ? `${warnings} warning${warnings === 1 ? '' : 's'}, ${mine.length - warnings} note${mine.length - warnings === 1 ? '' : 's'}` : ''}
          {stale ? ' · updating…' : ''}
        </span>
      </h2>
      {holes && (
        <label className="rules-choice">
          Hole rules
          <select data-testid="hole-rules" value={rules} onChange={(e) => editor.run('holeRules.set', e.target.value)}>
            {Object.values(HOLE_RULE_SETS).map((r) => (
              <option key={r.id} value={r.id}>
                {r.name}
              </option>
            ))}
          </select>
        </label>
      )}
      {!cautions && <p className="hint">No section to check.</p>}
      {cautions && proposal && <h3 className="cautions-sub">New with {proposal}</h3>}
      {cautions && mine.length === 0 && <p className="hint">{proposal ? 'The proposal raises no new caution from the geometry.' : 'No caution raised by the geometry.'}</p>}
      <ol className="caution-list" data-testid="caution-list">
        {mine.map((c, k) => (
          <Item key={k} c={c} n={k + 1} />
        ))}
      </ol>
      {before.length > 0 && (
        <details className="caution-base">
          <summary>Already in the baseline ({before.length})</summary>
          <ol className="caution-list" data-testid="caution-list-baseline">
            {before.map((c, k) => (
              <Item key={k} c={c} n={own + k + 1} faint />
            ))}
          </ol>
        </details>
      )}
      <p className="caution-standing" data-testid="cutout-caution">
        {proposal ? CUTOUT_CAUTION_TEXT : SECTION_CAUTION_TEXT} {holes && `${HOLE_CHECK_NOTE} ${HOLE_RULE_SETS[rules].notChecked} `}
        {CAUTION_TEXT}
      </p>
    </section>
  );
}
