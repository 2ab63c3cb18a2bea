/**
 * The legend over the canvas while a proposal is shown: what the faint dashed outline, the amber
 * and green shading and the caution markers mean, with the exact areas removed and added.
 */
import { formatQuantity, sectionSize, unitText } from '../../src';
import { numberedCautions, useActiveProposal, useCautions, useMaterialChange } from '../cutout-hooks';
import { useResults } from '../context';
import './cutout.css';

export function ChangeLegend() {
  const proposal = useActiveProposal();
  const base = useResults((r) => r.baseline);
  const units = useResults((r) => r.doc.units);
  const { change, stale } = useMaterialChange();
  const { cautions } = useCautions();
  if (!proposal || !base) return null;
  const size = sectionSize(base.evaluation.props?.bounds ?? null);
  const area = (v: number) => (stale ? '…' : `${formatQuantity(v, 2, size)} ${unitText(units, 2)}`);
  const { all, own } = numberedCautions(cautions);
  return (
    <div
      className="change-legend"
      data-testid="change-legend"
      data-removed-area={change && !stale ? String(change.removedArea) : ''}
      data-added-area={change && !stale ? String(change.addedArea) : ''}
      title={`${proposal} against the baseline. Markers are numbered as in the Cautions panel${own < all.length ? '; faint ones were already in the baseline' : ''}.`}
    >
      <span className="legend-item">
        <span className="swatch baseline" /> baseline
      </span>
      <span className="legend-item">
        <span className="swatch removed" /> removed <span className="num">{change ? area(change.removedArea) : '…'}</span>
      </span>
      <span className="legend-item">
        <span className="swatch added" /> added <span className="num">{change ? area(change.addedArea) : '…'}</span>
      </span>
      {all.length > 0 && (
        <span className="legend-item">
          <span className="swatch warn" /> warning <span className="swatch note" /> note{own < all.length ? ' (faint: in the baseline)' : ''}
        </span>
      )}
    </div>
  );
}
