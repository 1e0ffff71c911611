export { InputError, describeProblem } from './input-problem';
export type { InputProblem } from './input-problem';
export { MAX_LISTED_PROBLEMS, ProblemList } from './problem-list';
export type { RowProblem } from './row-problem';
export {
  EXCLUSIONS, EXCLUSION_CODE, EXCLUSION_NAMES, EXCLUSION_STAGE, NOT_EXCLUDED, exclusionName,
} from './exclusions';
export type { ExclusionName, ExclusionStage } from './exclusions';
