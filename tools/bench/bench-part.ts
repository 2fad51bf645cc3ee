/** What a benchmark part is given: its own database, and one way to report a figure. */
export interface BenchContext {
  readonly databaseUrl: string;
  /** Prints `bench NAME VALUE UNIT`, the line other tools read. */
  report(name: string, value: number, unit: string): void;
  /** Prints a line for people (progress, tables). */
  log(line: string): void;
}

/** One part of `npm run bench`; each creates its own data and drops it before returning. */
export interface BenchPart {
  readonly name: string;
  run(context: BenchContext): Promise<void>;
}
