import { copyFileSync, mkdirSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EXAMPLES, run, runBin, tempDir } from './helpers.js';

// One directory holding every kind of bad input next to one good file; the binary must report each
// clearly (file, line:col, rule, pointer), still check the good file, exit 2, and never print a stack.
let dir: { path: string; remove: () => void };

beforeAll(() => {
  dir = tempDir('ligament-bad-');
  const calcs = join(dir.path, 'calcs');
  mkdirSync(join(calcs, 'nested'), { recursive: true });
  copyFileSync(join(EXAMPLES, 'north-splice-correct.json'), join(calcs, 'good.json'));
  writeFileSync(join(calcs, 'malformed.json'), '{ "format": "ligament-calc", "members": [ }\n');
  copyFileSync(join(EXAMPLES, 'invalid', 'wrong-type.json'), join(calcs, 'wrong-type.json'));
  copyFileSync(join(EXAMPLES, 'invalid', 'unknown-unit.json'), join(calcs, 'nested', 'unknown-unit.json'));
  writeFileSync(join(calcs, 'empty.json'), '');
  // 20 MB of whitespace-padded JSON: refused on its size before it is read.
  writeFileSync(
    join(calcs, 'huge.json'),
    '{"format":"ligament-calc","members":[],"pad":"' + 'x'.repeat(20 * 1024 * 1024) + '"}',
  );
  // A directory symlink back to its parent, and a link to itself.
  symlinkSync('..', join(calcs, 'nested', 'loop'));
  symlinkSync('self.json', join(calcs, 'self.json'));
});

afterAll(() => dir.remove());

describe('bad input', () => {
  it('reports every bad file with file, position, rule and pointer, checks the good one, exits 2', () => {
    const r = runBin(['check', 'calcs'], { cwd: dir.path });
    expect(r.exitCode).toBe(2);
    const out = r.stdout;
    expect(out).toMatch(/calcs\/malformed\.json:1:\d+ {2}ERROR {3}json-syntax /);
    expect(out).toMatch(/calcs\/wrong-type\.json:19:20 {2}ERROR {3}type .* {2}\/members\/0\/thickness/);
    expect(out).toMatch(/calcs\/nested\/unknown-unit\.json:12:12 {2}ERROR {3}enum .*"ft".* {2}\/units/);
    expect(out).toMatch(/calcs\/empty\.json:1:1 {2}ERROR {3}empty-file /);
    expect(out).toMatch(
      /calcs\/huge\.json:1:1 {2}ERROR {3}file-too-large the file is 20\.0 MB; calc files over 4\.0 MB are refused/,
    );
    expect(out).toMatch(
      /calcs\/nested\/loop:1:1 {2}ERROR {3}symlink-loop symbolic link leads back to calcs; not followed/,
    );
    expect(out).toMatch(/calcs\/self\.json:1:1 {2}ERROR {3}symlink-loop /);
    // The good file is still checked, with its result.
    expect(out).toContain('SP-N1  splice-plate');
    expect(out).toMatch(/8 files \(7 invalid\), 1 member/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
    expect(out).not.toMatch(/\n\s+at /);
  });

  it('validate reports the same problems and exits 2', () => {
    const r = runBin(['validate', 'calcs', '--format', 'json'], { cwd: dir.path });
    expect(r.exitCode).toBe(2);
    const doc = JSON.parse(r.stdout) as {
      files: { file: string; status: string; errors: { rule: string }[] }[];
    };
    const rules = Object.fromEntries(doc.files.map((f) => [f.file, f.errors.map((e) => e.rule)]));
    expect(rules['calcs/good.json']).toEqual([]);
    expect(rules['calcs/empty.json']).toEqual(['empty-file']);
    expect(rules['calcs/huge.json']).toEqual(['file-too-large']);
    expect(rules['calcs/self.json']).toEqual(['symlink-loop']);
    expect(rules['calcs/nested/loop']).toEqual(['symlink-loop']);
    expect(rules['calcs/malformed.json']![0]).toBe('json-syntax');
    // Non-text formats repeat input errors on stderr for the log.
    expect(r.stderr).toContain('calcs/huge.json:1:1');
  });

  it('a path that does not exist and a glob that matches nothing are reported, exit 2', async () => {
    const r = await run(['check', 'missing.json', 'nothing/*.json'], { cwd: dir.path });
    expect(r.exitCode).toBe(2);
    expect(r.stdout).toMatch(/missing\.json:1:1 {2}ERROR {3}not-found no such file or directory/);
    expect(r.stdout).toMatch(/nothing\/\*\.json:1:1 {2}ERROR {3}not-found the pattern matches no files/);
  });

  it('globs expand to the files they match', async () => {
    const r = await run(['validate', 'calcs/*-type.json', 'calcs/good.json'], { cwd: dir.path });
    expect(r.stdout).toContain('calcs/wrong-type.json');
    expect(r.stdout).toContain('calcs/good.json');
    expect(r.stdout).toMatch(/2 files \(1 invalid\): 1 valid, 1 input error/);
  });

  it('usage errors exit 2 with one line, never a stack trace', () => {
    const unknown = runBin(['check', '--format', 'yaml', 'x.json']);
    expect(unknown.exitCode).toBe(2);
    expect(unknown.stderr).toMatch(
      /argument 'yaml' is invalid\. Allowed choices are text, json, junit, sarif, markdown/,
    );
    const noArgs = runBin(['check']);
    expect(noArgs.exitCode).toBe(2);
    expect(noArgs.stderr).toContain("missing required argument 'path'");
    const badCommand = runBin(['chek']);
    expect(badCommand.exitCode).toBe(2);
    expect(badCommand.stderr).toContain('(Did you mean check?)');
    for (const r of [unknown, noArgs, badCommand]) expect(r.stderr).not.toMatch(/\n\s+at /);
  });
});
