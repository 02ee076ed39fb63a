/**
 * SARIF 2.1.0 (OASIS Static Analysis Results Interchange Format, errata 01): one run, one rule per
 * finding code from the engine's catalogue plus one rule per input rule met in the run, and one
 * result per finding or input error with the file, line and column of the offending value, so code
 * scanning shows them inline.
 */
import type { CalcError } from '../calc/types.js';
import type { LocatedFinding, RunReport } from '../runner/types.js';
import { CAUTION } from '../engine/caution.js';
import type { Severity } from '../engine/findings/types.js';

export const SARIF_SCHEMA_URI =
  'https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json';

/** A catalogue entry as the formatter needs it. */
export interface RuleInfo {
  readonly code: string;
  readonly name: string;
  readonly class: string;
  readonly severity: Severity;
  readonly title: string;
  readonly help: string;
}

export interface SarifOptions {
  /** The engine's finding catalogue (FINDING_CATALOGUE). */
  readonly catalogue: readonly RuleInfo[];
  readonly informationUri?: string;
}

/** Input rules (JSON syntax, schema keywords, read problems) get ids of their own under `input/`. */
function inputRuleId(rule: string, catalogue: readonly RuleInfo[]): string {
  return catalogue.find((r) => r.name === rule)?.code ?? `input/${rule}`;
}

const INPUT_HELP: Record<string, string> = {
  'json-syntax': 'The file is not well-formed JSON. Fix the syntax at the position shown.',
  'empty-file': 'The file is empty. A calc file is a JSON document of format ligament-calc.',
  'file-too-large': 'The file is larger than the size limit for calc files and was not read.',
  'symlink-loop': 'Symbolic links form a loop; the path was not followed.',
  'not-found': 'The path given does not exist or the pattern matches no files.',
  'read-error': 'The file could not be read.',
};

function inputRule(rule: string) {
  const help =
    INPUT_HELP[rule] ??
    `The calc file breaks the rule "${rule}" of the ligament-calc format (schema/calc.schema.json or its semantic checks). The message names the value and what is expected.`;
  return {
    id: `input/${rule}`,
    name: rule,
    shortDescription: { text: `Invalid calc file: ${rule}` },
    fullDescription: { text: help },
    help: { text: help },
    defaultConfiguration: { level: 'error' as const },
    properties: { class: 'input' },
  };
}

/** SARIF has no level for success; a URI needs percent-encoding of spaces and the like. */
function artifactUri(file: string): string {
  if (file === '<stdin>') return 'stdin';
  return file
    .split('/')
    .map((segment) => encodeURIComponent(segment))
    .join('/');
}

function location(file: string, line: number, column: number, pointer: string, memberId?: string) {
  return {
    physicalLocation: {
      artifactLocation: {
        uri: artifactUri(file),
        ...(file.startsWith('/') || file === '<stdin>' ? {} : { uriBaseId: '%SRCROOT%' }),
      },
      region: { startLine: line, startColumn: column },
    },
    logicalLocations: [
      memberId !== undefined
        ? { name: memberId, fullyQualifiedName: `${memberId}${pointer ? ` ${pointer}` : ''}`, kind: 'member' }
        : { name: pointer || '/', kind: 'object' },
    ],
  };
}

/**
 * Formats a run as a SARIF 2.1.0 log (JSON text).
 *
 * @example
 * JSON.parse(formatSarif(report, { catalogue: FINDING_CATALOGUE })).runs[0].results[0].ruleId // → 'LG101'
 */
export function formatSarif(report: RunReport, options: SarifOptions): string {
  const catalogue = [...options.catalogue].sort((a, b) => (a.code < b.code ? -1 : a.code > b.code ? 1 : 0));
  const rules: ReturnType<typeof catalogueRule | typeof inputRule>[] = catalogue.map(catalogueRule);
  const index = new Map<string, number>(rules.map((r, i) => [r.id, i]));
  const ruleIndex = (id: string, make: () => ReturnType<typeof inputRule>): number => {
    const known = index.get(id);
    if (known !== undefined) return known;
    rules.push(make());
    index.set(id, rules.length - 1);
    return rules.length - 1;
  };

  const results: object[] = [];
  const artifacts: string[] = [];
  for (const file of report.files) {
    artifacts.push(file.file);
    for (const e of file.errors) results.push(errorResult(e, catalogue, ruleIndex));
    for (const m of file.members) {
      for (const f of m.findings) results.push(findingResult(file.file, f, ruleIndex));
    }
  }
  const log = {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: {
          driver: {
            name: 'ligament',
            version: report.tool.version,
            semanticVersion: report.tool.version,
            ...(options.informationUri ? { informationUri: options.informationUri } : {}),
            rules,
            properties: {
              engineVersion: report.tool.engineVersion,
              schemaVersion: report.tool.schemaVersion,
            },
          },
        },
        originalUriBaseIds: { '%SRCROOT%': { description: { text: 'The directory ligament ran in.' } } },
        artifacts: artifacts.map((f) => ({
          location: {
            uri: artifactUri(f),
            ...(f.startsWith('/') || f === '<stdin>' ? {} : { uriBaseId: '%SRCROOT%' }),
          },
        })),
        invocations: [
          {
            executionSuccessful: report.exitCode !== 2,
            exitCode: report.exitCode,
            ...(report.exitCode === 2
              ? {
                  toolExecutionNotifications: [
                    {
                      level: 'error',
                      message: {
                        text: `${report.summary.invalidFiles} of ${report.summary.files} files could not be checked`,
                      },
                    },
                  ],
                }
              : {}),
          },
        ],
        columnKind: 'utf16CodeUnits',
        results,
        properties: { caution: CAUTION, failOn: report.settings.failOn },
      },
    ],
  };
  return JSON.stringify(log, null, 2) + '\n';
}

function catalogueRule(r: RuleInfo) {
  return {
    id: r.code,
    name: r.name,
    shortDescription: { text: r.title },
    fullDescription: { text: r.help },
    help: { text: `${r.help}\n\n${CAUTION}` },
    defaultConfiguration: { level: r.severity },
    properties: { class: r.class },
  };
}

function findingResult(
  file: string,
  f: LocatedFinding,
  ruleIndex: (id: string, make: () => ReturnType<typeof inputRule>) => number,
) {
  return {
    ruleId: f.code,
    ruleIndex: ruleIndex(f.code, () => inputRule(f.name)),
    level: f.severity,
    kind: 'fail',
    message: { text: f.message },
    locations: [location(file, f.line, f.column, f.pointer, f.memberId)],
    partialFingerprints: {
      'ligament/v1': `${f.code}:${f.memberId ?? ''}:${f.pointer}:${(f.chain ?? []).join(',')}`,
    },
    properties: {
      pointer: f.pointer,
      class: f.class,
      ...(f.direction !== undefined ? { direction: f.direction } : {}),
      ...(f.chain !== undefined ? { chain: [...f.chain] } : {}),
      ...(f.claimed !== undefined ? { claimed: f.claimed } : {}),
      ...(f.recomputed !== undefined ? { recomputed: f.recomputed } : {}),
    },
  };
}

function errorResult(
  e: CalcError,
  catalogue: readonly RuleInfo[],
  ruleIndex: (id: string, make: () => ReturnType<typeof inputRule>) => number,
) {
  const id = inputRuleId(e.rule, catalogue);
  return {
    ruleId: id,
    ruleIndex: ruleIndex(id, () => inputRule(e.rule)),
    level: 'error',
    kind: 'fail',
    message: { text: e.message },
    locations: [location(e.file, e.line, e.column, e.pointer)],
    properties: { pointer: e.pointer, rule: e.rule },
  };
}
