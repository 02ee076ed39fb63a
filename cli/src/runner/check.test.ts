import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { checkSource, exitCodeFor, runCheck, summarise } from './check.js';
import { sourceError, type Source } from './source.js';
import { DEFAULT_COMMAND_LINE_TOLERANCE } from './tolerance.js';
import type { Severity } from '../engine/findings/types.js';
import type { CheckSettings, FileReport, MemberReport } from './types.js';

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
    // Two checked files with 2 errors, 1 warning and 3 notes over three members, one invalid file with
    // two input errors: counts written out by hand.
    const member = (...severities: Severity[]) =>
      ({ memberId: 'M', findings: severities.map((severity) => ({ severity })) }) as unknown as MemberReport;
    const checked = (...members: MemberReport[]): FileReport => ({
      file: 'a.json',
      status: 'checked',
      errors: [],
      members,
      memberCount: members.length,
    });
    const error = { file: 'bad.json', pointer: '', line: 1, column: 1, rule: 'json-syntax', message: 'x' };
    const files: FileReport[] = [
      checked(member('error', 'note'), member('warning', 'note')),
      checked(member('error', 'note')),
    ];
    const invalid: FileReport = {
      file: 'bad.json',
      status: 'invalid',
      errors: [error, error],
      members: [],
      memberCount: 0,
    };
    const all = [...files, invalid];
    expect(summarise(all, settings())).toEqual({
      files: 3,
      invalidFiles: 1,
      members: 3,
      findings: { error: 2, warning: 1, note: 3 },
      failing: 2,
      inputErrors: 2,
    });
    expect(summarise(all, settings({ failOn: 'any' })).failing).toBe(3);
    expect(summarise(all, settings({ failOn: 'none' })).failing).toBe(0);
    expect(exitCodeFor(summarise(all, settings()))).toBe(2);
    expect(exitCodeFor(summarise(files, settings()))).toBe(1);
    expect(exitCodeFor(summarise([checked(member('warning', 'note'))], settings()))).toBe(0);
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
