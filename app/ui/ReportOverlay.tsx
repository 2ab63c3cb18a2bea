/** The report in an overlay: the report module's HTML in an iframe, printed for "Save as PDF". */
import { useEffect, useRef, useState } from 'react';
import { computeSectionTorsion, type SectionTorsion } from '../../src';
import { loadReportRenderer } from '../report';
import { useEditor, useEditorState, useTorsion } from '../context';
import { withPaperSize, type Paper } from '../exchange/paper';
import { CommandButton } from '../fields/CommandButton';

export function ReportOverlay() {
  const editor = useEditor();
  const open = useEditorState((s) => s.reportOpen);
  const doc = useEditorState((s) => s.doc);
  const [paper, setPaper] = useState<Paper>('A4');
  const [html, setHtml] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const frame = useRef<HTMLIFrameElement>(null);
  const torsionRunning = useTorsion((t) => t.status === 'running');
  const torsionProgress = useTorsion((t) => t.progress);
  useEffect(() => {
    if (!open) return;
    let live = true;
    setHtml(null);
    setProblem(null);
    // Torsion (when the document includes it) is run for the report now, or taken when current.
    // The report describes the baseline: with a proposal shown, the live result belongs to the
    // proposal, so the baseline's is computed for the report (after a frame, so the overlay shows).
    const baselineTorsion = () =>
      new Promise<SectionTorsion | null>((resolve) => setTimeout(() => resolve(doc.torsion ? computeSectionTorsion(doc, editor.results.evaluateBaseline(doc)) : null), 30));
    Promise.all([loadReportRenderer(), doc.activeVariant ? baselineTorsion() : editor.torsion.forReport(doc)])
      .then(([render, torsion]) => {
        if (!live) return;
        if (!render) {
          setProblem('The report module is not available in this build.');
          return;
        }
        const s = editor.store.getState();
        const cut = s.overlays.cut && s.cutAt !== null ? { axis: s.cutAxis, at: s.cutAt } : null;
        // The report describes the baseline; a proposal (the one shown, else the first) gets its cutout check after it.
        setHtml(render({ doc: s.doc, evaluation: editor.results.evaluateBaseline(s.doc), cut, kern: s.overlays.kern, generated: new Date().toISOString().slice(0, 16).replace('T', ' '), torsion }));
      })
      .catch((e) => live && setProblem(`The report could not be made: ${(e as Error).message}`));
    return () => {
      live = false;
    };
  }, [open, editor, doc]);
  if (!open) return null;
  const close = () => editor.store.setState({ reportOpen: false });
  return (
    <div className="overlay" role="dialog" aria-label="Report" data-testid="report-overlay" onKeyDown={(e) => e.key === 'Escape' && close()}>
      <div className="overlay-card report-card">
        <div className="overlay-head">
          <h2>Report</h2>
          <div className="spacer" />
          <CommandButton name="doc.titleBlock" />
          <CommandButton name="doc.checker" />
          <select data-testid="report-paper" aria-label="Paper size" value={paper} onChange={(e) => setPaper(e.target.value as Paper)}>
            <option value="A4">A4</option>
            <option value="Letter">US Letter</option>
          </select>
          <button className="btn" disabled={!html} onClick={() => frame.current?.contentWindow?.print()}>
            Print / Save as PDF
          </button>
          <button className="btn" onClick={close}>
            Close
          </button>
        </div>
        {problem && <p className="hint">{problem}</p>}
        {html && <iframe ref={frame} title="Section report" className="report-frame" srcDoc={withPaperSize(html, paper)} sandbox="allow-same-origin allow-modals" />}
        {!html && !problem && <p className="hint">Preparing the report…{torsionRunning && ` Computing torsion (${Math.round(100 * torsionProgress)} %).`}</p>}
      </div>
    </div>
  );
}
