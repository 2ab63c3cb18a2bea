/**
 * The commands of the materials and loads features (registered into the one command table):
 * the materials dialog, the material of the selection, the kern and stress overlays, and the
 * stress probe tool. What they do lives in app/ops/materials.ts and app/ops/view.ts.
 */
import type { CommandRegistry } from '../commands/registry';
import { hasSelection } from '../ops/selection';
import { setSelectionMaterial } from '../ops/materials';
import { toggleOverlay } from '../ops/view';
import { PROBE_TOOL_ID } from './probe-tool';
import { materialsUi } from './state';

export function registerMaterials(r: CommandRegistry): void {
  r.register({
    name: 'materials.open',
    label: 'Materials…',
    group: 'file',
    hint: 'Materials of the section: add from the library or by hand, edit, the reference material and the stress unit',
    perform: (c) => materialsUi(c.store).setState({ dialogOpen: true }),
  });
  r.register({
    name: 'material.assign',
    label: 'Set material',
    group: 'edit',
    hint: 'Give the selected shapes a material (none: the reference material)',
    enabled: hasSelection,
    perform: (c, arg) => {
      const err = setSelectionMaterial(c, typeof arg === 'string' ? arg : null);
      if (err) c.store.setState({ notice: { kind: 'error', title: 'The material was not set.', lines: [err] } });
    },
  });
  r.register({ name: 'view.kern', label: 'Kern', group: 'view', hint: 'The kern (core): a compressive force inside it causes no tension', active: (c) => c.store.getState().overlays.kern, perform: (c) => toggleOverlay(c, 'kern') });
  r.register({ name: 'view.stress', label: 'Load stresses', group: 'view', hint: 'Normal stress colour map, neutral axis and the largest stresses under the loads entered', active: (c) => c.store.getState().overlays.stress, perform: (c) => toggleOverlay(c, 'stress') });
  r.register({
    name: 'tool.probe',
    label: 'Stress at a point',
    group: 'tool',
    hint: 'Click the section or type x, y: the loads panel shows the stress there',
    active: (c) => c.store.getState().tool === PROBE_TOOL_ID,
    perform: (c) => c.store.setState({ tool: PROBE_TOOL_ID, pathArc: false }),
  });
}
