/**
 * Keys typed into the coordinate entry box. The box holds a coordinate only while one is being
 * typed: after a point is taken (Enter), or the box is left empty, the focus goes back to the
 * canvas, so the next key is a command again (the arc-mode key, the subtract key, …). A key that
 * reaches an empty box and is not the start of an entry is run as its command, so a drafter who
 * clicked into the box by mistake is not trapped there.
 */
import { eventKey } from '../commands/registry';
import type { EditorHandle } from '../context';
import { ENTRY_START } from '../input-syntax';

/** Give the keyboard back to the canvas (keys there mean commands). */
export function focusCanvas(): void {
  const canvas = document.querySelector<HTMLElement>('[data-testid="canvas"]');
  if (canvas) canvas.focus({ preventScroll: true });
  else (document.activeElement as HTMLElement | null)?.blur();
}

function refreshPrompt(editor: EditorHandle): void {
  editor.transient.setState({ prompt: editor.tool().prompt(editor.env) });
}

/** What a keydown in the entry box does. */
export function entryKeyDown(editor: EditorHandle, e: React.KeyboardEvent<HTMLInputElement>): void {
  e.stopPropagation();
  const el = e.currentTarget;
  const empty = el.value.trim() === '';
  if (e.key === 'Enter') {
    e.preventDefault();
    if (empty) {
      // An empty entry finishes the shape being drawn (a polygon, a path, a line).
      el.value = '';
      editor.tool().key(editor.env, 'enter');
      refreshPrompt(editor);
      focusCanvas();
      return;
    }
    const error = editor.type(el.value);
    if (!error) {
      el.value = '';
      focusCanvas();
    }
    return;
  }
  if (e.key === 'Escape') {
    e.preventDefault();
    el.value = '';
    editor.tool().key(editor.env, 'escape');
    editor.transient.setState({ inputError: null });
    refreshPrompt(editor);
    focusCanvas();
    return;
  }
  if (!empty) return;
  // Nothing typed yet: a key that cannot start an entry is a command.
  const plain = !e.ctrlKey && !e.metaKey && !e.altKey;
  if (plain && ENTRY_START.test(e.key)) return;
  const cmd = editor.commands.forKey(eventKey(e.nativeEvent));
  if (!cmd) return;
  e.preventDefault();
  focusCanvas();
  editor.transient.setState({ inputError: null });
  editor.run(cmd.name);
}
