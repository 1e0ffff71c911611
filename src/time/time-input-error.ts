/** One thing wrong with a time-scale input, in terms a person can act on. */
export interface TimeInputProblem {
  /** Line in the source file (the header is line 1); absent for a command-line option. */
  readonly line?: number;
  /** The field or option at fault: `base_ma`, `name`, `equal`, `overlap`… */
  readonly field: string;
  /** The value as the user wrote it. */
  readonly value: string;
  /** What was expected instead. */
  readonly expected: string;
}

/** Describes one problem as a sentence: `line 4, base_ma "abc": expected a number in Ma`. */
export function describeProblem(problem: TimeInputProblem): string {
  const where = problem.line === undefined ? '' : `line ${problem.line}, `;
  return `${where}${problem.field} "${problem.value}": expected ${problem.expected}`;
}

/** Bad time-scale input: every problem found, not only the first. */
export class TimeInputError extends Error {
  readonly problems: readonly TimeInputProblem[];

  constructor(problems: readonly TimeInputProblem[]) {
    super(problems.map(describeProblem).join('\n'));
    this.name = 'TimeInputError';
    this.problems = problems;
  }
}
