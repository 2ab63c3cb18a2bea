/**
 * The typing behaviour every committing field shares: the text follows the stored value unless
 * the user is typing in the field, Enter or leaving the field applies it, Escape restores the
 * stored value, and a refused value stays in the field with the reason. Keys typed here never
 * reach the editor's shortcuts.
 */
import { useEffect, useRef, useState, type FocusEvent, type KeyboardEvent } from 'react';

/**
 * `shown` is the stored value as text. `commit` applies the typed text and returns null, or the
 * reason it was refused; it may call `setText` to show the applied value in its own form.
 */
export function useCommitText(shown: string, commit: (text: string, setText: (t: string) => void) => string | null) {
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  // Enter and Escape leave the field themselves: the blur that follows must not apply the text
  // again (its handler still holds the text from before Escape restored it).
  const left = useRef(false);
  // A change from elsewhere (a drag, undo) replaces the text unless the user is typing here.
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
    const err = commit(text, setText);
    setError(err);
    return err === null;
  };
  const inputProps = {
    value: text,
    spellCheck: false,
    'aria-invalid': !!error,
    onFocus: () => {
      focused.current = true;
    },
    onChange: (e: { target: { value: string } }) => setText(e.target.value),
    onBlur: (_e: FocusEvent<HTMLInputElement>) => {
      focused.current = false;
      if (left.current) left.current = false;
      else apply();
    },
    onKeyDown: (e: KeyboardEvent<HTMLInputElement>) => {
      e.stopPropagation();
      if (e.key === 'Enter') {
        if (apply()) {
          left.current = true;
          e.currentTarget.blur();
        }
      } else if (e.key === 'Escape') {
        setText(shown);
        setError(null);
        left.current = true;
        e.currentTarget.blur();
      }
    },
  };
  return { error, inputProps };
}
