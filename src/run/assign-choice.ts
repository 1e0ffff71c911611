import { InputError } from '../problems';
import { ASSIGN_RULE_EXPECTED, parseAssignRule, type AssignRule } from '../time';

/** How an age range goes to a slice; a draw uses the run's seed. */
export type AssignChoice =
  | { readonly kind: 'mid-age' }
  | { readonly kind: 'whole-range' }
  | { readonly kind: 'share'; readonly fraction: number }
  | { readonly kind: 'draw' };

export const ASSIGN_EXPECTED = ASSIGN_RULE_EXPECTED;

/** Canonical text of an assignment choice: `mid-age`, `share:0.5`… */
export function assignText(choice: AssignChoice): string {
  return choice.kind === 'share' ? `share:${choice.fraction}` : choice.kind;
}

/** The rule the time module applies: the choice with the run's seed. */
export function assignRuleOf(choice: AssignChoice, seed: number): AssignRule {
  return choice.kind === 'draw' ? { kind: 'draw', seed } : choice;
}

/** The assignment choice a text names, checked as parseAssignRule checks it. */
export function assignChoiceOf(text: string): AssignChoice | { readonly expected: string } {
  let rule: AssignRule;
  try {
    // The seed is a setting of its own, checked on its own: any valid seed will do here.
    rule = parseAssignRule(text, 0);
  } catch (error) {
    if (error instanceof InputError) return { expected: error.problems[0].field === 'share' ? error.problems[0].expected : ASSIGN_EXPECTED };
    throw error;
  }
  return rule.kind === 'draw' ? { kind: 'draw' } : rule;
}
