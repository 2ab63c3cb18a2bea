/**
 * The limits editor: the allowed changes from the baseline to a proposal (a loss or gain in per
 * cent, a centroid shift, a rotation of the principal axes), kept in the document. A document
 * without limits shows the example limits, labelled as examples and not values from a design
 * code; the first change saves the whole list. Each field applies on Enter or when it loses
 * focus, is checked by the engine first, and is one undo step; an empty field clears that limit.
 */
import { useState } from 'react';
import { comparisonCatalog, CENTROID_KEY, EXAMPLE_LIMITS_NOTE, type LimitField, type LimitResult } from '../../src';
import { useLimits } from '../cutout-hooks';
import { useEditor, useEditorState } from '../context';
import { evaluateExpression } from '../expr';
import { CommandButton } from '../fields/CommandButton';
import { editText } from '../fields/NumberField';
import { useCommitText } from '../fields/useCommitText';
import { limitFieldsFor, limitsWithAdded, limitsWithValue } from '../ops/limits';
import '../ui/cutout.css';

const CATALOG = comparisonCatalog();

const FIELD_TEXT: Record<LimitField, { label: string; suffix: (units: string) => string; title: string }> = {
  maxLossPercent: { label: 'loss ≤', suffix: () => '%', title: 'Largest allowed loss, in per cent of the baseline value' },
  maxGainPercent: { label: 'gain ≤', suffix: () => '%', title: 'Largest allowed gain, in per cent of the baseline value' },
  maxShift: { label: 'shift ≤', suffix: (u) => u, title: 'Largest allowed move, in the document’s length unit' },
  maxRotation: { label: 'turn ≤', suffix: () => '°', title: 'Largest allowed rotation of the principal axes, in degrees' },
};

/** The property's symbol and name as the comparison shows them. */
export function limitPropertyText(key: string): { symbol: string; label: string } {
  if (key === CENTROID_KEY) return { symbol: 'C', label: 'Centroid (length of the shift)' };
  const info = CATALOG.find((i) => i.key === key);
  return info ? { symbol: info.symbol, label: info.label } : { symbol: key, label: key };
}

function LimitInput({ index, field, value, units }: { index: number; field: LimitField; value: number | undefined; units: string }) {
  const editor = useEditor();
  const shown = value === undefined ? '' : editText(value);
  const { error, inputProps } = useCommitText(shown, (text) => {
    let v: number | null = null;
    if (text.trim() !== '') {
      const r = evaluateExpression(text);
      if (!r.ok) return r.message;
      v = r.value;
    }
    const arg = { index, field, value: v };
    const plan = limitsWithValue(editor.store.getState().doc, arg);
    if (typeof plan === 'string') return plan;
    editor.run('limits.set', arg);
    return null;
  });
  const t = FIELD_TEXT[field];
  return (
    <>
      <label className={`limit-field${error ? ' invalid' : ''}`} title={t.title}>
        {t.label}
        <input
          data-limit-field={field}
          placeholder="none"
          {...inputProps}
        />
        {t.suffix(units)}
      </label>
      {error && (
        <span className="limit-error" role="alert" data-error-for={`limit-${index}-${field}`}>
          {error}
        </span>
      )}
    </>
  );
}

function statusOf(results: readonly LimitResult[] | undefined, property: string): { status: string; title: string } {
  const hits = (results ?? []).filter((r) => r.property === property);
  if (!hits.length) return { status: '', title: '' };
  const applied = hits.filter((h) => h.status !== 'not-applicable');
  const status = !applied.length ? 'n/a' : applied.some((h) => h.status === 'beyond') ? 'beyond' : 'within';
  return { status, title: hits.map((h) => h.message).join('\n') };
}

function AddLimit() {
  const editor = useEditor();
  const { inForce } = useLimits();
  const [choice, setChoice] = useState('');
  const [error, setError] = useState<string | null>(null);
  const taken = new Set(inForce.limits.map((l) => l.property));
  const options = [CENTROID_KEY, ...CATALOG.map((i) => i.key)].filter((k) => !taken.has(k) && limitFieldsFor(k).length > 0);
  const add = () => {
    if (!choice) return;
    const plan = limitsWithAdded(editor.store.getState().doc, choice);
    if (typeof plan === 'string') return setError(plan);
    editor.run('limits.add', { property: choice });
    setChoice('');
    setError(null);
  };
  return (
    <div className="limit-add">
      <select data-testid="limit-add-property" aria-label="Property to limit" value={choice} onChange={(e) => setChoice(e.target.value)}>
        <option value="">Limit another property…</option>
        {options.map((k) => {
          const t = limitPropertyText(k);
          return (
            <option key={k} value={k}>
              {t.symbol}: {t.label}
            </option>
          );
        })}
      </select>
      <button className="btn" data-testid="limit-add" disabled={!choice} onClick={add}>
        Add
      </button>
      {error && <span className="limit-error">{error}</span>}
    </div>
  );
}

export function LimitsEditor() {
  const editor = useEditor();
  const active = useEditorState((s) => !!s.doc.activeVariant);
  const units = useEditorState((s) => s.doc.units);
  const { inForce, check } = useLimits();
  if (!active) return null;
  return (
    <section className="panel-section limits-editor" data-testid="limits-editor">
      <h2>Limits</h2>
      {inForce.examples ? (
        <p className="limit-note" data-testid="limits-examples">
          {EXAMPLE_LIMITS_NOTE} Changing one saves them all in the document.
        </p>
      ) : (
        <p className="limit-note own">
          Your limits, saved in the document. <CommandButton name="limits.examples">Back to the examples</CommandButton>
        </p>
      )}
      {inForce.limits.map((l, index) => {
        const t = limitPropertyText(l.property);
        const s = statusOf(check?.results, l.property);
        return (
          <div key={`${l.property}-${index}`} className="limit-row" data-limit={l.property} data-index={index}>
            <span className="limit-prop" title={t.label}>
              <i>{t.symbol}</i> {t.label}
            </span>
            <span className="limit-fields">
              {limitFieldsFor(l.property).map((f) => (
                <LimitInput key={f} index={index} field={f} value={l[f]} units={units} />
              ))}
            </span>
            <span title={s.title}>{s.status && <span className={`flag ${s.status === 'n/a' ? '' : s.status}`} data-limit-status={s.status}>{s.status}</span>}</span>
            <button className="btn small" title="Remove this limit" aria-label={`Remove the limit on ${t.label}`} data-testid={`limit-remove-${index}`} onClick={() => editor.run('limits.remove', index)}>
              ×
            </button>
          </div>
        );
      })}
      <AddLimit />
    </section>
  );
}
