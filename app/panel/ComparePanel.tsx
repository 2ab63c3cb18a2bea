/**
 * The comparison of the baseline and the shown proposal: every catalogue property (with the
 * moduli to the critical fibre) before and after, the change and the change in per cent, the
 * centroid shift and the rotation of the principal axes, each marked within or beyond its limit,
 * and the overall verdict. It updates with every evaluation, as the main panel does. Each row
 * carries data-compare (the key) and data-value (the change in per cent, full precision; empty
 * where a percentage has no meaning), with data-change, data-baseline and data-proposal.
 */
import { formatNumber, formatQuantity, unitText, type PropertyChange, type Units } from '../../src';
import { useActiveProposal, useComparison, useLimits, useMaterialChange, useSectionShown } from '../cutout-hooks';
import { useResults } from '../context';
import { rowStatus } from '../store/cutout';
import '../ui/cutout.css';

const signed = (t: string) => (t === '0' || t.startsWith('−') || t.startsWith('-') ? t : `+${t}`);

function Flag({ status }: { status: 'within' | 'beyond' | null }) {
  if (!status) return <td />;
  return (
    <td>
      <span className={`flag ${status}`}>{status}</span>
    </td>
  );
}

function Row({ r, size, units, status }: { r: PropertyChange; size: number; units: Units; status: 'within' | 'beyond' | null }) {
  const fmt = (v: number) => (r.power === 0 ? formatNumber(v, 4, 90) : formatQuantity(v, r.power, size));
  const change = r.change === null ? '—' : signed(fmt(r.change));
  const pct = r.changePercent === null ? '—' : signed(formatNumber(r.changePercent, 4, 100));
  const trend = r.changePercent === null || r.changePercent === 0 ? '' : r.changePercent < 0 ? 'loss' : 'gain';
  return (
    <tr
      className={status === 'beyond' ? 'beyond' : undefined}
      title={[r.label, r.note].filter(Boolean).join('. ')}
      data-compare={r.key}
      data-value={r.changePercent === null ? '' : String(r.changePercent)}
      data-change={r.change === null ? '' : String(r.change)}
      data-baseline={String(r.baseline)}
      data-proposal={String(r.proposal)}
      data-status={status ?? ''}
    >
      <td className="sym">{r.symbol}</td>
      <td>{fmt(r.baseline)}</td>
      <td>{fmt(r.proposal)}</td>
      <td className={trend}>{change}</td>
      <td className={trend}>{pct}</td>
      <td className="unit">{unitText(units, r.power, r.unit)}</td>
      <Flag status={status} />
    </tr>
  );
}

/** Shown while the comparison trails the proposal (its own component: it re-renders on every pointer move). */
function Updating() {
  const shown = useSectionShown();
  return <span className={`pending${shown ? '' : ' on'}`}>updating</span>;
}

export function ComparePanel() {
  const proposal = useActiveProposal();
  const c = useComparison();
  const { inForce, check } = useLimits();
  const units = useResults((r) => r.doc.units);
  const baseMessage = useResults((r) => (r.baseline && !r.baseline.evaluation.props ? r.baseline.evaluation.message : null));
  const propMessage = useResults((r) => (r.baseline && !r.evaluation.props ? r.evaluation.message : null));
  const { change, stale } = useMaterialChange();
  if (!proposal) return null;
  if (!c || !check) {
    return (
      <section className="panel-section compare-panel" data-testid="compare-panel">
        <h2>{proposal} against the baseline</h2>
        <p className="hint">{baseMessage ? `The baseline has no properties: ${baseMessage}` : propMessage ? `The proposal has no properties: ${propMessage}` : 'Evaluating the baseline…'}</p>
      </section>
    );
  }
  const size = c.extent;
  const groups = [...new Set(c.rows.map((r) => r.group))];
  const results = check.results;
  const beyond = results.filter((r) => r.status === 'beyond').length;
  const applied = results.filter((r) => r.status !== 'not-applicable').length;
  const shift = c.centroidShift;
  const shiftStatus = rowStatus(results, 'centroid');
  const rot = c.rotation;
  const rotStatus = rowStatus(results, 'theta');
  const len = (v: number) => formatQuantity(v, 1, size);
  return (
    <section className="panel-section compare-panel" data-testid="compare-panel">
      <div className="compare-head">
        <h2>
          {proposal} against the baseline <Updating />
        </h2>
        <span className={`verdict ${check.verdict}`} data-testid="verdict" data-verdict={check.verdict} title={results.map((r) => r.message).join('\n')}>
          {check.verdict === 'within' ? 'Within the limits' : 'Beyond the limits'}
        </span>
      </div>
      <p className="verdict-note" data-testid="verdict-note">
        {applied === 0 ? 'No limit applies.' : beyond ? `${beyond} of ${applied} limit${applied === 1 ? '' : 's'} beyond.` : `All ${applied} limit${applied === 1 ? '' : 's'} met.`}{' '}
        {inForce.examples ? 'Example limits, not values from a design code: set your own below.' : 'Limits from this document.'} A geometric screen, not a design check.
      </p>
      <table className="cmp">
        <colgroup>
          <col style={{ width: '40px' }} />
          <col />
          <col />
          <col />
          <col style={{ width: '62px' }} />
          <col style={{ width: '30px' }} />
          <col style={{ width: '58px' }} />
        </colgroup>
        <thead>
          <tr>
            <th>Prop.</th>
            <th>Baseline</th>
            <th>Proposal</th>
            <th>Change</th>
            <th>Change %</th>
            <th />
            <th>Limit</th>
          </tr>
        </thead>
        <tbody>
          {groups.map((g) => [
            <tr key={`g-${g}`} className="group">
              <td colSpan={7}>{g}</td>
            </tr>,
            ...c.rows.filter((r) => r.group === g).map((r) => <Row key={r.key} r={r} size={size} units={units} status={rowStatus(results, r.key)} />),
          ])}
        </tbody>
      </table>
      <div className="cmp-extra">
        <div className="prop-row" data-compare="centroid" data-value="" data-change={String(shift.length)} data-dx={String(shift.dx)} data-dy={String(shift.dy)} data-status={shiftStatus ?? ''}>
          <span className="prop-symbol">ΔC</span>
          <span className="prop-label">
            Centroid shift (Δx {len(shift.dx)}, Δy {len(shift.dy)})
          </span>
          <span className="prop-value">
            {len(shift.length)} {units}
          </span>
          <span>{shiftStatus && <span className={`flag ${shiftStatus}`}>{shiftStatus}</span>}</span>
        </div>
        <div className="prop-row" data-compare="rotation" data-value="" data-change={rot.degrees === null ? '' : String(rot.degrees)} data-status={rotStatus ?? ''} title={rot.note ?? ''}>
          <span className="prop-symbol">Δθ</span>
          <span className="prop-label">Rotation of the principal axes{rot.note ? ` (${rot.degrees === null ? 'no meaning' : 'see note'})` : ''}</span>
          <span className="prop-value">{rot.degrees === null ? '—' : `${signed(formatNumber(rot.degrees, 4, 90))}°`}</span>
          <span>{rotStatus && <span className={`flag ${rotStatus}`}>{rotStatus}</span>}</span>
        </div>
        <div className="prop-row" data-compare="material" data-value="">
          <span className="prop-symbol">A±</span>
          <span className="prop-label">Material removed / added</span>
          <span className="prop-value" data-removed={change && !stale ? String(change.removedArea) : ''}>
            {change && !stale ? `${formatQuantity(change.removedArea, 2, size)} / ${formatQuantity(change.addedArea, 2, size)}` : '…'}
          </span>
          <span className="prop-unit">{unitText(units, 2)}</span>
        </div>
        {rot.note && <p className="hint">{rot.note}</p>}
      </div>
    </section>
  );
}
