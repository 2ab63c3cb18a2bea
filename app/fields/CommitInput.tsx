/**
 * A bare input that commits on Enter or when it loses focus, for table cells and compact rows
 * (the materials table, the loads): numbers take plain arithmetic (`2*12.5`), an empty number
 * field means "none" when `optional`, and a refused value stays in the field with the reason
 * below it. Escape restores the stored value.
 */
import { evaluateExpression } from '../expr';
import { editText } from './NumberField';
import { useCommitText } from './useCommitText';

type Props =
  | { kind: 'number'; value: number | null; optional?: boolean; onCommit: (v: number | null) => string | null }
  | { kind: 'text'; value: string; optional?: boolean; onCommit: (v: string) => string | null };

export function CommitInput(props: Props & { field: string; label: string; placeholder?: string; className?: string }) {
  const shown = props.kind === 'number' ? (props.value === null ? '' : editText(props.value)) : props.value;
  const { error, inputProps } = useCommitText(shown, (text) => {
    if (props.kind === 'text') return props.onCommit(text.trim());
    if (text.trim() === '') return props.optional ? props.onCommit(null) : 'Enter a number.';
    const r = evaluateExpression(text);
    return r.ok ? props.onCommit(r.value) : r.message;
  });
  return (
    <span className={`commit-input${error ? ' invalid' : ''}${props.className ? ` ${props.className}` : ''}`}>
      <input
        data-field={props.field}
        aria-label={props.label}
        placeholder={props.placeholder}
        {...inputProps}
      />
      {error && (
        <span className="field-error" role="alert" data-error-for={props.field}>
          {error}
        </span>
      )}
    </span>
  );
}
