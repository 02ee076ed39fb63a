import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { checkSource, exitCodeFor, runCheck, summarise } from './check.js';
import { sourceError, type Source } from './source.js';
import { DEFAULT_COMMAND_LINE_TOLERANCE } from './tolerance.js';
import type { CheckSettings } from './types.js';

const example = (name: string): Source => ({
  file: name,
  text: readFileSync(fileURLToPath(new URL(`../../../schema/examples/${name}`, import.meta.url)), 'utf8'),
});
const settings = (over: Partial<CheckSettings> = {}): CheckSettings => ({
  tolerance: DEFAULT_COMMAND_LINE_TOLERANCE,
  failOn: 'overstated',
  k: 10,
  ...over,
});

describe('runner/check', () => {
  it('checkSource returns results and located findings, keeping no source text', () => {
    const report = checkSource(example('deck-gusset-overstated.json'), {
      command: 'check',
      settings: settings(),
      version: '0.1.0',
    });
    expect(report.status).toBe('checked');
    expect(report.members[0]!.memberId).toBe('G-D2');
    const lg101 = report.members[0]!.findings.find((f) => f.code === 'LG101')!;
    expect([lg101.line, lg101.column]).toEqual([46, 15]);
    expect(JSON.stringify(report)).not.toContain('"format":"ligament-calc"');
  });

  it('an empty source and a read error become invalid file reports', () => {
    const ctx = { command: 'check' as const, settings: settings(), version: '0.1.0' };
    expect(checkSource({ file: 'e.json', text: ' \n' }, ctx).errors[0]!.rule).toBe('empty-file');
    expect(checkSource(sourceError('x.json', 'not-found', 'no such file'), ctx)).toMatchObject({
      status: 'invalid',
      errors: [{ file: 'x.json', rule: 'not-found', pointer: '', line: 1, column: 1 }],
    });
  });

  it('exit code: 2 for any invalid file, else 1 for findings at or above fail-on, else 0', async () => {
    const sources = [example('north-splice-correct.json'), example('deck-gusset-overstated.json')];
    const ctx = (failOn: CheckSettings['failOn']) => ({
      command: 'check' as const,
      settings: settings({ failOn }),
      version: '0.1.0',
    });
    expect((await runCheck(sources, ctx('overstated'))).exitCode).toBe(1);
    expect((await runCheck(sources, ctx('none'))).exitCode).toBe(0);
    expect((await runCheck([...sources, { file: 'bad.json', text: '{' }], ctx('none'))).exitCode).toBe(2);
    expect((await runCheck([], ctx('overstated'))).exitCode).toBe(2);
  });

  it('summarise counts findings by severity and those at or above fail-on', () => {
    const ctx = { command: 'check' as const, settings: settings(), version: '0.1.0' };
    const files = [checkSource(example('lantern-lap-phantom-chain.json'), ctx)];
    const counts = summarise(files, settings());
    const all = files[0]!.members[0]!.findings;
    expect(counts.findings.error).toBe(all.filter((f) => f.severity === 'error').length);
    expect(counts.failing).toBe(counts.findings.error);
    expect(summarise(files, settings({ failOn: 'any' })).failing).toBe(
      counts.findings.error + counts.findings.warning,
    );
    expect(exitCodeFor(counts)).toBe(1);
  });

  it('streams: onFile sees each report as soon as it is made', async () => {
    const seen: string[] = [];
    async function* sources(): AsyncGenerator<Source> {
      yield example('north-splice-correct.json');
      expect(seen).toEqual(['north-splice-correct.json']);
      yield example('deck-tie-slotted-mm.json');
    }
    const outcome = await runCheck(
      sources(),
      { command: 'validate', settings: settings(), version: '0.1.0' },
      (r) => seen.push(r.file),
    );
    expect(outcome.result.files.map((f) => f.status)).toEqual(['valid', 'valid']);
    expect(outcome.exitCode).toBe(0);
  });
});
