import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXAMPLES, INVALID_EXAMPLES, lineOf, run, tempDir } from './helpers.js';

const ex = (name: string): string => join(EXAMPLES, name);

interface Doc {
  files: {
    file: string;
    status: string;
    members: {
      id: string;
      result: {
        An: number;
        directions: {
          direction: string;
          governing: { holes: string[]; netWidth: number } | null;
          leastChains: unknown[];
        }[];
      };
      findings: { code: string; line: number; column: number; pointer: string; severity: string }[];
    }[];
    errors: { rule: string; pointer: string }[];
  }[];
  summary: { failing: number };
  exitCode: number;
}

async function checkJson(args: string[]): Promise<{ doc: Doc; exitCode: number; stderr: string }> {
  const r = await run(['check', '--format', 'json', ...args]);
  return { doc: JSON.parse(r.stdout) as Doc, exitCode: r.exitCode, stderr: r.stderr };
}

describe('ligament check', () => {
  it('passes a file whose claims are right: exit 0, no findings, the D.9 zigzag governs both ways', async () => {
    const { doc, exitCode } = await checkJson([ex('north-splice-correct.json')]);
    expect(exitCode).toBe(0);
    const member = doc.files[0]!.members[0]!;
    expect(member.id).toBe('SP-N1');
    expect(member.findings).toEqual([]);
    for (const d of member.result.directions) {
      expect(d.governing!.holes).toEqual(['A1', 'B1', 'C1', 'D1']);
      // AISC Design Examples v13.0, Example D.9 (R1): published controlling net width 11.5 in
      // (rounded; 14 − 4(0.875) + 2(2.5²/12) = 11.54).
      expect(d.governing!.netWidth).toBeCloseTo(11.5, 1);
    }
  });

  it('exits 1 on an overstated claim and points LG101 at the claimed An in the file', async () => {
    const path = ex('deck-gusset-overstated.json');
    const { doc, exitCode } = await checkJson([path]);
    expect(exitCode).toBe(1);
    const f = doc.files[0]!.members[0]!.findings.find((x) => x.code === 'LG101')!;
    expect(f.pointer).toBe('/members/0/claims/An');
    expect(f.severity).toBe('error');
    expect(lineOf(path, f.line)).toContain('"An": 3.844');
    expect(lineOf(path, f.line).slice(f.column - 1)).toMatch(/^3\.844/);
  });

  it('text output shows file:line:col, severity, code and pointer for each finding, and the totals', async () => {
    const r = await run(['check', 'schema/examples/deck-gusset-overstated.json']);
    expect(r.exitCode).toBe(1);
    expect(r.stdout).toMatch(
      /schema\/examples\/deck-gusset-overstated\.json:46:15 {2}ERROR {3}LG101 .* {2}\/members\/0\/claims\/An/,
    );
    expect(r.stdout).toContain('P1–P3');
    expect(r.stdout).toMatch(/1 file, 1 member: 6 errors, 0 warnings, 0 notes/);
    expect(r.stdout).toContain('exit 1: 6 findings at or above --fail-on overstated');
    expect(r.stdout).toContain('The engineer of record decides');
  });

  it('--fail-on none exits 0 on findings; --fail-on any exits 1 on warnings alone', async () => {
    expect((await run(['check', '--fail-on', 'none', ex('deck-gusset-overstated.json')])).exitCode).toBe(0);
    // The slotted gusset has no error findings; whether it has warnings is the engine's call, so
    // compare the exit code with the warnings it reports.
    const { doc } = await checkJson([ex('lantern-lap-phantom-chain.json')]);
    const severities = doc.files[0]!.members[0]!.findings.map((f) => f.severity);
    expect(severities).toContain('warning');
    const any = await run(['check', '--fail-on', 'any', ex('lantern-lap-phantom-chain.json')]);
    expect(any.exitCode).toBe(1);
  });

  it('reports the missed governing chain (LG121) and the controlling chain that differs (LG125)', async () => {
    const { doc, exitCode } = await checkJson([ex('south-hanger-missed-chain.json')]);
    expect(exitCode).toBe(1);
    const codes = doc.files[0]!.members[0]!.findings.map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['LG121', 'LG125', 'LG101']));
    expect(doc.files[0]!.members[0]!.result.directions[0]!.governing!.holes).toEqual([
      'H1',
      'H2',
      'H3',
      'H4',
    ]);
  });

  it('reports a claimed chain that cannot form (LG122) with the hole on the loaded side', async () => {
    const r = await run(['check', ex('lantern-lap-phantom-chain.json')]);
    expect(r.exitCode).toBe(1);
    expect(r.stdout).toMatch(/LG122 Claimed controlling chain R1-R2-R3 .* hole L lies on the loaded side/);
  });

  it('--tolerance widens the comparison: 5% clears the 2.5 % overstated An', async () => {
    const strict = await checkJson([ex('deck-gusset-overstated.json')]);
    expect(strict.doc.files[0]!.members[0]!.findings.map((f) => f.code)).toContain('LG101');
    const loose = await checkJson(['--tolerance', '5%', ex('deck-gusset-overstated.json')]);
    expect(loose.doc.files[0]!.members[0]!.findings.map((f) => f.code)).not.toContain('LG101');
  });

  it('--tolerance with an unknown unit is a usage error (exit 2) naming the unit', async () => {
    const r = await run(['check', '--tolerance', '3furlong', ex('north-splice-correct.json')]);
    expect(r.exitCode).toBe(2);
    expect(r.stderr).toContain('unknown unit "furlong"');
    expect(r.stdout).toBe('');
  });

  it('--member limits the run; an id no file holds is exit 2 with a message', async () => {
    const { doc } = await checkJson([
      '--member',
      'SP-N1',
      ex('north-splice-correct.json'),
      ex('deck-gusset-overstated.json'),
    ]);
    expect(doc.files.map((f) => f.members.length)).toEqual([1, 0]);
    expect(doc.exitCode).toBe(0);
    const missing = await run(['check', '--member', 'NOPE', ex('north-splice-correct.json')]);
    expect(missing.exitCode).toBe(2);
    expect(missing.stderr).toContain('no member "NOPE"');
  });

  it('--direction and --k shape the result', async () => {
    const { doc } = await checkJson(['--direction', '+x', '--k', '2', ex('deck-tie-slotted-mm.json')]);
    const dirs = doc.files[0]!.members[0]!.result.directions;
    expect(dirs.map((d) => d.direction)).toEqual(['+x']);
    expect(dirs[0]!.governing!.holes).toEqual(['S3', 'S4']);
    expect(dirs[0]!.leastChains.length).toBeLessThanOrEqual(2);
  });

  it('reads standard input for -', async () => {
    const text = readFileSync(ex('north-splice-correct.json'), 'utf8');
    const r = await run(['check', '-', '--format', 'json'], { stdin: text });
    expect(r.exitCode).toBe(0);
    expect((JSON.parse(r.stdout) as Doc).files[0]!.file).toBe('<stdin>');
  });

  it('--output writes the report to a file and nothing to stdout', async () => {
    const dir = tempDir();
    try {
      const r = await run(
        ['check', ex('north-splice-correct.json'), '--format', 'json', '--output', 'out/report.json'],
        {
          cwd: dir.path,
        },
      );
      expect(r.exitCode).toBe(0);
      expect(r.stdout).toBe('');
      expect(r.stderr).toContain('wrote json report');
      const doc = JSON.parse(readFileSync(join(dir.path, 'out', 'report.json'), 'utf8')) as Doc;
      expect(doc.files[0]!.members[0]!.id).toBe('SP-N1');
    } finally {
      dir.remove();
    }
  });

  it('--output into a directory is exit 2 with one line and leaves no temporary file', async () => {
    const dir = tempDir();
    try {
      const r = await run(['check', ex('north-splice-correct.json'), '--output', '.'], { cwd: dir.path });
      expect(r.exitCode).toBe(2);
      expect(r.stderr).toBe(`ligament: error: cannot write ${dir.path}: it is a directory\n`);
      expect(readdirSync(dir.path)).toEqual([]);
    } finally {
      dir.remove();
    }
  });

  it('colours text only when asked or on a terminal, and honours NO_COLOR', async () => {
    const file = ex('deck-gusset-overstated.json');
    const esc = '\u001b[';
    expect((await run(['check', file])).stdout).not.toContain(esc);
    expect((await run(['check', file, '--color', 'always'])).stdout).toContain(esc);
    expect((await run(['check', file], { tty: true })).stdout).toContain(esc);
    expect((await run(['check', file], { tty: true, env: { NO_COLOR: '1' } })).stdout).not.toContain(esc);
  });

  it('--quiet prints only failing findings and the totals', async () => {
    const r = await run([
      'check',
      '--quiet',
      ex('deck-gusset-overstated.json'),
      ex('north-splice-correct.json'),
    ]);
    const lines = r.stdout.trim().split('\n');
    expect(lines.filter((l) => l.includes(' ERROR ')).length).toBe(6);
    expect(r.stdout).not.toContain('SP-N1');
    expect(lines.at(-1)).toMatch(/^exit 1/);
  });

  it('validate schema/examples/ passes: every example there is valid (the invalid ones live in schema/invalid-examples/)', async () => {
    const r = await run(['validate', 'schema/examples/']);
    expect(r.exitCode, r.stdout).toBe(0);
    expect(r.stdout).not.toMatch(/ERROR/);
  });

  it('checks whole directories, skipping JSON that is not a calc file, and exits 2 for the invalid ones', async () => {
    const { doc, exitCode } = await checkJson([EXAMPLES, INVALID_EXAMPLES]);
    expect(exitCode).toBe(2);
    const names = doc.files.map((f) => f.file);
    expect(names.some((n) => n.endsWith('.expected.json'))).toBe(false);
    const checked = doc.files
      .filter((f) => f.status === 'checked')
      .map((f) => f.file.replace(/^.*\/examples\//, ''));
    expect(checked).toEqual(
      expect.arrayContaining([
        'approach-gusset-slots.json',
        'deck-gusset-overstated.json',
        'deck-tie-slotted-mm.json',
        'lantern-lap-phantom-chain.json',
        'north-splice-correct.json',
        'rail-post-splice-2010-one-inch.json',
        'south-hanger-missed-chain.json',
      ]),
    );
    // Every file under invalid-examples/ is reported as invalid, none as checked.
    const underInvalid = doc.files.filter((f) => f.file.includes('/invalid-examples/'));
    expect(underInvalid.length).toBeGreaterThan(10);
    for (const f of underInvalid) expect(f.status, f.file).toBe('invalid');
    const wrongType = doc.files.find((f) => f.file.endsWith('invalid-examples/wrong-type.json'))!;
    expect(wrongType.errors[0]).toMatchObject({ rule: 'type', pointer: '/members/0/thickness' });
  });
});
