import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CLI_ROOT, EXAMPLES, tempDir } from './helpers.js';

// The packed tarball must install globally and run with Node alone: compiled JS with its shebang,
// the schemas bundled, only runtime dependencies. Installs from the npm cache where it has the
// packages (npm ci leaves their tarballs there, not their registry metadata), else the registry.
const dir = tempDir('ligament-pack-');
afterAll(() => dir.remove());

const npm = (args: string[], cwd: string): string =>
  execFileSync('npm', args, { cwd, encoding: 'utf8', env: { ...process.env, npm_config_loglevel: 'error' } });

describe('npm pack', () => {
  it(
    'installs globally from the tarball and runs ligament --version, check and schema',
    { timeout: 180_000 },
    () => {
      const packed = npm(['pack', '--pack-destination', dir.path, '--json'], CLI_ROOT);
      const [{ filename, files }] = JSON.parse(packed) as [{ filename: string; files: { path: string }[] }];
      const paths = files.map((f) => f.path);
      expect(paths).toContain('dist/cli.js');
      // The bin is the committed launcher, which loads dist/cli.js.
      expect(paths).toContain('bin/ligament.js');
      expect(paths).toContain('schema/calc.schema.json');
      expect(paths).toContain('schema/result.schema.json');
      expect(paths).toContain('README.md');
      expect(paths.some((p) => p.startsWith('src/') || p.startsWith('test/'))).toBe(false);

      const prefix = join(dir.path, 'prefix');
      npm(
        [
          'install',
          '-g',
          '--prefix',
          prefix,
          '--prefer-offline',
          '--no-audit',
          '--no-fund',
          join(dir.path, filename),
        ],
        dir.path,
      );
      const bin = join(prefix, 'bin', 'ligament');
      expect(existsSync(bin)).toBe(true);
      const installed = join(prefix, 'lib', 'node_modules');
      const deps = readdirSync(join(installed, 'ligament', 'node_modules'));
      expect(deps).toContain('commander');
      expect(deps).not.toContain('vitest');
      expect(deps).not.toContain('fast-check');

      // Run through the bin link itself (shebang), with only Node's directory on PATH.
      const env = { PATH: `${join(prefix, 'bin')}:${process.execPath.replace(/\/node$/, '')}` };
      const version = spawnSync(bin, ['--version'], { encoding: 'utf8', env, cwd: dir.path });
      expect(version.status).toBe(0);
      expect(version.stdout).toMatch(/^ligament 0\.1\.0 \(calc schema 1\.0, result schema 1\.0\)/);

      const check = spawnSync(
        bin,
        ['check', join(EXAMPLES, 'deck-gusset-overstated.json'), '--format', 'sarif'],
        {
          encoding: 'utf8',
          env,
          cwd: dir.path,
        },
      );
      expect(check.status).toBe(1);
      expect((JSON.parse(check.stdout) as { version: string }).version).toBe('2.1.0');

      const schema = spawnSync(bin, ['schema', '--path'], { encoding: 'utf8', env, cwd: dir.path });
      expect(schema.stdout.trim()).toBe(join(installed, 'ligament', 'schema', 'calc.schema.json'));
    },
  );
});
