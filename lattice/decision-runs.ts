/**
 * The decision map, run-length encoded by row: for every mode and step, the runs of nodes
 * (j from `start` up to the next run's start) that take the same decision (0 = continue,
 * k = the mode's k-th switch). Exercise regions are a few intervals per row, so the map takes
 * memory roughly linear in steps instead of one byte per node; a row with no runs continues
 * everywhere.
 */
export class DecisionRuns {
  starts = new Int32Array(1024);
  choices = new Int32Array(1024);
  length = 0;
  /** [mode·(N+1) + i] → index of the row's first run, and the number of runs in the row. */
  readonly rowFirst: Int32Array;
  readonly rowCount: Int32Array;

  constructor(modeCount: number, width: number) {
    this.rowFirst = new Int32Array(modeCount * width);
    this.rowCount = new Int32Array(modeCount * width);
  }

  push(start: number, choice: number): void {
    if (this.length === this.starts.length) {
      const grow = (a: Int32Array) => {
        const b = new Int32Array(a.length * 2);
        b.set(a);
        return b;
      };
      this.starts = grow(this.starts);
      this.choices = grow(this.choices);
    }
    this.starts[this.length] = start;
    this.choices[this.length] = choice;
    this.length++;
  }

  /** The decision at node j of a row (for the node grid and tests; not used in hot loops). */
  at(row: number, j: number): number {
    const first = this.rowFirst[row]!;
    let choice = 0;
    for (let k = first; k < first + this.rowCount[row]!; k++) {
      if (this.starts[k]! > j) break;
      choice = this.choices[k]!;
    }
    return choice;
  }
}
