/**
 * One result row in the panel's style (symbol, label, value, unit) with the value's key in
 * data-prop and its full-precision number in data-value, and an optional line below it (where the
 * value occurs). Shared by the materials and the loads panels.
 */
import type { ReactNode } from 'react';

export function ValueRow({ prop, symbol, label, value, text, unit, place, extra }: { prop: string; symbol: ReactNode; label: string; value: number; text: string; unit: string; place?: ReactNode; extra?: Record<string, string> }) {
  return (
    <div className="prop-row" title={label}>
      <span className="prop-symbol">{symbol}</span>
      <span className="prop-label">{label}</span>
      <span className="prop-value" data-prop={prop} data-value={String(value)} {...extra}>
        {text}
      </span>
      <span className="prop-unit">{unit}</span>
      {place && <span className="prop-place">{place}</span>}
    </div>
  );
}
