/** The report in an overlay: the report module's HTML in an iframe, printed for "Save as PDF". */
import { useEffect, useRef, useState } from 'react';
import { loadReportRenderer } from '../report';
import { useEditor, useEditorState } from '../store/hooks';

export function ReportOverlay() {
  const editor = useEditor();
  const open = useEditorState((s) => s.reportOpen);
  const [html, setHtml] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const frame = useRef<HTMLIFrameElement>(null);
  useEffect(() => {
    if (!open) return;
    let live = true;
    setHtml(null);
    setProblem(null);
    loadReportRenderer()
      .then((render) => {
        if (!live) return;
        if (!render) {
          setProblem('The report module is not part of this build yet (app/report.ts looks for renderReportHtml in src/report/).');
          return;
        }
        const doc = editor.store.getState().doc;
        setHtml(render(doc, editor.results.evaluate(doc), { units: doc.units }));
      })
      .catch((e) => live && setProblem(`The report could not be made: ${(e as Error).message}`));
    return () => {
      live = false;
    };
  }, [open, editor]);
  if (!open) return null;
  const close = () => editor.store.setState({ reportOpen: false });
  return (
    <div className="overlay" role="dialog" aria-label="Report" data-testid="report-overlay" onKeyDown={(e) => e.key === 'Escape' && close()}>
      <div className="overlay-card report-card">
        <div className="overlay-head">
          <h2>Report</h2>
          <div className="spacer" />
          <button className="btn" disabled={!html} onClick={() => frame.current?.contentWindow?.print()}>
            Print / Save as PDF
          </button>
          <button className="btn" onClick={close}>
            Close
          </button>
        </div>
        {problem && <p className="hint">{problem}</p>}
        {html && <iframe ref={frame} title="Section report" className="report-frame" srcDoc={html} />}
        {!html && !problem && <p className="hint">Preparing the report…</p>}
      </div>
    </div>
  );
}
