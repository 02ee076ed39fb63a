import { execFile, execFileSync, spawn } from 'node:child_process';
import { closeSync, copyFileSync, mkdirSync, openSync, symlinkSync, writeFileSync } from 'node:fs';
import { createServer, type Socket } from 'node:net';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BIN, EXAMPLES, INVALID_EXAMPLES, run, runBin, tempDir } from './helpers.js';

// One directory holding every kind of bad input next to one good file; the binary must report each
// clearly (file, line:col, rule, pointer), still check the good file, exit 2, and never print a stack.
let dir: { path: string; remove: () => void };

beforeAll(() => {
  dir = tempDir('ligament-bad-');
  const calcs = join(dir.path, 'calcs');
  mkdirSync(join(calcs, 'nested'), { recursive: true });
  copyFileSync(join(EXAMPLES, 'north-splice-correct.json'), join(calcs, 'good.json'));
  writeFileSync(join(calcs, 'malformed.json'), '{ "format": "ligament-calc", "members": [ }\n');
  copyFileSync(join(INVALID_EXAMPLES, 'wrong-type.json'), join(calcs, 'wrong-type.json'));
  copyFileSync(join(INVALID_EXAMPLES, 'unknown-unit.json'), join(calcs, 'nested', 'unknown-unit.json'));
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

/** Runs the built binary without blocking this process (a server in this process must answer). */
function runBinAsync(
  args: readonly string[],
  cwd: string,
): Promise<{ stdout: string; stderr: string; exitCode: number }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd, encoding: 'utf8' }, (err, stdout, stderr) => {
      const code = err ? (typeof err.code === 'number' ? err.code : -1) : 0;
      resolve({ stdout, stderr, exitCode: code });
    });
  });
}

describe('input that never ends or never comes', () => {
  it('refuses a FIFO named on the command line or found in a folder, without opening it for long', () => {
    const fifoDir = join(dir.path, 'fifo');
    mkdirSync(fifoDir);
    execFileSync('mkfifo', [join(fifoDir, 'pipe.json')]);
    copyFileSync(join(EXAMPLES, 'north-splice-correct.json'), join(fifoDir, 'good.json'));
    // No writer ever opens the FIFO: a blocking open or read would hang here.
    const named = runBin(['check', 'fifo/pipe.json'], { cwd: dir.path });
    expect(named.exitCode).toBe(2);
    expect(named.stdout).toMatch(
      /fifo\/pipe\.json:1:1 {2}ERROR {3}not-a-file is a named pipe \(FIFO\), not a regular file/,
    );
    const walked = runBin(['validate', 'fifo'], { cwd: dir.path });
    expect(walked.exitCode).toBe(2);
    expect(walked.stdout).toMatch(/fifo\/pipe\.json:1:1 {2}ERROR {3}not-a-file /);
    expect(walked.stdout).toContain('fifo/good.json');
  });

  it('refuses /dev/zero named as a file (a character device that never ends)', () => {
    const r = runBin(['validate', '/dev/zero']);
    expect(r.exitCode).toBe(2);
    expect(r.stdout).toMatch(
      /\/dev\/zero:1:1 {2}ERROR {3}not-a-file is a character device, not a regular file/,
    );
  });

  it('stops reading standard input at the size cap: ligament check - < /dev/zero exits 2', async () => {
    const zero = openSync('/dev/zero', 'r');
    try {
      const child = spawn(process.execPath, [BIN, 'check', '-'], { stdio: [zero, 'pipe', 'pipe'] });
      let stdout = '';
      if (!child.stdout) throw new Error('no stdout pipe');
      child.stdout.setEncoding('utf8').on('data', (s: string) => (stdout += s));
      const code = await new Promise<number | null>((resolve) => child.on('close', resolve));
      expect(code).toBe(2);
      expect(stdout).toMatch(
        /<stdin>:1:1 {2}ERROR {3}file-too-large standard input holds more than 4\.0 MB; calc files over 4\.0 MB are refused/,
      );
    } finally {
      closeSync(zero);
    }
  });

  it('submit gives up on a server that accepts the connection and never answers: exit 2 after --timeout', async () => {
    const sockets: Socket[] = [];
    const server = createServer((socket) => void sockets.push(socket));
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as { port: number };
    copyFileSync(join(EXAMPLES, 'north-splice-correct.json'), join(dir.path, 'submit.json'));
    try {
      const r = await runBinAsync(
        [
          'submit',
          '--server',
          `http://127.0.0.1:${port}`,
          '--token',
          'lgt_x',
          '--project',
          '1',
          '--timeout',
          '300ms',
          'submit.json',
        ],
        dir.path,
      );
      expect(r.exitCode).toBe(2);
      expect(r.stderr).toContain(
        `ligament submit: no answer from http://127.0.0.1:${port}/ within 300 ms (--timeout)`,
      );
      expect(sockets.length).toBeGreaterThan(0);
    } finally {
      for (const s of sockets) s.destroy();
      await new Promise((resolve) => server.close(resolve));
    }
  });

  it('submit exits 2 with the cause when the server cannot be reached', async () => {
    // A port that was just free: nothing listens on it.
    const probe = createServer();
    await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
    const { port } = probe.address() as { port: number };
    await new Promise((resolve) => probe.close(resolve));
    const r = await runBinAsync(
      ['submit', '--server', `http://127.0.0.1:${port}`, '--token', 'lgt_x', '--project', '1', 'submit.json'],
      dir.path,
    );
    expect(r.exitCode).toBe(2);
    expect(r.stderr).toMatch(/ligament submit: cannot reach http:\/\/127\.0\.0\.1:\d+\/: .*ECONNREFUSED/);
  });

  it('--timeout takes a duration and refuses anything else (usage, exit 2)', async () => {
    const r = await run([
      'submit',
      '--server',
      'http://127.0.0.1:1',
      '--token',
      't',
      '--project',
      '1',
      '--timeout',
      'soon',
      'x.json',
    ]);
    expect(r.exitCode).toBe(2);
    expect(r.stderr).toContain('expected a duration such as 60s, 500ms or 2m');
  });
});
