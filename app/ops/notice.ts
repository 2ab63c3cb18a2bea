/** The editor's notice bar: one message that needs reading, with its detail lines. */
import type { CommandContext } from '../commands/registry';

export function notify(ctx: CommandContext, kind: 'error' | 'info', title: string, lines: string[] = []): void {
  ctx.store.setState({ notice: { kind, title, lines } });
}
