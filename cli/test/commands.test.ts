import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCalcText } from '../src/calc/index.js';
import { CLI_ROOT, EXAMPLES, INVALID_EXAMPLES, REPO_ROOT, run, runBin, tempDir } from './helpers.js';
import { parseSvg } from './xml.js';

const ex = (name: string): string => join(EXAMPLES, name);

describe('ligament chains', () => {
  it('lists the least chains per direction with every leg (AISC Design Examples v13.0, D.9 layout)', async () => {
    const r = await run(['chains', ex('north-splice-correct.json'), '--member', 'SP-N1', '--top', '4']);
    expect(r.exitCode).toBe(0);
    // R1 published net widths: zigzag 11.5 (controls), outer–inner–inner 11.9, straight 12.3 in.
    expect(r.stdout).toMatch(/1 {2}A1–B1–C1–D1 +4 +3\.500 +1\.042 +11\.542 +5\.771 {3}governs/);
    expect(r.stdout).toMatch(/A1 → B1 {2}s 2\.500 in {2}g 3\.000 in {2}s²\/4g 0\.521 in/);
    expect(r.stdout).toMatch(/A1–D1 +2 +1\.750 +0\.000 +12\.250/);
    expect(r.stdout).toMatch(/A1–B1–C1 +3 +2\.625 +0\.521 +11\.896/);
  });

  it('--explain lists chains that cannot form with the hole that blocks each', async () => {
    const r = await run(['chains', ex('north-splice-correct.json'), '--explain', '--top', '4']);
    expect(r.exitCode).toBe(0);
    expect(r.stdout).toContain('A1–B1–C1  wn 11.896 in  +x: forms; -x: blocked by D1 (on the loaded side)');
    expect(r.stdout).toContain('A1–C1–D1  wn 12.119 in  -x: forms; +x: blocked by B1 (on the loaded side)');
  });

  it('--direction limits the directions; --format json gives the chains as data', async () => {
    const r = await run(['chains', ex('deck-tie-slotted-mm.json'), '--direction', '+x', '--format', 'json']);
    const doc = JSON.parse(r.stdout) as {
      member: string;
      directions: { direction: string; governing: { holes: string[]; netWidth: number } }[];
    };
    expect(doc.member).toBe('T-5');
    expect(doc.directions.map((d) => d.direction)).toEqual(['+x']);
    expect(doc.directions[0]!.governing.holes).toEqual(['S3', 'S4']);
    expect(doc.directions[0]!.governing.netWidth).toBeCloseTo(152, 6);
  });

  it('--direction takes a value that starts with a dash (-x)', async () => {
    const r = await run(['chains', ex('north-splice-correct.json'), '--direction', '-x', '--format', 'json']);
    const doc = JSON.parse(r.stdout) as { directions: { direction: string }[] };
    expect(doc.directions.map((d) => d.direction)).toEqual(['-x']);
  });

  it('an unknown member is exit 2 naming the members there are; an invalid file is exit 2 with its errors', async () => {
    const r = await run(['chains', ex('north-splice-correct.json'), '--member', 'X9']);
    expect(r.exitCode).toBe(2);
    expect(r.stderr).toContain('no member "X9" in');
    expect(r.stderr).toContain('(members: SP-N1)');
    const bad = await run(['chains', join(INVALID_EXAMPLES, 'wrong-type.json')]);
    expect(bad.exitCode).toBe(2);
    expect(bad.stderr).toMatch(/wrong-type\.json:19:20 {2}ERROR {3}type /);
  });
});

describe('ligament draw', () => {
  it('writes a to-scale SVG with holes, slots, dimensions, load arrows and the fracture line per direction', async () => {
    const dir = tempDir();
    try {
      const r = await run(['draw', ex('deck-tie-slotted-mm.json'), '--member', 'T-5', '-o', 'tie.svg'], {
        cwd: dir.path,
      });
      expect(r.exitCode).toBe(0);
      const svg = readFileSync(join(dir.path, 'tie.svg'), 'utf8');
      const doc = parseSvg(svg);
      // Each hole is white-filled once (a second fill attribute is an XML error browsers stop at).
      const holes = [
        ...Array.from(doc.getElementsByTagName('circle')),
        ...Array.from(doc.getElementsByTagName('path')),
      ].filter((e) => e.hasAttribute('data-hole'));
      expect(holes).toHaveLength(4);
      for (const h of holes) expect(h.getAttribute('fill')).toBe('#ffffff');
      expect(svg).toMatch(
        /^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"[^>]* width="[\d.]+mm" height="[\d.]+mm"/,
      );
      expect(svg.match(/<circle [^>]*data-hole=/g)).toHaveLength(2);
      expect(svg.match(/<path [^>]*data-hole=/g)).toHaveLength(2);
      expect(svg).toContain('data-fracture="-x" data-chain="S1 S2" data-net-width="146"');
      expect(svg).toContain('data-fracture="+x" data-chain="S3 S4" data-net-width="152"');
      expect(svg.match(/<g data-load="-x">/g)).toHaveLength(3);
      expect(svg.match(/<g data-load="\+x">/g)).toHaveLength(3);
      expect(svg).toContain('data-dimension="width" data-value="200"');
      expect(svg).toMatch(/data-dimension="gauge" data-value="100"/);
      expect(svg).toContain('SCALE 1:2');
      expect(svg).toContain('T-5 — plate');
      expect(svg).toContain('Ligament is a checking aid.');
    } finally {
      dir.remove();
    }
  });

  it('prints the SVG to stdout without -o and picks the only member without --member', async () => {
    const r = await run(['draw', ex('north-splice-correct.json')]);
    expect(r.exitCode).toBe(0);
    parseSvg(r.stdout);
    expect(r.stdout).toContain('data-fracture="-x +x" data-chain="A1 B1 C1 D1"');
    expect(r.stdout).toContain('>2 1/2</text>');
  });
});

describe('ligament draw on every example', () => {
  const examples = readdirSync(EXAMPLES).filter((f) => f.endsWith('.json'));
  for (const name of examples) {
    it(`draws every member of ${name} as well-formed SVG`, async () => {
      const doc = JSON.parse(readFileSync(ex(name), 'utf8')) as { members: { id: string }[] };
      for (const { id } of doc.members) {
        const r = await run(['draw', ex(name), '--member', id]);
        expect(r.exitCode, `${name} ${id}: ${r.stderr}`).toBe(0);
        const svg = parseSvg(r.stdout);
        expect(svg.getElementsByTagName('title')[0]?.textContent).toContain(id);
      }
    });
  }
});

describe('ligament init', () => {
  for (const units of ['in', 'mm'] as const) {
    it(`writes a valid ${units} calc file that checks clean`, async () => {
      const dir = tempDir();
      try {
        const w = await run(['init', '--units', units, '-o', 'start.json'], { cwd: dir.path });
        expect(w.exitCode).toBe(0);
        const text = readFileSync(join(dir.path, 'start.json'), 'utf8');
        const loaded = loadCalcText(text, 'start.json');
        expect(loaded.ok).toBe(true);
        if (loaded.ok) expect(loaded.document.profile.units).toBe(units);
        const c = await run(['check', 'start.json', '--fail-on', 'any'], { cwd: dir.path });
        expect(c.exitCode).toBe(0);
        expect(c.stdout).toContain('Project name');
        // Placeholders, never the people, firms or projects of the demo examples.
        for (const name of readdirSync(EXAMPLES).filter((f) => f.endsWith('.json'))) {
          const meta = (
            JSON.parse(readFileSync(join(EXAMPLES, name), 'utf8')) as { meta: Record<string, unknown> }
          ).meta;
          for (const key of ['project', 'preparedBy', 'checkedBy', 'firm'])
            if (typeof meta[key] === 'string') expect(text).not.toContain(meta[key]);
        }
        const again = await run(['init', '-o', 'start.json'], { cwd: dir.path });
        expect(again.exitCode).toBe(2);
        expect(again.stderr).toContain('start.json exists; pass --force to overwrite it');
      } finally {
        dir.remove();
      }
    });
  }
});

describe('ligament schema and --version', () => {
  it('prints the bundled calc schema, its path, or the result schema', async () => {
    const calc = await run(['schema']);
    expect((JSON.parse(calc.stdout) as { $id: string }).$id).toBe('urn:ligament:schema:calc:1.0');
    const path = await run(['schema', '--path']);
    expect(path.stdout.trim()).toBe(join(CLI_ROOT, 'schema', 'calc.schema.json'));
    const result = await run(['schema', '--result']);
    expect(JSON.parse(result.stdout)).toEqual(
      JSON.parse(readFileSync(join(REPO_ROOT, 'schema', 'result.schema.json'), 'utf8')),
    );
  });

  it('--version prints the package and schema versions', () => {
    const r = runBin(['--version']);
    expect(r.exitCode).toBe(0);
    const pkg = JSON.parse(readFileSync(join(CLI_ROOT, 'package.json'), 'utf8')) as { version: string };
    expect(r.stdout.trim()).toBe(`ligament ${pkg.version} (calc schema 1.0, result schema 1.0)`);
  });

  it('--help lists the commands and the exit codes; every command has help with examples', async () => {
    const top = await run(['--help']);
    expect(top.exitCode).toBe(0);
    for (const c of ['validate', 'check', 'chains', 'draw', 'init', 'schema'])
      expect(top.stdout).toContain(`  ${c} `);
    expect(top.stdout).toContain(
      '2  invalid input (unreadable, malformed or invalid calc file) or usage error',
    );
    for (const c of ['validate', 'check', 'chains', 'draw', 'init', 'schema']) {
      const h = await run([c, '--help']);
      expect(h.exitCode).toBe(0);
      expect(h.stdout).toContain('Examples:');
      expect(h.stdout).toContain('Exit codes:');
    }
  });
});

describe('program', () => {
  it("lists each command in --help with the same words as the command's own description", async () => {
    const { COMMANDS } = await import('../src/program.js');
    const { createContext } = await import('../src/commands/context.js');
    const ctx = createContext(
      {
        stdout: () => undefined,
        stderr: () => undefined,
        readStdin: async () => '',
        cwd: '/',
        env: {},
        stdoutIsTTY: false,
      },
      '0.1.0',
    );
    for (const entry of COMMANDS) {
      const command = (await entry.load())(ctx);
      expect(command.name()).toBe(entry.name);
      expect(command.description()).toBe(entry.summary);
      const args = command.registeredArguments.map((a) =>
        a.required ? `<${a.name()}${a.variadic ? '...' : ''}>` : `[${a.name()}]`,
      );
      expect(args.join(' ')).toBe(entry.args);
    }
  });
});
