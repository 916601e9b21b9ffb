const CHUNK = 16384;

/**
 * Hands out zeroed Float64Array views cut from a few large buffers: one call builds
 * hundreds of small per-node arrays, and a fresh ArrayBuffer for each costs far more.
 */
export class Float64Arena {
  private chunk = new Float64Array(0);
  private used = 0;

  take(length: number): Float64Array {
    if (this.used + length > this.chunk.length) {
      this.chunk = new Float64Array(Math.max(CHUNK, length));
      this.used = 0;
    }
    const view = this.chunk.subarray(this.used, this.used + length);
    this.used += length;
    return view;
  }
}
