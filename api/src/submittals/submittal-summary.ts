import { FINDING_CLASSES, SEVERITIES, type Finding, type FindingClass, type Severity } from 'ligament';

// The engine's reading order of the classes and its severities, worst first, for the DTOs and the dashboard.
export { FINDING_CLASSES, SEVERITIES };

export interface WorstFinding {
  code: string;
  name: string;
  class: FindingClass;
  severity: Severity;
  fileName: string;
  memberId: string | null;
  message: string;
}

/** What a check found, stored with the submittal. */
export interface SubmittalSummary {
  files: number;
  members: number;
  findings: number;
  byClass: Record<FindingClass, number>;
  bySeverity: Record<Severity, number>;
  worst: WorstFinding | null;
}

export interface LocatedFinding {
  readonly fileName: string;
  readonly finding: Finding;
}

function rank(f: Finding): [number, number, string] {
  return [SEVERITIES.indexOf(f.severity), FINDING_CLASSES.indexOf(f.class), f.code];
}

/** Orders findings worst first: severity, then class (catalogue order), then code. */
export function compareFindings(a: Finding, b: Finding): number {
  const [sa, ca, da] = rank(a);
  const [sb, cb, db] = rank(b);
  return sa - sb || ca - cb || da.localeCompare(db);
}

export function summarise(
  files: number,
  members: number,
  findings: readonly LocatedFinding[],
): SubmittalSummary {
  const byClass = Object.fromEntries(FINDING_CLASSES.map((c) => [c, 0])) as Record<FindingClass, number>;
  const bySeverity = Object.fromEntries(SEVERITIES.map((s) => [s, 0])) as Record<Severity, number>;
  let worst: LocatedFinding | null = null;
  for (const located of findings) {
    byClass[located.finding.class]++;
    bySeverity[located.finding.severity]++;
    if (!worst || compareFindings(located.finding, worst.finding) < 0) worst = located;
  }
  return {
    files,
    members,
    findings: findings.length,
    byClass,
    bySeverity,
    worst: worst
      ? {
          code: worst.finding.code,
          name: worst.finding.name,
          class: worst.finding.class,
          severity: worst.finding.severity,
          fileName: worst.fileName,
          memberId: worst.finding.memberId ?? null,
          message: worst.finding.message,
        }
      : null,
  };
}
