import { InputError, type InputProblem } from './input-problem';

/** Most problems kept and listed; beyond this only their number is reported. */
export const MAX_LISTED_PROBLEMS = 100;

/** Collects the problems of one input, keeping the first MAX_LISTED_PROBLEMS and counting the rest. */
export class ProblemList {
  readonly listed: InputProblem[] = [];
  unlisted = 0;

  add(problem: InputProblem): void {
    if (this.listed.length < MAX_LISTED_PROBLEMS) this.listed.push(problem);
    else this.unlisted++;
  }

  get count(): number {
    return this.listed.length + this.unlisted;
  }

  /** Throws an InputError naming `source` when anything was found. */
  throwIfAny(source?: string): void {
    if (this.count > 0) throw new InputError(this.listed, { source, unlisted: this.unlisted });
  }
}
