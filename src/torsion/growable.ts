/**
 * Typed arrays that grow by doubling, for the mesher's point and edge lists (which gain entries
 * every refinement round). `data` may be longer than `length`; read only the first `length`.
 */
export class F64List {
  data: Float64Array;
  length = 0;
  constructor(capacity = 64) {
    this.data = new Float64Array(Math.max(4, capacity));
  }
  push(v: number): number {
    if (this.length === this.data.length) {
      const d = new Float64Array(this.data.length * 2);
      d.set(this.data);
      this.data = d;
    }
    this.data[this.length] = v;
    return this.length++;
  }
  view(): Float64Array {
    return this.data.subarray(0, this.length);
  }
}

export class I32List {
  data: Int32Array;
  length = 0;
  constructor(capacity = 64) {
    this.data = new Int32Array(Math.max(4, capacity));
  }
  push(v: number): number {
    if (this.length === this.data.length) {
      const d = new Int32Array(this.data.length * 2);
      d.set(this.data);
      this.data = d;
    }
    this.data[this.length] = v;
    return this.length++;
  }
  view(): Int32Array {
    return this.data.subarray(0, this.length);
  }
}
