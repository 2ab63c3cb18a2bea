/** The editor's layout: top bar, tool rail, canvas, side panel and status bar. */
import { useEffect, useRef } from 'react';
import { registry, loadDocumentText } from './commands/commands';
import { eventKey } from './commands/registry';
import type { Editor } from './editor';
import { Canvas } from './canvas/Canvas';
import { CutPanel } from './panel/CutPanel';
import { Caution, ResultsPanel } from './panel/ResultsPanel';
import { SelectionPanel } from './panel/SelectionPanel';
import { ShapeList } from './panel/ShapeList';
import { EditorContext } from './store/hooks';
import { StatusBar, ToolRail, TopBar } from './ui/Bars';
import { Notice } from './ui/Notice';
import { ReportOverlay } from './ui/ReportOverlay';
import { ExchangeDialogs } from './exchange/ExchangeDialogs';
import { TitleBlockDialog } from './ui/TitleBlock';
import { downloadBlob } from './exchange/exports';

function isField(t: EventTarget | null): boolean {
  return t instanceof HTMLInputElement || t instanceof HTMLTextAreaElement || t instanceof HTMLSelectElement;
}

const TYPED_START = /^[0-9@.\-+(]$/;

export function App({ editor }: { editor: Editor }) {
  const fileInput = useRef<HTMLInputElement>(null);

  useEffect(() => {
    editor.ctx.io = {
      pickFile: () => {
        fileInput.current?.click();
        return Promise.resolve(null);
      },
      download: (name, text) => downloadBlob(name, new Blob([text], { type: 'application/json' })),
    };
    editor.ctx.openReport = () => editor.store.setState({ reportOpen: true });

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
      const drawing = st.tool !== 'select';
      if (!e.ctrlKey && !e.metaKey && !e.altKey && TYPED_START.test(e.key) && (drawing || (e.key === '@' && st.selected.length))) {
        const input = document.getElementById('typed-input') as HTMLInputElement | null;
        if (input) {
          e.preventDefault();
          input.focus();
          input.value = e.key;
          return;
        }
      }
      const cmd = registry.forKey(eventKey(e));
      if (cmd) {
        e.preventDefault();
        editor.run(cmd.name);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [editor]);

  return (
    <EditorContext.Provider value={editor}>
      <div className="app">
        <TopBar />
        <ToolRail />
        <main className="stage">
          <Canvas />
          <Notice />
        </main>
        <aside className="panel" aria-label="Selection and results">
          {/* Two scroll areas: editing above, results below, so the numbers stay in view
              while a shape is edited. */}
          <div className="panel-scroll panel-edit">
            <SelectionPanel />
            <ShapeList />
          </div>
          <div className="panel-scroll panel-results">
            <ResultsPanel />
            <CutPanel />
          </div>
          <Caution />
        </aside>
        <StatusBar />
        <ReportOverlay />
        <ExchangeDialogs />
        <TitleBlockDialog />
        <input
          ref={fileInput}
          type="file"
          accept=".json,application/json"
          data-testid="file-input"
          style={{ display: 'none' }}
          onChange={async (e) => {
            const f = e.target.files?.[0];
            e.target.value = '';
            if (!f) return;
            loadDocumentText(editor.ctx, f.name, await f.text());
          }}
        />
      </div>
    </EditorContext.Provider>
  );
}
