/**
 * JUnit XML: one testsuite per file, one testcase per member and check. A check fails when it has a
 * finding at or above `--fail-on`; its failure carries the finding text. Findings below the line go
 * to the testcase's system-out. An invalid file is one testcase with an error per input error.
 */
import type { FileReport, LocatedFinding, MemberReport, RunReport } from '../runner/types.js';
import { isFailing, position, xmlEscape as x } from './common.js';
import type { FindingClass } from '../engine/findings/types.js';

/** The checks each member is reported under, and the finding classes each one collects. */
export const JUNIT_CHECKS: readonly { readonly name: string; readonly classes: readonly FindingClass[] }[] = [
  { name: 'areas and strengths', classes: ['overstated', 'understated'] },
  { name: 'governing chain', classes: ['missed-chain'] },
  { name: 'claimed chains', classes: ['phantom-chain', 'chain-width'] },
  { name: 'equal share', classes: ['equal-share'] },
  { name: 'detailing', classes: ['detailing', 'input'] },
];

function findingText(file: string, f: LocatedFinding): string {
  return `${position(file, f.line, f.column)} ${f.severity.toUpperCase()} ${f.code} ${f.name}: ${f.message} (${f.pointer || '/'})`;
}

interface Case {
  readonly xml: string;
  readonly failed: boolean;
  readonly errored: boolean;
}

function memberCases(report: RunReport, file: FileReport, m: MemberReport): Case[] {
  return JUNIT_CHECKS.map((check) => {
    const found = m.findings.filter((f) => check.classes.includes(f.class));
    const failing = found.filter((f) => isFailing(report, f.severity));
    const other = found.filter((f) => !isFailing(report, f.severity));
    const name = `${m.memberId} ${check.name}`;
    const classname = `${file.file}.${m.memberId}`;
    const body: string[] = [];
    if (failing.length > 0) {
      const first = failing[0]!;
      body.push(
        `      <failure message="${x(`${first.code} ${first.message}`)}" type="${x(first.class)}">${x(
          failing.map((f) => findingText(file.file, f)).join('\n'),
        )}</failure>`,
      );
    }
    if (other.length > 0)
      body.push(
        `      <system-out>${x(other.map((f) => findingText(file.file, f)).join('\n'))}</system-out>`,
      );
    const open = `    <testcase name="${x(name)}" classname="${x(classname)}" file="${x(file.file)}" line="${m.line}"`;
    return {
      xml: body.length === 0 ? `${open}/>` : `${open}>\n${body.join('\n')}\n    </testcase>`,
      failed: failing.length > 0,
      errored: false,
    };
  });
}

function invalidCase(file: FileReport): Case {
  const errors = file.errors.map(
    (e) =>
      `      <error message="${x(`${e.rule}: ${e.message}`)}" type="${x(e.rule)}">${x(
        `${position(e.file, e.line, e.column)} ${e.rule}: ${e.message} (${e.pointer || '/'})`,
      )}</error>`,
  );
  return {
    xml: `    <testcase name="valid calc file" classname="${x(file.file)}" file="${x(file.file)}">\n${errors.join('\n')}\n    </testcase>`,
    failed: false,
    errored: true,
  };
}

/** Formats a run as JUnit XML. */
export function formatJunit(report: RunReport): string {
  const suites: string[] = [];
  let tests = 0;
  let failures = 0;
  let errors = 0;
  for (const file of report.files) {
    const cases =
      file.status === 'invalid'
        ? [invalidCase(file)]
        : file.status === 'valid'
          ? [
              {
                xml: `    <testcase name="valid calc file" classname="${x(file.file)}" file="${x(file.file)}"/>`,
                failed: false,
                errored: false,
              },
            ]
          : file.members.flatMap((m) => memberCases(report, file, m));
    const f = cases.filter((c) => c.failed).length;
    const e = cases.filter((c) => c.errored).length;
    tests += cases.length;
    failures += f;
    errors += e;
    suites.push(
      `  <testsuite name="${x(file.file)}" tests="${cases.length}" failures="${f}" errors="${e}" skipped="0">\n${cases
        .map((c) => c.xml)
        .join('\n')}\n  </testsuite>`,
    );
  }
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<testsuites name="ligament ${report.command}" tests="${tests}" failures="${failures}" errors="${errors}">`,
    ...suites,
    '</testsuites>',
    '',
  ].join('\n');
}
