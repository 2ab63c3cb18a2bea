/**
 * A number field that takes plain arithmetic (`2*12.5+3`). Input is applied on Enter or when
 * the field loses focus; invalid input shows a message beside the field and is never applied.
 */
import { useEffect, useRef, useState } from 'react';
import { evaluateExpression } from '../expr';

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
  const [text, setText] = useState(editText(value));
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  // A change from elsewhere (a drag, undo) replaces the text unless the user is typing here.
  useEffect(() => {
    if (!focused.current) {
      setText(editText(value));
      setError(null);
    }
  }, [value]);
  const apply = () => {
    if (text.trim() === editText(value)) {
      setError(null);
      return true;
    }
    const r = evaluateExpression(text);
    if (!r.ok) {
      setError(r.message);
      return false;
    }
    const err = onCommit(r.value);
    if (err) {
      setError(err);
      return false;
    }
    setError(null);
    setText(editText(r.value));
    return true;
  };
  return (
    <label className={`field${error ? ' invalid' : ''}`}>
      <span className="field-label">{label}</span>
      <input
        data-field={field}
        value={text}
        spellCheck={false}
        aria-invalid={!!error}
        onFocus={() => (focused.current = true)}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => {
          focused.current = false;
          apply();
        }}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            if (apply()) (e.target as HTMLInputElement).blur();
          } else if (e.key === 'Escape') {
            setText(editText(value));
            setError(null);
            (e.target as HTMLInputElement).blur();
          }
          e.stopPropagation();
        }}
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
