/**
 * The two ways a torsion run ends without a result, kept apart so the caller can tell them from
 * each other and from a bug: `TorsionError` says what is wrong with the input (and where), and
 * `TorsionCancelled` says that the caller asked to stop.
 */

/** The section cannot be meshed or solved as given; the message names the problem and its place. */
export class TorsionError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'TorsionError';
  }
}

/** Thrown when the caller's cancellation check returned true; nothing is half-written. */
export class TorsionCancelled extends Error {
  constructor() {
    super('torsion analysis cancelled');
    this.name = 'TorsionCancelled';
  }
}

/** True for the cancellation error (also after it crossed a worker boundary as a plain object). */
export function isTorsionCancelled(e: unknown): boolean {
  return e instanceof TorsionCancelled || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'TorsionCancelled');
}

/** A point for messages, in the caller's coordinates, rounded for reading. */
export function placeText(x: number, y: number): string {
  const r = (v: number) => String(Number(v.toPrecision(6)));
  return `(${r(x)}, ${r(y)})`;
}
