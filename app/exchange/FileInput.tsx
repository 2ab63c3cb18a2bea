/**
 * A hidden file chooser, opened through `inputRef`. The chosen file's text goes to `onText`; a
 * file the browser cannot read gives a notice and leaves the section as it was.
 */
import type { RefObject } from 'react';
import { useEditor } from '../context';

export function HiddenFileInput(props: { inputRef: RefObject<HTMLInputElement | null>; accept: string; testId: string; onText: (name: string, text: string) => void }) {
  const editor = useEditor();
  return (
    <input
      ref={props.inputRef}
      type="file"
      accept={props.accept}
      data-testid={props.testId}
      style={{ display: 'none' }}
      onChange={async (e) => {
        const f = e.target.files?.[0];
        e.target.value = '';
        if (!f) return;
        let text: string;
        try {
          text = await f.text();
        } catch (err) {
          editor.store.setState({ notice: { kind: 'error', title: `"${f.name}" could not be read.`, lines: [String((err as Error).message ?? err), 'Your current section is unchanged.'] } });
          return;
        }
        props.onText(f.name, text);
      }}
    />
  );
}
