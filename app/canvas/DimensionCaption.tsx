/**
 * Under the canvas while dimensions are shown: how many values are drawn and how many were left
 * off for want of room (with the reasons on hover), so a thinned drawing never looks complete when
 * it is not. The values themselves are listed for assistive technology (and read by the browser
 * tests): role, full-precision value and the text drawn.
 */
import { useDimensions } from './useDimensions';
import './dimensions.css';

export function DimensionCaption() {
  const dims = useDimensions();
  if (!dims) return null;
  const left = dims.omitted.length;
  const reasons = [...new Set(dims.omitted.map((o) => o.reason))].join('; ');
  return (
    <div className="dim-caption" data-testid="dimension-caption" title={left ? `Left off: ${reasons}` : undefined}>
      {dims.texts.length} dimension{dims.texts.length === 1 ? '' : 's'}
      {left > 0 && ` · ${left} left off for room (zoom in; the report lists every coordinate)`}
      <ul className="visually-hidden" data-testid="dimension-list" aria-label="Dimensions on the drawing">
        {dims.texts.map((t, i) => (
          <li key={i} data-dim={t.role} data-value={t.value} data-x={t.x} data-y={t.y}>
            {t.text}
          </li>
        ))}
      </ul>
    </div>
  );
}
