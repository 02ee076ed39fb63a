import { execFileSync, spawn } from 'node:child_process';
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { createServer, type Server } from 'node:http';
import { delimiter, join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CLI_ROOT, EXAMPLES, REPO_ROOT, tempDir } from './helpers.js';

// Every command the two READMEs show in a code block is run here as written, with bash, in the
// place it is meant for: the clone (a sandbox linking the clone's node_modules and schema/, so
// output files land outside the repository) or a calc repository holding the packed tarball in
// tools/. Only the server address of `submit` is swapped for a local stand-in of the service.

interface Documented {
  readonly readme: string;
  readonly command: string;
}

/** The shell commands of a README: lines of ```sh blocks, `run:` steps and `script:` items of ```yaml blocks. */
function documentedCommands(readme: string): Documented[] {
  const text = readFileSync(join(REPO_ROOT, readme), 'utf8');
  const out: Documented[] = [];
  for (const block of text.matchAll(/^```(sh|yaml)\n([\s\S]*?)^```/gm)) {
    const [, lang, body] = block;
    for (const raw of body!.split('\n')) {
      let command: string | undefined;
      if (lang === 'sh') command = raw.replace(/\s+#.*$/, '').trim();
      else command = /^\s*-\s+(?:run:\s+)?((?:npm|npx|ligament)\s.*)$/.exec(raw)?.[1]?.trim();
      if (command) out.push({ readme, command });
    }
  }
  return out;
}

const DOCUMENTED = [...documentedCommands('README.md'), ...documentedCommands('cli/README.md')];

/**
 * Commands not run here, each with the reason. The first install and the build are what CI runs
 * before these tests (.ci/run: npm ci, then npm test builds); `npm start` serves until stopped.
 */
const NOT_RUN: Readonly<Record<string, string>> = {
  'npm install && npm start': 'starts the service and never ends; the api and browser tests cover it',
  'npm install && npm test': 'what CI runs around this test',
  'npm install': 'done by CI before these tests',
  'npm run build -w cli': 'done by npm test before these tests',
};

const PACK = 'npm run build -w cli && npm pack -w cli';
const TARBALL = 'ligament-0.1.0.tgz';

let clone: { path: string; remove: () => void };
let calcRepo: { path: string; remove: () => void };
let server: Server;
let serverUrl = '';
const uploads: { auth: string | undefined; files: number }[] = [];

/** PATH without any node_modules/.bin (npm test puts the clone's first), so only what a README installs is found. */
function cleanPath(first: string): string {
  const rest = (process.env['PATH'] ?? '').split(delimiter).filter((p) => !p.includes('node_modules'));
  return [first, ...rest].join(delimiter);
}

/** The parent's proxy and certificate settings: without them npm cannot reach the registry on some networks. */
function networkEnv(): Record<string, string> {
  const keep =
    /^(https?_proxy|no_proxy|node_extra_ca_certs|ssl_cert_file|ssl_cert_dir|npm_config_(cafile|registry|https?_proxy|noproxy|strict_ssl))$/i;
  return Object.fromEntries(
    Object.entries(process.env).filter((e): e is [string, string] => keep.test(e[0]) && e[1] !== undefined),
  );
}

function sh(command: string, cwd: string, env: Record<string, string>) {
  return new Promise<{ code: number | null; stdout: string; stderr: string }>((resolve) => {
    // A command that hangs fails with its output instead of holding the run (not a timed assertion).
    const child = spawn('bash', ['-c', command], {
      cwd,
      env,
      stdio: ['ignore', 'pipe', 'pipe'],
      timeout: 120_000,
    });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (s: string) => (stdout += s));
    child.stderr.setEncoding('utf8').on('data', (s: string) => (stderr += s));
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

beforeAll(async () => {
  clone = tempDir('ligament-readme-clone-');
  symlinkSync(join(REPO_ROOT, 'node_modules'), join(clone.path, 'node_modules'));
  symlinkSync(join(REPO_ROOT, 'schema'), join(clone.path, 'schema'));
  writeFileSync(join(clone.path, 'package.json'), '{ "private": true }\n');

  calcRepo = tempDir('ligament-readme-calcs-');
  mkdirSync(join(calcRepo.path, 'tools'));
  mkdirSync(join(calcRepo.path, 'calcs'));
  for (const name of ['north-splice-correct.json', 'deck-gusset-overstated.json'])
    copyFileSync(join(EXAMPLES, name), join(calcRepo.path, 'calcs', name));
  writeFileSync(join(calcRepo.path, 'package.json'), '{ "name": "calcs", "private": true }\n');

  // A stand-in for the audit service: answers an upload as the service does (201 and a summary).
  server = createServer((req, res) => {
    let body = '';
    req.setEncoding('latin1').on('data', (s: string) => (body += s));
    req.on('end', () => {
      uploads.push({ auth: req.headers.authorization, files: body.split('name="files"').length - 1 });
      res.writeHead(201, { 'content-type': 'application/json' });
      res.end(
        JSON.stringify({
          submittalId: 3,
          projectId: 1,
          title: 'from the README',
          revisionOfId: null,
          engineVersion: '0.1.0',
          webPath: '/submittals/3',
          webUrl: `${serverUrl}/submittals/3`,
          summary: {
            files: 2,
            members: 2,
            findings: 0,
            bySeverity: { error: 0, warning: 0, note: 0 },
            byClass: {},
            worst: null,
          },
        }),
      );
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  serverUrl = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
});

afterAll(async () => {
  clone?.remove();
  calcRepo?.remove();
  await new Promise((resolve) => server?.close(resolve));
});

describe('the commands in README.md and cli/README.md', () => {
  it('finds the documented commands (the extraction itself works)', () => {
    const commands = DOCUMENTED.map((d) => d.command);
    expect(commands).toContain('npx ligament validate schema/examples/');
    expect(commands).toContain('npm install --global ./tools/ligament-0.1.0.tgz');
    expect(commands).toContain(PACK);
    expect(commands.filter((c) => c.startsWith('ligament submit')).length).toBeGreaterThanOrEqual(2);
  });

  it(
    'runs every one as written, in the clone or in a calc repository with the tarball',
    { timeout: 300_000 },
    async () => {
      const prefix = join(calcRepo.path, '.global');
      const env = {
        PATH: cleanPath(join(prefix, 'bin')),
        HOME: process.env['HOME'] ?? calcRepo.path,
        // How this machine reaches the registry (a proxy, its certificate authority) stays as it is.
        ...networkEnv(),
        npm_config_prefix: prefix,
        // The tarball's dependencies come from the npm cache where it has them, else the registry.
        npm_config_prefer_offline: 'true',
        npm_config_audit: 'false',
        npm_config_fund: 'false',
        npm_config_update_notifier: 'false',
        npm_config_loglevel: 'error',
        LIGAMENT_TOKEN: 'lgt_from_the_ci_secret',
      };
      // The tarball first: the calc repository's commands install it.
      expect(DOCUMENTED.some((d) => d.command === PACK)).toBe(true);
      const packed = execFileSync(
        'npm',
        ['pack', '-w', 'cli', '--pack-destination', join(calcRepo.path, 'tools')],
        {
          cwd: REPO_ROOT,
          encoding: 'utf8',
          env: { ...process.env, npm_config_loglevel: 'error' },
        },
      );
      expect(packed.trim().split('\n').at(-1)).toBe(TARBALL);

      // Commands that install come before those that use what they install, in each README's order.
      const ordered = [...DOCUMENTED].sort(
        (a, b) => Number(!a.command.startsWith('npm install')) - Number(!b.command.startsWith('npm install')),
      );
      const ran: string[] = [];
      for (const { readme, command } of ordered) {
        if (command in NOT_RUN || command === PACK) continue;
        // A command both READMEs show (the install, the SARIF step) is run once.
        if (ran.includes(command)) continue;
        const inClone = command.includes('schema/examples/');
        const cwd = inClone ? clone.path : calcRepo.path;
        const written = command.replace('https://review.example.test', serverUrl);
        const r = await sh(written, cwd, env);
        const checks = / check /.test(command) && !command.includes('--fail-on none');
        // The calc repository and the examples both hold a file that overstates its claims.
        const expected = checks ? 1 : 0;
        expect(r.code, `${readme}: ${command}\n${r.stdout.slice(0, 2000)}\n${r.stderr}`).toBe(expected);
        const output = /(?:-o|--output|>)\s+(\S+)$/.exec(command)?.[1];
        if (output)
          expect(statSync(join(cwd, output)).size, `${command} writes ${output}`).toBeGreaterThan(0);
        ran.push(command);
      }
      expect(ran.length).toBeGreaterThanOrEqual(9);
      // The global install put the command where a CI runner finds it; the project install for npx.
      expect(existsSync(join(prefix, 'bin', 'ligament'))).toBe(true);
      expect(readdirSync(join(calcRepo.path, 'node_modules'))).toContain('ligament');
      // The submit command reached the service with the token from the environment and both calc files.
      expect(uploads).toHaveLength(1);
      for (const u of uploads) expect(u).toEqual({ auth: 'Bearer lgt_from_the_ci_secret', files: 2 });
    },
  );
});

describe('the committed bin launcher', () => {
  it('is what package.json links, and says to build when dist/ is missing (exit 2)', () => {
    const pkg = JSON.parse(readFileSync(join(CLI_ROOT, 'package.json'), 'utf8')) as {
      bin: Record<string, string>;
      files: string[];
    };
    expect(pkg.bin).toEqual({ ligament: 'bin/ligament.js' });
    expect(pkg.files).toContain('bin');
    expect(statSync(join(CLI_ROOT, 'bin', 'ligament.js')).mode & 0o111).not.toBe(0);
    // A copy of the launcher with no dist/ beside it, as in a fresh clone before the build.
    const fresh = tempDir('ligament-fresh-');
    try {
      mkdirSync(join(fresh.path, 'bin'));
      copyFileSync(join(CLI_ROOT, 'bin', 'ligament.js'), join(fresh.path, 'bin', 'ligament.js'));
      writeFileSync(join(fresh.path, 'package.json'), '{ "type": "module" }\n');
      let code = 0;
      let stderr = '';
      try {
        execFileSync(process.execPath, [join(fresh.path, 'bin', 'ligament.js'), '--help'], {
          encoding: 'utf8',
          stdio: 'pipe',
        });
      } catch (err) {
        const e = err as { status: number; stderr: string };
        code = e.status;
        stderr = e.stderr;
      }
      expect(code).toBe(2);
      expect(stderr).toContain('run npm run build');
    } finally {
      fresh.remove();
    }
  });
});
