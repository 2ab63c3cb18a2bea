/**
 * The first-steps guide: a short card over the canvas with Kern's three jobs (sketch a section,
 * check a cutout, print the report). Pointing at a step lights up the controls it names. It does
 * not block the editor: the demo section stays loaded and can be used at once. Dismissed, it does
 * not come back by itself; the keys sheet shows it again.
 */
import { useState } from 'react';
import { useStore } from 'zustand';
import { useEditor } from '../context';
import { dismissGuide, guideStore } from './guide-state';

interface Step {
  id: string;
  title: string;
  text: string;
  /** The controls the step names (CSS selectors), lit while the step is pointed at. */
  targets: string[];
}

const STEPS: Step[] = [
  {
    id: 'sketch',
    title: 'Sketch a section',
    text: 'Draw with the tools on the left, or place a rolled section. Type points as you draw: x, y · d dx, dy · L a θ.',
    targets: ['.rail', '#typed-input'],
  },
  {
    id: 'cutout',
    title: 'Check a cutout',
    text: 'Draw the hole or cope, make it Subtract (Shift+S) and read what is left on the right. Examples ▾ holds a cope proposal with its baseline.',
    targets: ['[data-testid="results"]', '[data-testid="examples-menu"]'],
  },
  {
    id: 'report',
    title: 'Print the report',
    text: 'Fill in the Title block, then Report → Print / Save as PDF for the engineer who checks the design.',
    targets: ['[data-command="doc.titleBlock"]', '[data-command="report.open"]'],
  },
];

function light(targets: string[], on: boolean): void {
  for (const sel of targets) for (const el of document.querySelectorAll(sel)) el.classList.toggle('guide-spot', on);
}

export function FirstRunGuide() {
  const editor = useEditor();
  const open = useStore(guideStore(editor.store), (s) => s.open);
  const [lit, setLit] = useState<string | null>(null);
  if (!open) return null;
  const point = (s: Step | null) => {
    for (const x of STEPS) light(x.targets, false);
    if (s) light(s.targets, true);
    setLit(s?.id ?? null);
  };
  const close = () => {
    point(null);
    dismissGuide(editor.store);
  };
  return (
    <aside className="guide" role="dialog" aria-label="First steps" data-testid="first-run-guide">
      <div className="guide-head">
        <h2>Kern in three jobs</h2>
        <span className="guide-sub">The demo section is loaded: try each job on it.</span>
      </div>
      <ol>
        {STEPS.map((s, i) => (
          <li
            key={s.id}
            className={lit === s.id ? 'on' : ''}
            data-step={s.id}
            tabIndex={0}
            onPointerEnter={() => point(s)}
            onPointerLeave={() => point(null)}
            onFocus={() => point(s)}
            onBlur={() => point(null)}
          >
            <span className="guide-num">{i + 1}</span>
            <div>
              <strong>{s.title}</strong>
              <p>{s.text}</p>
            </div>
          </li>
        ))}
      </ol>
      <div className="guide-foot">
        <span>Keys (top right) shows this guide again.</span>
        <button className="btn primary-soft" data-testid="guide-dismiss" onClick={close}>
          Got it
        </button>
      </div>
    </aside>
  );
}
