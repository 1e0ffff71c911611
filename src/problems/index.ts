export { InputError, describeProblem } from './input-problem';
export type { InputProblem } from './input-problem';
export { MAX_LISTED_PROBLEMS, ProblemList } from './problem-list';
