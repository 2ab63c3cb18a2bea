/** The dialog for a question the editor asks before going ahead (app/ops/question.ts). */
import { useEffect, useRef } from 'react';
import { createPortal } from 'react-dom';
import { useStore } from 'zustand';
import { useEditor } from '../context';
import { answer, questionStore } from '../ops/question';

export function QuestionDialog() {
  const editor = useEditor();
  const q = useStore(questionStore(editor.store), (s) => s.question);
  const keep = useRef<HTMLButtonElement>(null);
  // The safe answer has the focus, so Enter or Escape never loses work by accident.
  useEffect(() => {
    if (q) keep.current?.focus();
  }, [q]);
  if (!q) return null;
  return createPortal(
    <div className="overlay" role="presentation" onClick={() => answer(editor.store, false)}>
      <div
        className="overlay-card question-card"
        role="alertdialog"
        aria-modal="true"
        aria-labelledby="question-title"
        data-question={q.id}
        onClick={(e) => e.stopPropagation()}
        onKeyDown={(e) => {
          e.stopPropagation();
          if (e.key === 'Escape') answer(editor.store, false);
        }}
      >
        <h2 id="question-title">{q.title}</h2>
        {q.lines.map((l, i) => (
          <p key={i} className="hint">
            {l}
          </p>
        ))}
        <div className="question-buttons">
          <button ref={keep} className="btn" data-answer="no" onClick={() => answer(editor.store, false)}>
            {q.cancel}
          </button>
          <button className="btn danger" data-answer="yes" onClick={() => answer(editor.store, true)}>
            {q.confirm}
          </button>
        </div>
      </div>
    </div>,
    document.body,
  );
}
