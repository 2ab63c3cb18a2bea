/** Messages that need reading: a refused file, an autosave problem. */
import { useEditor, useEditorState } from '../context';

export function Notice() {
  const editor = useEditor();
  const n = useEditorState((s) => s.notice);
  if (!n) return null;
  return (
    <div className={`notice notice-${n.kind}`} role={n.kind === 'error' ? 'alert' : 'status'} data-testid="notice">
      <div className="notice-body">
        <strong>{n.title}</strong>
        {n.lines.length > 0 && (
          <ul>
            {n.lines.map((l, i) => (
              <li key={i}>{l}</li>
            ))}
          </ul>
        )}
      </div>
      <button className="btn small" onClick={() => editor.run('notice.dismiss')} aria-label="Dismiss">
        Dismiss
      </button>
    </div>
  );
}
