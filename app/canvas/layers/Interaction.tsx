/** What follows the pointer: the selection, its handles and names, a corner picked for rounding, the tool's draft, the snap target. */
import { useEditorShallow, useTransient } from '../../context';
import { CornerNode } from './Corner';
import { DraftNode } from './Draft';
import { SelectionNode } from './Selection';
import { ShapeNamesNode } from './ShapeNames';
import { SnapNode } from './Snap';

export function InteractionLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const draft = useTransient((t) => t.draft);
  const snap = useTransient((t) => t.snap);
  return (
    <>
      <SelectionNode v={v} />
      <CornerNode v={v} />
      <ShapeNamesNode v={v} />
      {draft && <DraftNode draft={draft} v={v} />}
      {snap && <SnapNode snap={snap} v={v} />}
    </>
  );
}
