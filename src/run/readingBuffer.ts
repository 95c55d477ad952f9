/**
 * Readings in columns: time and head temperature in growable Float64Arrays, so they go straight
 * into uPlot (`[t, head]`, AlignedData) without copying. Appends are amortised O(1).
 */
export class ReadingBuffer {
  #timeS: Float64Array;
  #headC: Float64Array;
  #length = 0;

  constructor(initialCapacity = 4096) {
    if (!(initialCapacity >= 1)) throw new RangeError('capacity must be >= 1');
    this.#timeS = new Float64Array(initialCapacity);
    this.#headC = new Float64Array(initialCapacity);
  }

  get length(): number {
    return this.#length;
  }

  /** Appends one reading; NaN head means no valid reading at that time. Times must not go back. */
  append(timeS: number, headC: number): void {
    if (!Number.isFinite(timeS)) throw new RangeError('reading time must be a finite number of seconds');
    const last = this.#length > 0 ? this.#timeS[this.#length - 1]! : -Infinity;
    if (timeS < last) throw new RangeError(`reading at ${timeS} s is earlier than the last one (${last} s)`);
    if (this.#length === this.#timeS.length) this.#grow();
    this.#timeS[this.#length] = timeS;
    this.#headC[this.#length] = headC;
    this.#length += 1;
  }

  /** Views (not copies) of the filled part; valid until the next append that grows the buffer. */
  get timeS(): Float64Array {
    return this.#timeS.subarray(0, this.#length);
  }

  get headC(): Float64Array {
    return this.#headC.subarray(0, this.#length);
  }

  /** The last valid head temperature, or NaN when none. */
  lastValidHeadC(): number {
    for (let i = this.#length - 1; i >= 0; i--) {
      const v = this.#headC[i]!;
      if (!Number.isNaN(v)) return v;
    }
    return Number.NaN;
  }

  /** Index of the first reading at or after timeS (binary search). */
  indexAtOrAfter(timeS: number): number {
    let lo = 0;
    let hi = this.#length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (this.#timeS[mid]! < timeS) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }

  clear(): void {
    this.#length = 0;
  }

  #grow(): void {
    const capacity = this.#timeS.length * 2;
    const t = new Float64Array(capacity);
    const h = new Float64Array(capacity);
    t.set(this.#timeS);
    h.set(this.#headC);
    this.#timeS = t;
    this.#headC = h;
  }
}
