/**
 * Validation helpers shared by the shape kinds and the document: every problem is an Issue with
 * its path in the document (`shapes[2].segments[4].via`), never just the first one.
 */

export interface Issue {
  path: string;
  message: string;
}

export function formatIssue(i: Issue): string {
  return i.path ? `${i.path}: ${i.message}` : i.message;
}

export function isObj(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** A value as a message shows it: numbers plainly, anything else as JSON. */
export function fmtValue(v: unknown): string {
  return typeof v === 'number' ? String(v) : JSON.stringify(v) ?? String(v);
}

/** Checks a [x, y] pair of finite numbers; pushes the issues and says whether it was one. */
export function checkPoint(v: unknown, path: string, out: Issue[]): v is [number, number] {
  if (!Array.isArray(v) || v.length !== 2) {
    out.push({ path, message: `expected a point [x, y], got ${fmtValue(v)}` });
    return false;
  }
  let ok = true;
  v.forEach((c, k) => {
    if (typeof c !== 'number' || !Number.isFinite(c)) {
      out.push({ path: `${path}[${k}]`, message: `coordinate must be a finite number, got ${fmtValue(c)}` });
      ok = false;
    }
  });
  return ok;
}

export function checkNumber(v: unknown, path: string, out: Issue[], opts: { positive?: boolean; optional?: boolean; name: string }): boolean {
  if (v === undefined && opts.optional) return true;
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    out.push({ path, message: `${opts.name} must be a finite number, got ${fmtValue(v)}` });
    return false;
  }
  if (opts.positive && !(v > 0)) {
    out.push({ path, message: `${opts.name} must be greater than 0, got ${v}` });
    return false;
  }
  return true;
}

export const dist = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1]);
