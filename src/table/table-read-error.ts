/**
 * A table that cannot be read at all (empty, not text, no usable header, broken quoting…).
 * Row-level problems never throw: they become RejectedRow entries.
 */
export class TableReadError extends Error {
  /** Line the problem was found on (the header is line 1), when there is one. */
  readonly line: number | undefined;

  constructor(message: string, line?: number) {
    super(message);
    this.name = 'TableReadError';
    this.line = line;
  }
}
