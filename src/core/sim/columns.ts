// Growable columns of numbers for a trace, one typed array per column.

export class Columns {
  private cols: Float64Array[];
  private rows = 0;

  constructor(width: number, rows: number) {
    this.cols = Array.from({ length: width }, () => new Float64Array(Math.max(16, rows)));
  }

  /** Makes room for one more row and returns its index. */
  append(): number {
    const first = this.cols[0];
    if (first && this.rows >= first.length) {
      this.cols = this.cols.map((c) => {
        const bigger = new Float64Array(c.length * 2);
        bigger.set(c);
        return bigger;
      });
    }
    return this.rows++;
  }

  /** The column arrays; write row `append()` returned. */
  get columns(): readonly Float64Array[] {
    return this.cols;
  }

  /** Each column cut to the rows written (views, no copy). */
  finish(): Float64Array[] {
    return this.cols.map((c) => c.subarray(0, this.rows));
  }
}
