/**
 * A number field that takes plain arithmetic (`2*12.5+3`). Input is applied on Enter or when
 * the field loses focus; invalid input shows a message beside the field and is never applied.
 */
import { evaluateExpression } from '../expr';
import { useCommitText } from './useCommitText';

/** Show a stored number in full but without binary noise. */
export function editText(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(12))) : '';
}

export function NumberField({
  label,
  value,
  onCommit,
  field,
  suffix,
}: {
  label: string;
  value: number;
  /** Apply the value; return an error text to refuse it. */
  onCommit: (v: number) => string | null;
  /** Stable name for tests: data-field. */
  field: string;
  suffix?: string;
}) {
  const { error, inputProps } = useCommitText(editText(value), (text, setText) => {
    const r = evaluateExpression(text);
    if (!r.ok) return r.message;
    const err = onCommit(r.value);
    if (!err) setText(editText(r.value));
    return err;
  });
  return (
    <label className={`field${error ? ' invalid' : ''}`}>
      <span className="field-label">{label}</span>
      <input
        data-field={field}
        {...inputProps}
      />
      {suffix && <span className="field-suffix">{suffix}</span>}
      {error && (
        <span className="field-error" role="alert" data-error-for={field}>
          {error}
        </span>
      )}
    </label>
  );
}
