/** Shape ids: a fresh one for a new shape, never one already in use. */

/** The first `s<k>` not in `used`, counting from the number of ids in use (`s1`, `s2`, ...). */
export function newShapeId(used: ReadonlySet<string>): string {
  for (let k = used.size + 1; ; k++) {
    const id = `s${k}`;
    if (!used.has(id)) return id;
  }
}
