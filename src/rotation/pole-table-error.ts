/** One thing wrong with a rotation model, in terms a person can act on. */
export interface PoleTableProblem {
  /** Line in the pole table (the header is line 1); absent for a problem of the model as a whole. */
  readonly line?: number;
  /** The column at fault (`pole_lat`, `relative_to`…), `header`, or `row` for the whole record. */
  readonly field: string;
  /** The value as the user wrote it. */
  readonly value: string;
  /** What was expected instead. */
  readonly expected: string;
}

/** Most problems kept and listed; beyond this only their number is reported. */
export const MAX_LISTED_PROBLEMS = 100;

/** `poles.csv line 4, pole_lat "95": expected a latitude from -90 to 90 degrees` */
export function describePoleTableProblem(source: string, problem: PoleTableProblem): string {
  const where = problem.line === undefined ? `${source}, ` : `${source} line ${problem.line}, `;
  return `${where}${problem.field} "${problem.value}": expected ${problem.expected}`;
}

/** Collects problems, keeping the first MAX_LISTED_PROBLEMS and counting the rest. */
export class ProblemList {
  readonly listed: PoleTableProblem[] = [];
  unlisted = 0;

  add(problem: PoleTableProblem): void {
    if (this.listed.length < MAX_LISTED_PROBLEMS) this.listed.push(problem);
    else this.unlisted++;
  }

  get count(): number {
    return this.listed.length + this.unlisted;
  }

  /** Throws a PoleTableError when anything was found. */
  throwIfAny(source: string): void {
    if (this.count > 0) throw new PoleTableError(source, this.listed, this.unlisted);
  }
}

/** A pole table that cannot be used as a rotation model: every problem found, not only the first. */
export class PoleTableError extends Error {
  readonly source: string;
  readonly problems: readonly PoleTableProblem[];
  /** Problems found beyond those listed. */
  readonly unlisted: number;

  constructor(source: string, problems: readonly PoleTableProblem[], unlisted = 0) {
    const lines = problems.map((p) => describePoleTableProblem(source, p));
    if (unlisted > 0) lines.push(`… and ${unlisted} more problem${unlisted === 1 ? '' : 's'} in ${source}`);
    super(lines.join('\n'));
    this.name = 'PoleTableError';
    this.source = source;
    this.problems = problems;
    this.unlisted = unlisted;
  }
}
