import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CLI_ROOT, EXAMPLES, FIXTURES, lineOf, REPO_ROOT, run, schemaValidator, tempDir } from './helpers.js';

const ex = (name: string): string => join(EXAMPLES, name);
const ALL = [
  'north-splice-correct.json',
  'deck-gusset-overstated.json',
  'lantern-lap-phantom-chain.json',
  'south-hanger-missed-chain.json',
  'approach-gusset-slots.json',
  'deck-tie-slotted-mm.json',
  'rail-post-splice-2010-one-inch.json',
]
  .map((n) => `schema/examples/${n}`)
  .concat('schema/invalid-examples/wrong-type.json');

describe('--format json', () => {
  it('is a ligament-result 1.0 document that validates against schema/result.schema.json', async () => {
    const validate = schemaValidator(join(REPO_ROOT, 'schema', 'result.schema.json'));
    const r = await run(['check', '--format', 'json', ...ALL]);
    expect(r.exitCode).toBe(2);
    const doc = JSON.parse(r.stdout) as {
      $schema: string;
      files: unknown[];
      summary: { invalidFiles: number };
    };
    expect(validate(doc), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    expect(doc.$schema).toBe('urn:ligament:schema:result:1.0');
    expect(doc.files).toHaveLength(8);
    expect(doc.summary.invalidFiles).toBe(1);
  });

  it('validate --format json validates against the same schema', async () => {
    const validate = schemaValidator(join(CLI_ROOT, 'schema', 'result.schema.json'));
    const r = await run(['validate', '--format', 'json', ...ALL]);
    const doc = JSON.parse(r.stdout) as { command: string; files: { status: string }[] };
    expect(validate(doc), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    expect(doc.command).toBe('validate');
    expect(doc.files.map((f) => f.status)).toEqual([...Array(7).fill('valid'), 'invalid']);
    expect(r.exitCode).toBe(2);
  });
});

interface SarifLog {
  version: string;
  runs: {
    tool: { driver: { name: string; rules: { id: string; name: string; help: { text: string } }[] } };
    results: {
      ruleId: string;
      ruleIndex: number;
      level: string;
      message: { text: string };
      locations: {
        physicalLocation: {
          artifactLocation: { uri: string };
          region: { startLine: number; startColumn: number };
        };
      }[];
      properties: { pointer: string };
    }[];
    invocations: { executionSuccessful: boolean; exitCode: number }[];
  }[];
}

describe('--format sarif', () => {
  it('validates against the published SARIF 2.1.0 schema, invalid files included', async () => {
    const validate = schemaValidator(join(FIXTURES, 'sarif-schema-2.1.0.json'));
    const r = await run(['check', '--format', 'sarif', ...ALL]);
    const log = JSON.parse(r.stdout) as SarifLog;
    expect(validate(log), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    expect(log.version).toBe('2.1.0');
    expect(log.runs).toHaveLength(1);
    expect(log.runs[0]!.invocations[0]).toMatchObject({ executionSuccessful: false, exitCode: 2 });
  });

  it('has one rule per catalogue code with help text, and results that point at the offending value', async () => {
    const r = await run(['check', '--format', 'sarif', 'schema/examples/deck-gusset-overstated.json']);
    expect(r.exitCode).toBe(1);
    const run0 = (JSON.parse(r.stdout) as SarifLog).runs[0]!;
    const rules = run0.tool.driver.rules;
    for (const code of ['LG101', 'LG121', 'LG122', 'LG124', 'LG201', 'LG301']) {
      const rule = rules.find((x) => x.id === code);
      expect(rule, code).toBeDefined();
      expect(rule!.help.text.length).toBeGreaterThan(40);
    }
    const lg101 = run0.results.find((x) => x.ruleId === 'LG101')!;
    expect(rules[lg101.ruleIndex]!.id).toBe('LG101');
    expect(lg101.level).toBe('error');
    const loc = lg101.locations[0]!.physicalLocation;
    expect(loc.artifactLocation.uri).toBe('schema/examples/deck-gusset-overstated.json');
    expect(loc.region).toEqual({ startLine: 46, startColumn: 15 });
    expect(lineOf(ex('deck-gusset-overstated.json'), 46).slice(14)).toMatch(/^3\.844/);
  });

  it('reports an invalid file as results too, located at the bad value', async () => {
    const r = await run(['check', '--format', 'sarif', 'schema/invalid-examples/wrong-type.json']);
    expect(r.exitCode).toBe(2);
    const run0 = (JSON.parse(r.stdout) as SarifLog).runs[0]!;
    expect(run0.results).toHaveLength(1);
    const res = run0.results[0]!;
    expect(res.ruleId).toBe('input/type');
    expect(res.properties.pointer).toBe('/members/0/thickness');
    expect(res.locations[0]!.physicalLocation.region).toEqual({ startLine: 19, startColumn: 20 });
    // Diagnostics still reach stderr when the report goes elsewhere.
    expect(r.stderr).toContain('wrong-type.json:19:20');
  });
});

describe('--format junit', () => {
  it('has one testsuite per file and one testcase per member and check; failures carry the finding', async () => {
    const r = await run([
      'check',
      '--format',
      'junit',
      'schema/examples/north-splice-correct.json',
      'schema/examples/deck-gusset-overstated.json',
      'schema/invalid-examples/wrong-type.json',
    ]);
    const xml = r.stdout;
    expect(xml.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    expect(xml.match(/<testsuite /g)).toHaveLength(3);
    // Five checks per member, two members, one case for the invalid file.
    expect(xml.match(/<testcase /g)).toHaveLength(11);
    expect(xml).toMatch(/<testsuites name="ligament check" tests="11" failures="2" errors="1">/);
    expect(xml).toMatch(
      /<testcase name="G-D2 areas and strengths"[^>]*>\s*<failure message="LG101 Claimed An 3\.84/,
    );
    expect(xml).toMatch(/<testcase name="G-D2 claimed chains"[^>]*>\s*<failure message="LG124 /);
    expect(xml).toMatch(/<testcase name="SP-N1 areas and strengths" [^>]*\/>/);
    expect(xml).toMatch(
      /<error message="type: [^"]*" type="type">schema\/invalid-examples\/wrong-type\.json:19:20/,
    );
  });
});

describe('--format markdown', () => {
  it('summarises for a pull request: verdict, a row per member, failing findings with locations, caution', async () => {
    const r = await run([
      'check',
      '--format',
      'markdown',
      'schema/examples/north-splice-correct.json',
      'schema/examples/deck-gusset-overstated.json',
    ]);
    const md = r.stdout;
    expect(md).toContain('## Ligament check: 6 findings to resolve (--fail-on overstated)');
    expect(md).toContain('| File | Member | Governing chain | An | Available strength | Findings |');
    expect(md).toMatch(
      /\| `schema\/examples\/north-splice-correct\.json` \| SP-N1 \| -x A1–B1–C1–D1<br>\+x A1–B1–C1–D1 \| 5\.771 in² \|/,
    );
    expect(md).toContain('### To resolve (6)');
    expect(md).toMatch(/- \*\*LG101\*\* error `schema\/examples\/deck-gusset-overstated\.json:46:15`/);
    expect(md).toContain('> Ligament is a checking aid.');
  });
});

describe('EN 1993-1-8 3.10.3(2) in the reports', () => {
  // Hand-constructed (see src/engine/analyseMember.en1993.test.ts for the arithmetic): L120×80×12, S235,
  // three M20 bolts at 70 mm through the 80 mm leg. Anet 1992 mm²; the equivalent L80×80×12 gives
  // 1992 − (120 − 80)·12 = 1512 mm²; β3 = 0.5 + 0.2·(70/22 − 2.5)/2.5 = 0.5545; Ae = 838.5 mm².
  const doc = {
    $schema: 'urn:ligament:schema:calc:1.0',
    format: 'ligament-calc',
    formatVersion: '1.0',
    meta: { project: 'Harbour Lantern Footbridge', preparedBy: 'Priya Halvorsen', date: '2026-12-02' },
    units: 'mm',
    code: { standard: 'EN 1993-1-1', method: 'LRFD' },
    members: [
      {
        id: 'BR-1',
        kind: 'angle',
        section: { shape: 'angle', a: 120, b: 80, t: 12 },
        material: { grade: 'S235', Fy: 235, Fu: 360 },
        holes: [0, 70, 140].map((x, i) => ({ id: `H${i + 1}`, x, element: 'leg-b', gauge: 45, bolt: 'M20' })),
        load: { directions: ['-x'], shearLag: { connected: 'leg', fastenersPerLine: 3 } },
      },
    ],
  };

  it('text says which net area U multiplies; json carries it and still validates', async () => {
    const dir = tempDir();
    try {
      const file = join(dir.path, 'brace-en-unequal.json');
      writeFileSync(file, JSON.stringify(doc, null, 2));
      const text = await run(['check', file]);
      expect(text.exitCode, text.stderr).toBe(0);
      expect(text.stdout).toMatch(/Ae = U × 1512(\.0)? mm², not U × An \(EN 1993-1-8 3\.10\.3\(2\): /);
      const json = await run(['check', '--format', 'json', file]);
      const result = JSON.parse(json.stdout) as {
        files: { members: { result: { Ae: number; shearLag?: { netArea?: { area: number } } } }[] }[];
      };
      const member = result.files[0]?.members[0]?.result;
      expect(member?.shearLag?.netArea?.area).toBeCloseTo(1512, 9);
      expect(member?.Ae).toBeCloseTo((0.5 + 1.2 / 22) * 1512, 9);
      const validate = schemaValidator(join(REPO_ROOT, 'schema', 'result.schema.json'));
      expect(validate(result), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    } finally {
      dir.remove();
    }
  });
});
