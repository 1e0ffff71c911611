/** One thing wrong with an input, in terms a person can act on: where, which field, what, and what was expected. */
export interface InputProblem {
  /** Line in the source file (the header is line 1); absent for an option, a setting or the file as a whole. */
  readonly line?: number;
  /** The field, column, option or setting at fault: `base_ma`, `pole_lat`, `settings.rotateAt`, `--seed`… */
  readonly field: string;
  /** The value as the user wrote it. */
  readonly value: string;
  /** What was expected instead. */
  readonly expected: string;
}

/**
 * One problem as a sentence: `poles.csv line 4, pole_lat "95": expected a latitude from -90 to 90
 * degrees`. Without a source or line the sentence starts at the field.
 */
export function describeProblem(problem: InputProblem, source?: string): string {
  const where = [source, problem.line === undefined ? undefined : `line ${problem.line}`].filter((part) => part !== undefined).join(' ');
  return `${where === '' ? '' : `${where}, `}${problem.field} "${problem.value}": expected ${problem.expected}`;
}

/** An input that cannot be used: every problem found (up to a limit), not only the first. */
export class InputError extends Error {
  /** The file, option set or message the problems are in, when known. */
  readonly source: string | undefined;
  readonly problems: readonly InputProblem[];
  /** Problems found beyond those listed. */
  readonly unlisted: number;

  constructor(problems: readonly InputProblem[], options: { readonly source?: string; readonly unlisted?: number } = {}) {
    const unlisted = options.unlisted ?? 0;
    const lines = problems.map((p) => describeProblem(p, options.source));
    if (unlisted > 0) lines.push(`… and ${unlisted} more problem${unlisted === 1 ? '' : 's'}${options.source === undefined ? '' : ` in ${options.source}`}`);
    super(lines.join('\n'));
    this.name = 'InputError';
    this.source = options.source;
    this.problems = problems;
    this.unlisted = unlisted;
  }
}
