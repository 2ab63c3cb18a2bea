/** The top bar (file, history, report), the tool rail (tools, profiles, snapping, overlays) and the status bar (typed input). */
import { useRef } from 'react';
import { formatNumber } from '../../src';
import { useEditor, useEditorState, useTransient } from '../context';
import { CommandButton } from '../fields/CommandButton';
import { SHAPE_EDITORS, TOOL_SPECS } from '../shapes';
import { KeysHelp } from './KeysHelp';
import { CataloguePicker } from './CataloguePicker';
import { ExamplesMenu } from '../examples/ExamplesMenu';
import { ENTRY_TITLE, PLACEHOLDER } from '../input-syntax';
import { entryKeyDown } from './entry-keys';
import { CutoutRail } from './CutoutRail';

export function TopBar() {
  const name = useEditorState((s) => s.doc.name);
  return (
    <header className="topbar">
      <div className="brand">
        <svg className="brand-mark" width="18" height="18" viewBox="0 0 18 18" aria-hidden>
          {/* A section outline with its centroid: the product in one glyph. */}
          <path d="M3 3h12v3H10.5v6H15v3H3v-3h4.5V6H3z" fill="none" stroke="currentColor" strokeWidth="1.4" />
          <circle cx="9" cy="9" r="1.6" fill="currentColor" />
        </svg>
        Kern
      </div>
      <div className="doc-name" title="Section name">
        {name ?? 'Untitled section'}
      </div>
      <div className="group">
        <CommandButton name="file.new">New</CommandButton>
        <CommandButton name="file.open">Open…</CommandButton>
        <CommandButton name="file.save">Save</CommandButton>
        <ExamplesMenu />
      </div>
      <div className="group">
        <CommandButton name="file.importDxf">Import DXF…</CommandButton>
        <CommandButton name="file.export">Export…</CommandButton>
        <CommandButton name="doc.titleBlock">Title block…</CommandButton>
        <CommandButton name="materials.open">Materials…</CommandButton>
      </div>
      <div className="group">
        <CommandButton name="undo" />
        <CommandButton name="redo" />
      </div>
      <div className="spacer" />
      <KeysHelp />
      <CommandButton name="report.open" className="primary">
        Report
      </CommandButton>
    </header>
  );
}

export function ToolRail() {
  const tool = useEditorState((s) => s.tool);
  return (
    <nav className="rail" aria-label="Tools">
      <div className="rail-group">
        <h3>Draw</h3>
        <CommandButton name="tool.select" />
        {TOOL_SPECS.filter((t) => t.inDrawGroup).map((t) => (
          <CommandButton key={t.id} name={`tool.${t.id}`} />
        ))}
        {(TOOL_SPECS.find((t) => t.id === tool)?.subCommands ?? []).map((name) => (
          <CommandButton key={name} name={name} className="sub" />
        ))}
      </div>
      {SHAPE_EDITORS.map((e, i) => e.RailControl && <e.RailControl key={i} />)}
      <CataloguePicker />
      <CutoutRail />
      <div className="rail-group rail-grid">
        <h3>Snap</h3>
        <CommandButton name="snap.grid" />
        <CommandButton name="snap.geometry" />
        <CommandButton name="snap.ortho" className="wide" />
      </div>
      <div className="rail-group rail-grid">
        <h3>Show</h3>
        {/* Short names two to a row; the button's title gives the full name and its key. */}
        <CommandButton name="view.centroid">Centroid</CommandButton>
        <CommandButton name="view.principal">Axes 1, 2</CommandButton>
        <CommandButton name="view.fibres">Fibres</CommandButton>
        <CommandButton name="view.cut">Cut line</CommandButton>
        <CommandButton name="view.dimensions">Dims</CommandButton>
        <CommandButton name="view.kern">Kern</CommandButton>
        <CommandButton name="view.stress">Loads σ</CommandButton>
        <CommandButton name="view.stressMap">Torsion τ</CommandButton>
        <CommandButton name="view.cautions">Cautions</CommandButton>
        <CommandButton name="view.fit">Fit</CommandButton>
      </div>
    </nav>
  );
}

export function StatusBar() {
  const editor = useEditor();
  const prompt = useTransient((t) => t.prompt);
  const err = useTransient((t) => t.inputError);
  const pointer = useTransient((t) => t.pointer);
  const snap = useTransient((t) => t.snap);
  const units = useEditorState((s) => s.doc.units);
  // Round-off below 10⁻¹⁰ of the visible width shows as 0 (a snapped point at x = 1e-15 is at 0).
  const span = useEditorState((s) => s.width / s.scale);
  const input = useRef<HTMLInputElement>(null);
  const p = snap?.p ?? pointer;
  return (
    <footer className="statusbar">
      <div className="coords" data-testid="coords">
        {p ? `x ${formatNumber(p[0], 6, span)}  y ${formatNumber(p[1], 6, span)} ${units}` : '—'}
      </div>
      <div className="prompt" data-testid="prompt">
        {prompt}
      </div>
      <input
        ref={input}
        id="typed-input"
        data-testid="typed-input"
        className={`typed${err ? ' invalid' : ''}`}
        placeholder={PLACEHOLDER}
        spellCheck={false}
        autoComplete="off"
        title={ENTRY_TITLE}
        onKeyDown={(e) => entryKeyDown(editor, e)}
      />
      {err && (
        <div className="input-error" role="alert" data-testid="input-error">
          {err}
        </div>
      )}
    </footer>
  );
}
