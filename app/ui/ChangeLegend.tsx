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
    <div className="change-legend" data-testid="change-legend" data-removed-area={change && !stale ? String(change.removedArea) : ''} data-added-area={change && !stale ? String(change.addedArea) : ''}>
      <h4>{proposal} against the baseline</h4>
      <div className="legend-row">
        <span className="swatch baseline" /> Baseline outline
      </div>
      <div className="legend-row">
        <span className="swatch removed" /> Material removed <span className="num">{change ? area(change.removedArea) : '…'}</span>
      </div>
      <div className="legend-row">
        <span className="swatch added" /> Material added <span className="num">{change ? area(change.addedArea) : '…'}</span>
      </div>
      {all.length > 0 && (
        <div className="legend-row">
          <span className="swatch warn" /> Warning <span className="swatch note" /> Note
        </div>
      )}
      {all.length > 0 && (
        <div className="legend-row legend-small">
          numbered as in Cautions{own < all.length ? '; faint: already in the baseline' : ''}
        </div>
      )}
    </div>
  );
}
