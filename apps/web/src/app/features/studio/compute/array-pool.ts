/**
 * The buffers the page has handed back, for the engine's output arrays of the next computation
 * (ProfileOptions.allocate). An edit's profile is four arrays of ~0.6 MB, and in Chromium's worker on
 * this machine fresh memory costs milliseconds a megabyte to fault in (four such arrays written: 8–26 ms
 * new, under 1 ms over old ones), so the compute worker writes each edit over the last one's arrays.
 */
export class ArrayPool {
  private readonly free: ArrayBuffer[] = [];

  /** `keep`: buffers held at most (an edit with a companion bar uses eight). */
  constructor(private readonly keep = 16) {}

  /** Takes buffers back (detached ones, byteLength 0, are let go); past `keep`, the oldest go, so sizes of bars edited long ago do not stay. */
  give(buffers: readonly ArrayBuffer[]): void {
    for (const buffer of buffers) {
      if (buffer.byteLength === 0) continue;
      this.free.push(buffer);
      if (this.free.length > this.keep) this.free.shift();
    }
  }

  /**
   * A zero-filled array of `length`: on a buffer handed back that holds it with under a quarter to
   * spare, else on new memory with an eighth to spare (a bar's sample count moves a little from edit to
   * edit; the spare pages are never touched, so they cost nothing until used).
   */
  readonly allocate = (length: number): Float64Array => {
    const bytes = length * Float64Array.BYTES_PER_ELEMENT;
    const i = this.free.findIndex((b) => b.byteLength >= bytes && b.byteLength <= bytes * 1.25);
    if (i >= 0) return new Float64Array(this.free.splice(i, 1)[0], 0, length).fill(0);
    return new Float64Array(new ArrayBuffer(Math.ceil(length * 1.125) * Float64Array.BYTES_PER_ELEMENT), 0, length);
  };

  get size(): number {
    return this.free.length;
  }
}
