/**
 * The net-section line tool: two points (clicked, typed, or pressed and dragged) make a straight
 * line across the section, kept in the document (one undo step), whose gross and net lengths the
 * side panel lists. Points snap like every drawing tool (vertices, hole centres, the grid).
 */
import type { Point } from '../../src';
import { HINT } from '../input-syntax';
import { addNetLine } from '../ops/net-lines';
import { DrawingTool, samePoint } from './base';
import type { ToolEnv } from './types';

export class NetLineTool extends DrawingTool {
  readonly id = 'netline';
  protected override readonly finishOnDrag = true;
  private start: Point | null = null;
  prompt() {
    return this.start
      ? `Net-section line: end point, across the section (${HINT.nextPoint})`
      : `Net-section line: start point, outside the section (${HINT.firstPoint})`;
  }
  last() {
    return this.start;
  }
  busy() {
    return this.start !== null;
  }
  reset(env: ToolEnv) {
    this.start = null;
    this.draft(env, null);
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    if (!this.start) {
      this.start = p;
      this.draft(env, { chain: [p], markers: [p] });
      return null;
    }
    if (samePoint(p, this.start)) return 'The line needs two different points.';
    const err = addNetLine(env, { from: this.start, to: p });
    if (err) return err;
    this.reset(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    if (this.start) this.draft(env, { chain: [this.start, p], markers: [this.start] });
  }
}
