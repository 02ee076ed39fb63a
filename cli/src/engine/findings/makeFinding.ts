import { findingRule } from './findingRule.js';
import type { Finding, Severity } from './types.js';

/** Everything of a finding but what the catalogue supplies; `severity` overrides the default. */
export type FindingDetails = Omit<Finding, 'code' | 'name' | 'class' | 'severity'> & {
  readonly severity?: Severity;
};

/**
 * A finding with its name, class and (default) severity taken from the catalogue.
 *
 * @param code - the finding code
 * @param details - message, pointer and the rest
 * @returns the finding
 * @example
 * makeFinding('LG202', { message: '…', pointer: '/members/0/holes/1' }).severity // → 'warning'
 */
export function makeFinding(code: string, details: FindingDetails): Finding {
  const rule = findingRule(code);
  return {
    code,
    name: rule.name,
    class: rule.class,
    ...details,
    severity: details.severity ?? rule.severity,
  };
}
