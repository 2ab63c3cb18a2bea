/**
 * A bare input that commits on Enter or when it loses focus, for table cells and compact rows
 * (the materials table, the loads): numbers take plain arithmetic (`2*12.5`), an empty number
 * field means "none" when `optional`, and a refused value stays in the field with the reason
 * below it. Escape restores the stored value.
 */
import { useEffect, useRef, useState } from 'react';
import { evaluateExpression } from '../expr';
import { editText } from './NumberField';

type Props =
  | { kind: 'number'; value: number | null; optional?: boolean; onCommit: (v: number | null) => string | null }
  | { kind: 'text'; value: string; optional?: boolean; onCommit: (v: string) => string | null };

export function CommitInput(props: Props & { field: string; label: string; placeholder?: string; className?: string }) {
  const shown = props.kind === 'number' ? (props.value === null ? '' : editText(props.value)) : props.value;
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  useEffect(() => {
    if (!focused.current) {
      setText(shown);
      setError(null);
    }
  }, [shown]);
  const apply = (): boolean => {
    if (text.trim() === shown.trim()) {
      setError(null);
      return true;
    }
    let err: string | null;
    if (props.kind === 'text') err = props.onCommit(text.trim());
    else if (text.trim() === '') err = props.optional ? props.onCommit(null) : 'Enter a number.';
    else {
      const r = evaluateExpression(text);
      err = r.ok ? props.onCommit(r.value) : r.message;
    }
    setError(err);
    return err === null;
  };
  return (
    <span className={`commit-input${error ? ' invalid' : ''}${props.className ? ` ${props.className}` : ''}`}>
      <input
        data-field={props.field}
        aria-label={props.label}
        aria-invalid={!!error}
        value={text}
        placeholder={props.placeholder}
        spellCheck={false}
        onFocus={() => (focused.current = true)}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => {
          focused.current = false;
          apply();
        }}
        onKeyDown={(e) => {
          e.stopPropagation();
          if (e.key === 'Enter') {
            if (apply()) (e.target as HTMLInputElement).blur();
          } else if (e.key === 'Escape') {
            setText(shown);
            setError(null);
            (e.target as HTMLInputElement).blur();
          }
        }}
      />
      {error && (
        <span className="field-error" role="alert" data-error-for={props.field}>
          {error}
        </span>
      )}
    </span>
  );
}
