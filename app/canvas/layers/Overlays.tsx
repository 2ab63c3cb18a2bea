/** The result overlays the user switches on: dimensions, cut line, extreme fibres, principal axes, centroid. */
import { useEditorShallow, useEditorState, useResults } from '../../context';
import { CentroidNode } from './Centroid';
import { CutNode } from './Cut';
import { DimensionNode } from './Dimensions';
import { useDimensions } from '../useDimensions';
import { FibreNode } from './Fibres';
import { PrincipalNode } from './Principal';

export function OverlayLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const overlays = useEditorState((s) => s.overlays);
  const cutAt = useEditorState((s) => s.cutAt);
  const cutAxis = useEditorState((s) => s.cutAxis);
  const units = useEditorState((s) => s.doc.units);
  const ev = useResults((r) => r.evaluation);
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const dims = useDimensions();
  const p = ev.props;
  if (!p) return null;
  return (
    <>
      {dims && <DimensionNode layout={dims} v={v} />}
      {overlays.cut && cutAt !== null && <CutNode ev={ev} p={p} axis={cutAxis} at={cutAt} v={v} units={units} width={width} height={height} />}
      {overlays.fibres && <FibreNode p={p} v={v} units={units} width={width} />}
      {overlays.principal && <PrincipalNode p={p} v={v} />}
      {overlays.centroid && <CentroidNode p={p} v={v} />}
    </>
  );
}
