/** Start-up: restore the autosaved section (or the demo), install autosave, mount the editor. */
import { createRoot } from 'react-dom/client';
import { App } from './App';
import { registry } from './command-table';
import { fitView } from './ops/view';
import { createEditor } from './editor';
import { installAutosave, restoreDocument } from './persist';
import { startGuide } from './ui/guide-state';
import './styles.css';

function storage(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}

const store = storage();
const restored = restoreDocument(store);
// `?worker=0` evaluates on the main thread (for comparison and for browsers without module workers).
const params = new URLSearchParams(window.location.search);
const editor = createEditor(restored.doc, { worker: params.get('worker') !== '0' });
// The first-steps guide opens by itself only on a first start: nothing autosaved yet.
startGuide(editor.store, store, !restored.restored && restored.problems.length === 0);
if (store) installAutosave(editor.store, store);
if (restored.problems.length) {
  editor.store.setState({
    notice: {
      kind: 'error',
      title: 'The autosaved section could not be restored; the demo section is shown. The stored copy was kept aside.',
      lines: restored.problems,
    },
  });
}

// Fit the section once the canvas knows its size.
const unsub = editor.store.subscribe((s, prev) => {
  if (s.width !== prev.width || s.height !== prev.height) {
    fitView(editor.ctx);
    unsub();
  }
});

// A handle for the end-to-end tests and the benchmark (reads state, runs registry commands).
(window as unknown as { __kern: unknown }).__kern = { editor, registry };

createRoot(document.getElementById('root')!).render(<App editor={editor} />);
