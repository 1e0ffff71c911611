import { InputError } from '../problems';
import { parseAssignRule, type AssignRule } from '../time';

/** How an age range goes to a slice; a random choice draws with the run's seed. */
export type AssignChoice =
  | { readonly kind: 'midpoint' }
  | { readonly kind: 'within' }
  | { readonly kind: 'overlap'; readonly fraction: number }
  | { readonly kind: 'random' };

export const ASSIGN_EXPECTED = 'midpoint, within, overlap:F (0 < F <= 1) or random';

/** Canonical text of an assignment choice: `midpoint`, `overlap:0.5`… */
export function assignText(choice: AssignChoice): string {
  return choice.kind === 'overlap' ? `overlap:${choice.fraction}` : choice.kind;
}

/** The rule the time module applies: the choice with the run's seed. */
export function assignRuleOf(choice: AssignChoice, seed: number): AssignRule {
  return choice.kind === 'random' ? { kind: 'random', seed } : choice;
}

/** The assignment choice a text names, checked as parseAssignRule checks it. */
export function assignChoiceOf(text: string): AssignChoice | { readonly expected: string } {
  let rule: AssignRule;
  try {
    // The seed is a setting of its own, checked on its own: any valid seed will do here.
    rule = parseAssignRule(text, 0);
  } catch (error) {
    if (error instanceof InputError) return { expected: error.problems[0].field === 'overlap' ? error.problems[0].expected : ASSIGN_EXPECTED };
    throw error;
  }
  return rule.kind === 'random' ? { kind: 'random' } : rule;
}
