import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCheck } from '../runner/check.js';
import type { Source } from '../runner/source.js';
import { DEFAULT_COMMAND_LINE_TOLERANCE } from '../runner/tolerance.js';
import type { FailOn } from '../runner/types.js';
import { formatMarkdown } from './markdown.js';

const example = (name: string): Source => ({
  file: `schema/examples/${name}`,
  text: readFileSync(fileURLToPath(new URL(`../../../schema/examples/${name}`, import.meta.url)), 'utf8'),
});

async function heading(names: readonly string[], failOn: FailOn, command: 'check' | 'validate' = 'check') {
  const sources = names.map((n) => (n.startsWith('{') ? { file: 'broken.json', text: n } : example(n)));
  const { result } = await runCheck(sources, {
    command,
    settings: { tolerance: DEFAULT_COMMAND_LINE_TOLERANCE, failOn, k: 10 },
    version: '0.1.0',
  });
  return formatMarkdown(result).split('\n')[0];
}

// Issue 12.4: the heading said "passed" over a list of errors. The counts are those the text report
// prints for each schema example (deck-gusset-overstated: six overstated claims; south-hanger-missed-
// chain: five errors and a warning; lantern-brace-angle: one warning and one note; lantern-hanger-wt:
// two notes); what is checked here is that the heading says them and the --fail-on level.
describe('formatMarkdown heading follows the findings and --fail-on', () => {
  it('names the failing findings and the --fail-on level when the run exits 1', async () => {
    expect(await heading(['deck-gusset-overstated.json'], 'overstated')).toBe(
      '## Ligament check: 6 findings to resolve (--fail-on overstated)',
    );
    expect(await heading(['lantern-brace-angle.json'], 'any')).toBe(
      '## Ligament check: 1 finding to resolve (--fail-on any)',
    );
  });

  it('never says "passed" over errors let through by --fail-on none', async () => {
    expect(await heading(['deck-gusset-overstated.json'], 'none')).toBe(
      '## Ligament check: 6 errors, not failing (--fail-on none)',
    );
    expect(await heading(['south-hanger-missed-chain.json'], 'none')).toBe(
      '## Ligament check: 5 errors and 1 warning, not failing (--fail-on none)',
    );
  });

  it('says passed, with the warnings or notes that remain, when nothing is at or above --fail-on', async () => {
    expect(await heading(['lantern-brace-angle.json'], 'overstated')).toBe(
      '## Ligament check: passed with 1 warning',
    );
    expect(await heading(['lantern-hanger-wt.json'], 'any')).toBe('## Ligament check: passed with 2 notes');
    expect(await heading(['north-splice-correct.json'], 'any')).toBe('## Ligament check: passed');
  });

  it('says a file could not be checked when one is invalid, whatever --fail-on', async () => {
    expect(await heading(['north-splice-correct.json', '{'], 'none')).toBe(
      '## Ligament check: could not check every file',
    );
    expect(await heading(['north-splice-correct.json'], 'overstated', 'validate')).toBe(
      '## Ligament validate: every file valid',
    );
  });
});
