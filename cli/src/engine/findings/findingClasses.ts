import type { FindingClass, Severity } from './types.js';

/**
 * The finding classes in the order a checker reads them (cli/docs/method.md §8): what overstates the
 * member first, what understates it, then the chain classes, the equal-share rule, detailing and the
 * file itself. Summaries, filters and charts of the CLI, the API and the web app list classes in this
 * order. (A member's own findings are listed by orderFindings, input first.)
 */
export const FINDING_CLASSES: readonly FindingClass[] = [
  'overstated',
  'understated',
  'missed-chain',
  'phantom-chain',
  'chain-width',
  'equal-share',
  'detailing',
  'input',
];

/** Severities, worst first. */
export const SEVERITIES: readonly Severity[] = ['error', 'warning', 'note'];
