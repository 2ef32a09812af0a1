/**
 * All residuals of one evaluation in flat typed arrays, filled by residuals.ts and read by the
 * sinks in tight monomorphic loops (much faster than a callback per residual). Grows as needed and
 * is reused across evaluations of one fit.
 */
export class ResidualBuffer {
  size = 0;
  constructor(capacity = 1024) {
    this.allocate(Math.max(16, capacity));
  }

  private allocate(cap: number): void {
    this.owner = new Int32Array(cap);
    this.other = new Int32Array(cap);
    this.driver = new Int32Array(cap);
    this.entry = new Int32Array(cap);
    this.knot = new Int32Array(cap);
    this.r = new Float64Array(cap);
    this.w = new Float64Array(cap);
    this.g = new Float64Array(cap);
    this.bin = new Float64Array(cap);
    this.lam = new Float64Array(cap);
  }

  owner = new Int32Array(0);
  other = new Int32Array(0);
  driver = new Int32Array(0);
  entry = new Int32Array(0);
  knot = new Int32Array(0);
  r = new Float64Array(0);
  w = new Float64Array(0);
  g = new Float64Array(0);
  bin = new Float64Array(0);
  lam = new Float64Array(0);

  reset(): void {
    this.size = 0;
  }

  reserve(extra: number): void {
    const need = this.size + extra;
    if (need <= this.r.length) return;
    let cap = this.r.length;
    while (cap < need) cap *= 2;
    const grow = <T extends Int32Array | Float64Array>(a: T): T => {
      const b = new (a.constructor as { new (n: number): T })(cap);
      b.set(a.subarray(0, this.size));
      return b;
    };
    this.owner = grow(this.owner);
    this.other = grow(this.other);
    this.driver = grow(this.driver);
    this.entry = grow(this.entry);
    this.knot = grow(this.knot);
    this.r = grow(this.r);
    this.w = grow(this.w);
    this.g = grow(this.g);
    this.bin = grow(this.bin);
    this.lam = grow(this.lam);
  }
}
