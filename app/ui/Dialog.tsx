/**
 * The shell the editor's side dialogs share: a modal overlay that takes the focus and keeps keys
 * to itself, Escape and Done close it, and closing first lets the field being typed in save (its
 * blur runs first).
 */
import type { ReactNode } from 'react';

export function Dialog(props: {
  title: string;
  testId: string;
  /** Test id of the Done button. */
  closeTestId: string;
  onClose: () => void;
  /** Extra classes of the overlay and of its card. */
  overlayClass?: string;
  cardClass: string;
  /** Put the focus in the first input when it opens (else on Done). */
  focusInput?: boolean;
  children: ReactNode;
}) {
  const close = () => {
    (document.activeElement as HTMLElement | null)?.blur?.();
    props.onClose();
  };
  return (
    <div
      className={`overlay${props.overlayClass ? ` ${props.overlayClass}` : ''}`}
      style={{ zIndex: 30 }}
      role="dialog"
      aria-modal="true"
      aria-label={props.title}
      data-testid={props.testId}
      ref={(el) => {
        // The dialog takes the focus when it opens (so Escape reaches it): the first input, or Done.
        if (!el || el.contains(document.activeElement)) return;
        const target = props.focusInput ? el.querySelector<HTMLElement>('input') : null;
        (target ?? el.querySelector<HTMLElement>(`[data-testid="${props.closeTestId}"]`))?.focus();
      }}
      onKeyDown={(e) => {
        e.stopPropagation();
        if (e.key === 'Escape') close();
      }}
    >
      <div className={`overlay-card ${props.cardClass}`}>
        <div className="overlay-head">
          <h2>{props.title}</h2>
          <div style={{ flex: 1 }} />
          <button className="btn" data-testid={props.closeTestId} onClick={close}>
            Done
          </button>
        </div>
        {props.children}
      </div>
    </div>
  );
}
