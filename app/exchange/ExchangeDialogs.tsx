/**
 * The DXF import dialogs (units, review with problems), the problem marks' chip, the export
 * dialog and the hidden .dxf file chooser. Every name that comes from a file (file name, layer,
 * handle, message) is rendered as React text, never as HTML.
 */
import { useEffect, useMemo, useRef, useState } from 'react';
import { UNITS, type Units } from '../../src';
import type { DxfProblem } from '../../src/exchange';
import { useEditor, useEditorState } from '../context';
import { applyImport, cancelImport, clearProblems, readDxf } from './dxf';
import { HiddenFileInput } from './FileInput';
import { defaultPxPerUnit, pngProblem, pngSize } from './exports';
import { useExchange } from './hooks';
import { exchangeStore, type PendingImport } from './state';
import './exchange.css';
import { activeShapes } from '../store/section';

/** Keyboard: a dialog takes the focus when it opens, and Escape closes it. */
const focusIn = (...selectors: string[]) => (el: HTMLElement | null) => {
  if (!el || el.contains(document.activeElement)) return;
  for (const sel of selectors) {
    const target = el.querySelector<HTMLElement>(sel);
    if (target) return target.focus();
  }
};
const focusFirst = focusIn('button:not(:disabled)');
const focusPrimary = focusIn('.btn.primary:not(:disabled)', 'button:not(:disabled)');
function escapeTo(close: () => void) {
  return (e: React.KeyboardEvent) => {
    e.stopPropagation();
    if (e.key === 'Escape') close();
  };
}

export function ExchangeDialogs() {
  return (
    <>
      <DxfFileInput />
      <ImportDialog />
      <ProblemChip />
      <ExportDialog />
    </>
  );
}

function DxfFileInput() {
  const editor = useEditor();
  const input = useRef<HTMLInputElement>(null);
  useEffect(() => {
    const ex = exchangeStore(editor.store);
    ex.setState({ pickDxf: () => input.current?.click() });
    return () => ex.setState({ pickDxf: null });
  }, [editor]);
  return <HiddenFileInput inputRef={input} accept=".dxf,image/vnd.dxf,application/dxf" testId="dxf-input" onText={(name, text) => readDxf(editor.ctx, name, text)} />;
}

function ImportDialog() {
  const pending = useExchange((s) => s.pending);
  if (!pending) return null;
  return pending.stage === 'units' ? <UnitsDialog p={pending} /> : <ReviewDialog p={pending} />;
}

function UnitsDialog({ p }: { p: Extract<PendingImport, { stage: 'units' }> }) {
  const editor = useEditor();
  return (
    <div className="overlay" role="dialog" aria-modal="true" aria-label="Units of the DXF file" data-testid="dxf-units-dialog" ref={focusFirst} onKeyDown={escapeTo(() => cancelImport(editor.ctx))}>
      <div className="overlay-card xc-card">
        <div className="overlay-head">
          <h2>Units of “{p.fileName}”</h2>
        </div>
        <div className="xc-body">
          <p>The file does not state its units. In which units are its coordinates?</p>
          <div className="xc-units">
            {UNITS.map((u) => (
              <button key={u} className="btn" data-testid={`dxf-units-${u}`} onClick={() => readDxf(editor.ctx, p.fileName, p.text, u)}>
                {u}
              </button>
            ))}
          </div>
          <p className="xc-muted">The outlines are converted to the section's units ({editor.store.getState().doc.units}).</p>
        </div>
        <div className="xc-actions">
          <button className="btn" onClick={() => cancelImport(editor.ctx)}>
            Cancel
          </button>
        </div>
      </div>
    </div>
  );
}

export function ProblemTable({ problems }: { problems: DxfProblem[] }) {
  return (
    <div className="xc-problems-wrap">
      <table className="xc-problems" data-testid="dxf-problems">
        <thead>
          <tr>
            <th>Layer</th>
            <th>Handle</th>
            <th>Problem</th>
          </tr>
        </thead>
        <tbody>
          {problems.map((pr, i) => (
            <tr key={i} data-layer={pr.layer} data-handle={pr.handle}>
              <td>{pr.layer}</td>
              <td className="mono">{pr.handle}</td>
              <td>{pr.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function ReviewDialog({ p }: { p: Extract<PendingImport, { stage: 'review' }> }) {
  const editor = useEditor();
  const [mode, setMode] = useState<'add' | 'subtract'>('add');
  const holes = p.shapes.filter((s) => s.op === 'subtract').length;
  const outlines = p.shapes.length - holes;
  const hasSection = useEditorState((s) => activeShapes(s.doc).length > 0);
  const unitsLine =
    p.sourceUnits === p.targetUnits
      ? `Read in ${p.sourceUnits}${p.unitsFromFile ? ' (as the file states)' : ' (as you chose)'}.`
      : `Read in ${p.sourceUnits}${p.unitsFromFile ? ' (as the file states)' : ' (as you chose)'} and converted to ${p.targetUnits}.`;
  return (
    <div className="overlay xc-side" role="dialog" aria-modal="true" aria-label="Import DXF" data-testid="dxf-review" ref={focusPrimary} onKeyDown={escapeTo(() => cancelImport(editor.ctx))}>
      <div className="overlay-card xc-card">
        <div className="overlay-head">
          <h2>Import “{p.fileName}”</h2>
        </div>
        <div className="xc-body">
          {p.shapes.length > 0 ? (
            <p data-testid="dxf-summary">
              Found {outlines} closed outline{outlines === 1 ? '' : 's'}
              {holes > 0 ? ` and ${holes} hole${holes === 1 ? '' : 's'}` : ''} (shown dashed on the canvas). {unitsLine}
            </p>
          ) : (
            <p data-testid="dxf-summary">No closed outline was found in the file, so there is nothing to add. {unitsLine}</p>
          )}
          {p.problems.length > 0 && (
            <>
              <p>
                <strong>
                  {p.problems.length} entit{p.problems.length === 1 ? 'y was' : 'ies were'} left out
                </strong>{' '}
                (marked red on the canvas):
              </p>
              <ProblemTable problems={p.problems} />
            </>
          )}
          {p.warnings.length > 0 && (
            <ul className="xc-warn" data-testid="dxf-warnings">
              {p.warnings.map((w, i) => (
                <li key={i}>{w}</li>
              ))}
            </ul>
          )}
          {p.ignored.length > 0 && (
            <p className="xc-muted">Not outline geometry, not imported: {p.ignored.map((g) => `${g.type} × ${g.count}`).join(', ')}.</p>
          )}
          {p.shapes.length > 0 && (
            <div className="xc-mode" role="radiogroup" aria-label="How to place the outlines">
              <label>
                <input type="radio" name="dxf-mode" data-testid="dxf-mode-add" checked={mode === 'add'} onChange={() => setMode('add')} />
                <span>Add to the section (holes in the drawing stay holes)</span>
              </label>
              <label>
                <input type="radio" name="dxf-mode" data-testid="dxf-mode-subtract" checked={mode === 'subtract'} disabled={!hasSection} onChange={() => setMode('subtract')} />
                <span>Cut out of the section (a proposed opening; material inside the drawing's holes is kept)</span>
              </label>
            </div>
          )}
        </div>
        <div className="xc-actions">
          <button className="btn" data-testid="dxf-cancel" onClick={() => cancelImport(editor.ctx)}>
            Cancel
          </button>
          <button className="btn primary" data-testid="dxf-apply" disabled={p.shapes.length === 0} onClick={() => applyImport(editor.ctx, mode)}>
            {mode === 'add' ? 'Add to section' : 'Cut out of section'}
          </button>
        </div>
      </div>
    </div>
  );
}

function ProblemChip() {
  const editor = useEditor();
  const problems = useExchange((s) => s.problems);
  const file = useExchange((s) => s.problemsFile);
  const pending = useExchange((s) => s.pending);
  const [open, setOpen] = useState(false);
  if (pending || problems.length === 0) return null;
  return (
    <div className="xc-chip" role="status" data-testid="dxf-problem-chip" style={open ? { flexDirection: 'column', alignItems: 'stretch', maxWidth: 640 } : undefined}>
      <div style={{ display: 'flex', gap: 8, alignItems: 'center' }}>
        <span>
          {problems.length} entit{problems.length === 1 ? 'y' : 'ies'} of “{file}” left out, marked red
        </span>
        <button className="btn small" onClick={() => setOpen(!open)}>
          {open ? 'Hide list' : 'List'}
        </button>
        <button className="btn small" data-testid="dxf-clear-problems" onClick={() => clearProblems(editor.ctx)}>
          Clear marks
        </button>
      </div>
      {open && <ProblemTable problems={problems} />}
    </div>
  );
}

function ExportDialog() {
  const editor = useEditor();
  const open = useExchange((s) => s.exportOpen);
  const doc = useEditorState((s) => s.doc);
  const units: Units = doc.units;
  const region = useMemo(() => (open ? editor.results.evaluate(doc).region : []), [open, doc, editor]);
  const [ppu, setPpu] = useState('');
  useEffect(() => {
    if (open && region.length) setPpu(String(defaultPxPerUnit(region)));
  }, [open, region]);
  if (!open) return null;
  const close = () => exchangeStore(editor.store).setState({ exportOpen: false });
  const empty = region.length === 0;
  const size = empty ? null : pngSize(region, Number(ppu));
  const problem = empty ? null : pngProblem(size);
  return (
    <div className="overlay" role="dialog" aria-modal="true" aria-label="Export" data-testid="export-dialog" ref={focusFirst} onKeyDown={escapeTo(close)}>
      <div className="overlay-card xc-card">
        <div className="overlay-head">
          <h2>Export the section</h2>
          <div className="spacer" style={{ flex: 1 }} />
          <button className="btn" onClick={close}>
            Close
          </button>
        </div>
        <div className="xc-body">
          {empty && <p className="xc-error">The section is empty: only the section document can be exported.</p>}
          <div className="xc-export-row">
            <strong>SVG drawing</strong>
            <span className="xc-muted">The combined section with exact arcs, at true size (1:1, in mm).</span>
            <button className="btn" data-testid="export-svg" disabled={empty} onClick={() => editor.run('export.svg')}>
              Download
            </button>
          </div>
          <div className="xc-export-row">
            <strong>DXF drawing</strong>
            <span className="xc-muted">Closed polylines with arc segments, units {units} ($INSUNITS).</span>
            <button className="btn" data-testid="export-dxf" disabled={empty} onClick={() => editor.run('export.dxf')}>
              Download
            </button>
          </div>
          <div className="xc-export-row">
            <strong>PNG image</strong>
            <span className="xc-muted">
              <input data-testid="export-png-ppu" inputMode="decimal" value={ppu} onChange={(e) => setPpu(e.target.value)} aria-label={`Pixels per ${units}`} /> px per {units}
              {size && !problem ? ` → ${size.width} × ${size.height} px` : ''}
              {problem && <span className="xc-error"> {problem}</span>}
            </span>
            <button
              className="btn"
              data-testid="export-png"
              disabled={empty || !!problem}
              onClick={() => editor.run('export.png', Number(ppu))}
            >
              Download
            </button>
          </div>
          <div className="xc-export-row">
            <strong>Section document</strong>
            <span className="xc-muted">The shapes, units and title block as JSON (opens again with Open…).</span>
            <button className="btn" data-testid="export-json" onClick={() => editor.run('export.json')}>
              Download
            </button>
          </div>
        </div>
      </div>
    </div>
  );
}
