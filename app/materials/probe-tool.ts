/**
 * The stress probe: a tool that takes the point whose normal stress the loads panel shows. A click
 * takes the snapped point (so a corner or an edge midpoint is hit exactly); a typed `x, y` takes
 * that point. The tool stays on for the next point; Escape goes back to Select.
 */
import { resolveTyped, type PointerInfo, type Tool, type ToolEnv } from '../tools/types';
import type { PointInput } from '../expr';
import { materialsUi } from './state';

export const PROBE_TOOL_ID = 'probe';

export class ProbeTool implements Tool {
  readonly id = PROBE_TOOL_ID;
  prompt(): string {
    return 'Stress at a point: click the section or type x, y (the loads panel shows σ there); Esc to finish';
  }
  busy(): boolean {
    return false;
  }
  reset(env: ToolEnv): void {
    env.transient.setState({ draft: null });
  }
  down(env: ToolEnv, e: PointerInfo): void {
    const p = env.snap(e.raw, { shift: e.shift }).p;
    materialsUi(env.store).setState({ probe: [p[0], p[1]] });
    env.message(null);
  }
  move(env: ToolEnv, e: PointerInfo): void {
    env.snap(e.raw, { shift: e.shift });
  }
  up(): void {}
  key(env: ToolEnv, key: string): boolean {
    if (key !== 'escape') return false;
    env.store.setState({ tool: 'select' });
    return true;
  }
  typed(env: ToolEnv, input: PointInput): string | null {
    const r = resolveTyped(input, materialsUi(env.store).getState().probe);
    if ('error' in r) return r.error;
    materialsUi(env.store).setState({ probe: r.p });
    return null;
  }
}
