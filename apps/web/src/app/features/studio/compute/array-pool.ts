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

  /** Takes buffers back (detached ones, byteLength 0, are let go, and one already held is not taken twice); past `keep`, the oldest go, so sizes of bars edited long ago do not stay. */
  give(buffers: readonly ArrayBuffer[]): void {
    for (const buffer of buffers) {
      // Held twice, one buffer would back two arrays of one computation, each writing over the other.
      if (buffer.byteLength === 0 || this.free.includes(buffer)) continue;
      this.free.push(buffer);
      if (this.free.length > this.keep) this.free.shift();
    }
  }

  /**
   * An array of `length` as ArrayAllocator gives it (what it holds is written over, not cleared: the
   * engine writes every element): on the smallest buffer handed back that holds it and is at most
   * twice its size, else on new memory with half to spare. A bar's sample count follows its period
   * (a lobe more or less moves it by a few per cent, a lobe count typed from 20 to 29 and back by
   * nearly half), and every miss faults in new pages: with this much room the arrays of a first edit
   * serve the whole range. The spare pages are never touched, so they cost nothing until used.
   */
  readonly allocate = (length: number): Float64Array => {
    const bytes = length * Float64Array.BYTES_PER_ELEMENT;
    let best = -1;
    for (let i = 0; i < this.free.length; i++) {
      const size = this.free[i].byteLength;
      if (size >= bytes && size <= 2 * bytes && (best < 0 || size < this.free[best].byteLength)) best = i;
    }
    if (best >= 0) return new Float64Array(this.free.splice(best, 1)[0], 0, length);
    return new Float64Array(new ArrayBuffer(Math.ceil(length * 1.5) * Float64Array.BYTES_PER_ELEMENT), 0, length);
  };

  get size(): number {
    return this.free.length;
  }
}
