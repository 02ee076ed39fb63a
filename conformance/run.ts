/**
 * Conformance runner: loads every vector's input calc file through the published package
 * (`ligament`: loadCalcText + auditCalc), compares the results with the vector's expected.json
 * within its tolerances, prints one line per vector with its source and a final `N passed, N failed`.
 * Exit code 1 when any vector fails. See README.md for the vector format.
 *
 * Run from the repository root: `npm run conformance` (after `npm run build -w cli`).
 */
import { readdirSync, readFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { auditCalc, loadCalcText } from 'ligament';
import type { MemberAudit } from 'ligament';

type Quantity =
  | 'holeWidth'
  | 'netWidth'
  | 'Ag'
  | 'An'
  | 'Ae'
  | 'U'
  | 'yielding'
  | 'rupture'
  | 'available'
  | 'Agv'
  | 'Anv'
  | 'Agt'
  | 'Ant'
  | 'blockShear';
type Direction = '-x' | '+x';

interface Source {
  readonly title: string;
  readonly edition: string;
  readonly locator: string;
}

interface ExpectedDirection {
  readonly chain?: readonly string[] | null;
  readonly netWidth?: number;
  readonly An?: number;
}

interface ExpectedMember {
  readonly Ag?: number;
  readonly An?: number;
  readonly U?: number;
  readonly Ae?: number;
  readonly yielding?: number;
  readonly rupture?: number;
  readonly available?: number;
  /** Block shear of the governing tear-out: areas and available strength. */
  readonly Agv?: number;
  readonly Anv?: number;
  readonly Agt?: number;
  readonly Ant?: number;
  readonly blockShear?: number;
  /** `code` or `project-defined` (a staggered tension plane, no published example). */
  readonly blockShearSource?: 'code' | 'project-defined';
  readonly holeWidths?: Readonly<Record<string, number>>;
  readonly directions?: Readonly<Partial<Record<Direction, ExpectedDirection>>>;
  readonly chains?: readonly { readonly holes: readonly string[]; readonly netWidth: number }[];
  readonly notAdmissible?: readonly { readonly holes: readonly string[]; readonly direction: Direction }[];
  readonly findings?: {
    readonly include?: readonly string[];
    readonly exclude?: readonly string[];
    readonly severity?: Readonly<Record<string, string>>;
  };
}

interface Expected {
  readonly description: string;
  readonly source: Source | 'common practice';
  readonly note?: string;
  readonly tolerance: Readonly<Partial<Record<Quantity, number>>>;
  readonly members: Readonly<Record<string, ExpectedMember>>;
}

const SCALARS = ['Ag', 'An', 'U', 'Ae', 'yielding', 'rupture', 'available'] as const;

const here = fileURLToPath(new URL('.', import.meta.url));
const vectorsDir = join(here, 'vectors');

function describeSource(source: Expected['source']): string {
  return source === 'common practice'
    ? 'common practice'
    : `${source.title}, ${source.edition}, ${source.locator}`;
}

function sameHoles(a: readonly string[], b: readonly string[]): boolean {
  return a.length === b.length && a.every((id, i) => id === b[i]);
}

/** Checks one member against its expectations; returns the failures in plain words. */
function checkMember(
  id: string,
  exp: ExpectedMember,
  audit: MemberAudit,
  tolerance: Expected['tolerance'],
): string[] {
  const failures: string[] = [];
  const r = audit.result;
  const near = (what: string, q: Quantity, actual: number | undefined, expected: number) => {
    const tol = tolerance[q];
    if (tol === undefined) {
      failures.push(`${id} ${what}: the vector gives no tolerance for "${q}"`);
      return;
    }
    if (actual === undefined || !Number.isFinite(actual)) {
      failures.push(`${id} ${what}: expected ${expected}, got nothing`);
      return;
    }
    // Tolerance is absolute, in the calc file's units; the tiny relative term absorbs binary rounding.
    if (Math.abs(actual - expected) > tol + 1e-9 * Math.max(1, Math.abs(expected))) {
      failures.push(`${id} ${what}: expected ${expected} ± ${tol}, got ${Number(actual.toPrecision(8))}`);
    }
  };

  const scalar: Record<(typeof SCALARS)[number], number> = {
    Ag: r.Ag,
    An: r.An,
    U: r.U,
    Ae: r.Ae,
    yielding: r.yielding.available,
    rupture: r.rupture.available,
    available: r.governing.available,
  };
  for (const q of SCALARS) {
    const e = exp[q];
    if (e !== undefined) near(q, q, scalar[q], e);
  }

  const block = r.blockShear;
  for (const q of ['Agv', 'Anv', 'Agt', 'Ant', 'blockShear'] as const) {
    const e = exp[q];
    if (e === undefined) continue;
    if (!block) failures.push(`${id} ${q}: expected ${e}, got no block shear result`);
    else near(q, q, q === 'blockShear' ? block.available : block[q], e);
  }
  if (exp.blockShearSource !== undefined && block) {
    const got = block.projectDefined ? 'project-defined' : 'code';
    if (got !== exp.blockShearSource)
      failures.push(`${id}: expected a ${exp.blockShearSource} block shear outline, got ${got}`);
  }

  for (const [holeId, e] of Object.entries(exp.holeWidths ?? {})) {
    near(`hole ${holeId} width`, 'holeWidth', r.holeWidths.find((h) => h.holeId === holeId)?.deducted, e);
  }

  for (const [direction, e] of Object.entries(exp.directions ?? {}) as [Direction, ExpectedDirection][]) {
    const d = r.directions.find((x) => x.direction === direction);
    if (!d) {
      failures.push(`${id} ${direction}: direction not in the result`);
      continue;
    }
    if (e.chain !== undefined) {
      const got = d.governing ? d.governing.holes.join('-') : 'none';
      const want = e.chain ? e.chain.join('-') : 'none';
      if (got !== want) failures.push(`${id} ${direction}: expected least chain ${want}, got ${got}`);
    }
    if (e.netWidth !== undefined)
      near(`${direction} net width`, 'netWidth', d.governing?.netWidth, e.netWidth);
    if (e.An !== undefined) near(`${direction} An`, 'An', d.An, e.An);
  }

  for (const c of exp.chains ?? []) {
    const found = r.directions.flatMap((d) => d.leastChains).find((x) => sameHoles(x.holes, c.holes));
    if (!found)
      failures.push(`${id}: chain ${c.holes.join('-')} is not among the least chains of any direction`);
    else near(`chain ${c.holes.join('-')} net width`, 'netWidth', found.netWidth, c.netWidth);
  }

  for (const c of exp.notAdmissible ?? []) {
    const d = r.directions.find((x) => x.direction === c.direction);
    if (d?.leastChains.some((x) => sameHoles(x.holes, c.holes))) {
      failures.push(`${id} ${c.direction}: chain ${c.holes.join('-')} should not be admissible`);
    }
  }

  if (exp.findings) {
    const codes = new Set(audit.findings.map((f) => f.code));
    const list = [...codes].sort().join(', ') || 'none';
    for (const code of exp.findings.include ?? []) {
      if (!codes.has(code)) failures.push(`${id}: expected finding ${code}, got ${list}`);
    }
    for (const code of exp.findings.exclude ?? []) {
      if (codes.has(code)) failures.push(`${id}: finding ${code} not expected (got ${list})`);
    }
    for (const [code, severity] of Object.entries(exp.findings.severity ?? {})) {
      const got = audit.findings.filter((f) => f.code === code).map((f) => f.severity);
      if (!got.includes(severity as never)) {
        failures.push(`${id}: expected ${code} with severity ${severity}, got ${got.join(', ') || 'none'}`);
      }
    }
  }
  return failures;
}

function runVector(name: string): { source: string; failures: string[] } {
  const dir = join(vectorsDir, name);
  const expectedPath = join(dir, 'expected.json');
  const inputPath = join(dir, 'input.json');
  if (!existsSync(expectedPath) || !existsSync(inputPath)) {
    return { source: '?', failures: ['a vector folder needs input.json and expected.json'] };
  }
  let expected: Expected;
  try {
    expected = JSON.parse(readFileSync(expectedPath, 'utf8')) as Expected;
  } catch (err) {
    return { source: '?', failures: [`expected.json is not JSON: ${(err as Error).message}`] };
  }
  const source = expected.source ? describeSource(expected.source) : '?';
  if (!expected.source || typeof expected.tolerance !== 'object' || typeof expected.members !== 'object') {
    return { source, failures: ['expected.json needs source, tolerance and members'] };
  }
  const loaded = loadCalcText(readFileSync(inputPath, 'utf8'), `${name}/input.json`);
  if (!loaded.ok) {
    return { source, failures: loaded.errors.map((e) => `${e.file}:${e.line}:${e.column} ${e.message}`) };
  }
  let audit;
  try {
    audit = auditCalc(loaded.document, {});
  } catch (err) {
    return { source, failures: [`audit threw: ${(err as Error).message}`] };
  }
  const failures: string[] = [];
  for (const [id, exp] of Object.entries(expected.members)) {
    const m = audit.members.find((x) => x.memberId === id);
    if (!m) failures.push(`member ${id} is not in the result`);
    else failures.push(...checkMember(id, exp, m, expected.tolerance));
  }
  return { source, failures };
}

const names = readdirSync(vectorsDir, { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name)
  .sort();
let passed = 0;
let failed = 0;
for (const name of names) {
  const { source, failures } = runVector(name);
  if (failures.length === 0) {
    passed += 1;
    console.log(`PASS ${name} — ${source}`);
  } else {
    failed += 1;
    console.log(`FAIL ${name} — ${source}`);
    for (const f of failures) console.log(`     ${f}`);
  }
}
console.log(`${passed} passed, ${failed} failed`);
if (failed > 0 || names.length === 0) process.exitCode = 1;
