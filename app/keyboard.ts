/**
 * The keyboard: Enter, Escape and Backspace go to the active tool first; a key that starts a
 * typed coordinate moves the focus to the entry box; every other key is looked up in the command
 * table. Keys typed into a field belong to that field.
 */
import { eventKey } from './commands/registry';
import type { EditorHandle } from './context';
import { ENTRY_START } from './input-syntax';

function isField(t: EventTarget | null): boolean {
  return t instanceof HTMLInputElement || t instanceof HTMLTextAreaElement || t instanceof HTMLSelectElement;
}


/** Listen on the window; returns the function that stops listening. */
export function installKeyboard(editor: EditorHandle): () => void {
  const onKey = (e: KeyboardEvent) => {
    if (isField(e.target) || e.defaultPrevented) return;
    const k = e.key.toLowerCase();
    const tool = editor.tool();
    if ((k === 'enter' || k === 'escape' || (k === 'backspace' && tool.busy())) && tool.key(editor.env, k)) {
      e.preventDefault();
      editor.transient.setState({ prompt: tool.prompt(editor.env) });
      return;
    }
    const st = editor.store.getState();
    if (k === 'escape' && st.tool !== 'select') {
      // Escape with nothing half-drawn leaves the drawing tool.
      e.preventDefault();
      editor.run('tool.select');
      return;
    }
    // While drawing, or with a selection to move, a key that starts an entry goes to the entry box.
    const canType = st.tool !== 'select' || st.selected.length > 0;
    if (!e.ctrlKey && !e.metaKey && !e.altKey && ENTRY_START.test(e.key) && canType) {
      const input = document.getElementById('typed-input') as HTMLInputElement | null;
      if (input) {
        e.preventDefault();
        input.focus();
        input.value = e.key;
        return;
      }
    }
    const cmd = editor.commands.forKey(eventKey(e));
    if (cmd) {
      e.preventDefault();
      editor.run(cmd.name);
    }
  };
  window.addEventListener('keydown', onKey);
  return () => window.removeEventListener('keydown', onKey);
}
