/** A toolbar button bound to a registry command: label, key hint, enabled and active state. */
import type { ReactNode } from 'react';
import { useEditor, useEditorState } from '../context';

const NAMES: Record<string, string> = { mod: 'Ctrl', shift: 'Shift', alt: 'Alt', arrowleft: '←', arrowright: '→', arrowup: '↑', arrowdown: '↓' };

export function keyHint(keys: string[] | undefined): string {
  if (!keys?.length) return '';
  return keys[0]
    .split('+')
    .map((p) => NAMES[p] ?? (p.length === 1 ? p.toUpperCase() : p[0].toUpperCase() + p.slice(1)))
    .join('+');
}

export function CommandButton({ name, arg, children, className }: { name: string; arg?: unknown; children?: ReactNode; className?: string }) {
  const editor = useEditor();
  const cmd = editor.commands.get(name);
  if (!cmd) throw new Error(`no command ${name}`);
  const enabled = useEditorState(() => (cmd.enabled ? cmd.enabled(editor.ctx) : true));
  const active = useEditorState(() => (cmd.active ? cmd.active(editor.ctx) : false));
  const key = keyHint(cmd.keys);
  const title = [cmd.hint ?? cmd.label, key && `(${key})`].filter(Boolean).join(' ');
  return (
    <button
      className={`btn${active ? ' on' : ''}${className ? ' ' + className : ''}`}
      data-command={name}
      aria-pressed={cmd.active ? active : undefined}
      disabled={!enabled}
      title={title}
      onClick={() => editor.run(name, arg)}
    >
      {children ?? cmd.label}
    </button>
  );
}
