/** A point as two number fields (x, y), with optional small tool buttons and a row error. */
import type { ReactNode } from 'react';
import type { Point } from '../../src';
import { NumberField } from './NumberField';

export function PointFields({
  label,
  p,
  onPoint,
  field,
  units,
  tools,
  error,
}: {
  label: string;
  p: Point;
  onPoint: (p: Point) => string | null;
  field: string;
  units: string;
  /** Small buttons beside the label (insert, delete, line/arc). */
  tools?: ReactNode;
  /** A refused point edit on this row. */
  error?: string | null;
}) {
  return (
    <div className="point-fields">
      {tools ? (
        <div className="point-head">
          <span className="point-label">{label}</span>
          <span className="point-tools">{tools}</span>
        </div>
      ) : (
        <span className="point-label">{label}</span>
      )}
      <NumberField label="x" value={p[0]} field={`${field}.x`} suffix={units} onCommit={(v) => onPoint([v, p[1]])} />
      <NumberField label="y" value={p[1]} field={`${field}.y`} suffix={units} onCommit={(v) => onPoint([p[0], v])} />
      {error && (
        <span className="field-error" role="alert" data-error-for={field}>
          {error}
        </span>
      )}
    </div>
  );
}

/** A small button beside a point's label. */
export function ToolButton({ testid, title, label, onClick }: { testid: string; title: string; label: string; onClick: () => void }) {
  return (
    <button type="button" className="btn small point-tool" data-testid={testid} title={title} aria-label={title} onClick={onClick}>
      {label}
    </button>
  );
}
