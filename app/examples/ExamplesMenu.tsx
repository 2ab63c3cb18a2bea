/** The top bar's examples menu: the demo and the shelf of invented example sections. */
import { useEffect, useRef, useState } from 'react';
import { useEditor } from '../context';
import { EXAMPLE_SHELF } from './shelf';

export function ExamplesMenu() {
  const editor = useEditor();
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!open) return;
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    const esc = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        e.preventDefault();
        e.stopPropagation();
        setOpen(false);
      }
    };
    window.addEventListener('pointerdown', away);
    window.addEventListener('keydown', esc, true);
    return () => {
      window.removeEventListener('pointerdown', away);
      window.removeEventListener('keydown', esc, true);
    };
  }, [open]);
  const pick = (name: string, arg?: string) => {
    setOpen(false);
    editor.run(name, arg);
  };
  return (
    <div className="menu" ref={box}>
      <button className={`btn${open ? ' on' : ''}`} data-testid="examples-menu" aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen(!open)} title="Open a worked example section">
        Examples ▾
      </button>
      {open && (
        <div className="menu-list" role="menu" aria-label="Example sections">
          <button role="menuitem" className="menu-item" data-example="demo" onClick={() => pick('file.demo')}>
            <span className="menu-title">Canopy edge beam (the demo)</span>
            <span className="menu-blurb">Rolled I with a cover plate and a conduit opening</span>
          </button>
          {EXAMPLE_SHELF.map((e) => (
            <button key={e.file} role="menuitem" className="menu-item" data-example={e.file} onClick={() => pick('file.example', e.file)}>
              <span className="menu-title">{e.title}</span>
              <span className="menu-blurb">{e.blurb}</span>
            </button>
          ))}
          <p className="menu-note">Each opens in place of the current section; Undo brings yours back. The files are in public/examples/ and run with the command line too.</p>
        </div>
      )}
    </div>
  );
}
