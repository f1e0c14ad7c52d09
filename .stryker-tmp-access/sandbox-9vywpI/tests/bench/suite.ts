// @ts-nocheck
export interface BenchContext {
  /** Progress and table lines for people; silent under --json. */
  log: (line: string) => void;
}

export interface BenchSuite {
  name: string;
  run: (context: BenchContext) => Promise<Record<string, number | string>>;
}
