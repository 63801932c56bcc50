/** One line of the benchmark table. Times in ms; a reference figure comes from the same run. */
export interface Row {
  metric: string;
  ours: number;
  unit: string;
  /** The same figure for the reference implementation, when there is one. */
  reference?: number;
  /** What the reference is (shown in the note column). */
  note?: string;
}

/** A benchmark section: files in tests/bench/sections/ export one as `section`. */
export interface BenchSection {
  name: string;
  run(): Promise<Row[]>;
}
