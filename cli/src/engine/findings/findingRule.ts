import { EngineError } from '../engineError.js';
import { FINDING_CATALOGUE } from './findingCatalogue.js';
import type { FindingRule } from './types.js';

const BY_CODE = new Map(FINDING_CATALOGUE.map((rule) => [rule.code, rule] as const));

/**
 * The catalogue entry of a finding code.
 *
 * @param code - e.g. `LG121`
 * @returns the rule
 * @throws EngineError for a code the catalogue does not hold
 * @example
 * findingRule('LG121').name // → 'governing-chain-missed'
 */
export function findingRule(code: string): FindingRule {
  const rule = BY_CODE.get(code);
  if (!rule) throw new EngineError('invalid-argument', `unknown finding code ${code}`);
  return rule;
}
