import { Command, Option } from './commander.js';
import { CAUTION } from '../engine/caution.js';
import { failingSeverities, type ExitCode, type FailOn } from '../runner/types.js';
import type { CalcError } from '../calc/types.js';
import { EXIT_CODES_HELP, setExitCode, UsageError, type CliContext } from './context.js';
import { durationArg, parsePositiveInt } from './options.js';

interface SubmitFlags {
  server?: string;
  token?: string;
  project: number;
  title?: string;
  revisionOf?: number;
  failOn: FailOn;
  format: 'text' | 'json';
  timeout: number;
}

/** How long `submit` waits for the service's whole answer unless --timeout says otherwise. */
export const DEFAULT_SUBMIT_TIMEOUT = '60s';

/** What the service answers for an accepted upload (POST /api/projects/:id/submittals, 201). */
export interface SubmitSummary {
  readonly submittalId: number;
  readonly projectId: number;
  readonly title: string;
  readonly revisionOfId: number | null;
  readonly engineVersion: string;
  readonly webPath: string;
  readonly webUrl: string;
  readonly summary: {
    readonly files: number;
    readonly members: number;
    readonly findings: number;
    readonly bySeverity: { readonly error: number; readonly warning: number; readonly note: number };
    readonly byClass: Readonly<Record<string, number>>;
    readonly worst: {
      readonly code: string;
      readonly severity: string;
      readonly fileName: string;
      readonly memberId: string | null;
      readonly message: string;
    } | null;
  };
}

export interface SubmitRequest {
  readonly server: string;
  readonly token: string;
  readonly projectId: number;
  readonly title: string;
  readonly revisionOf?: number;
  readonly failOn: FailOn;
  readonly format: 'text' | 'json';
  /** Milliseconds to wait for the whole answer (headers and body) before giving up, exit 2 (default 60 s). */
  readonly timeoutMs?: number;
  readonly files: readonly { readonly name: string; readonly text: string }[];
}

export interface SubmitOutcome {
  readonly stdout: string;
  readonly stderr: string;
  readonly exitCode: ExitCode;
}

type Fetch = (
  url: string,
  init: { method: string; headers: Record<string, string>; body: FormData; signal: AbortSignal },
) => Promise<{
  status: number;
  text(): Promise<string>;
}>;

function calcErrorLine(e: CalcError): string {
  return `${e.file}:${e.line}:${e.column}  ${e.rule}  ${e.message}`;
}

/** `60 s`, `500 ms`, `2 min`. */
function formatDuration(ms: number): string {
  if (ms < 1000) return `${ms} ms`;
  if (ms % 60_000 === 0) return `${ms / 60_000} min`;
  return `${ms / 1000} s`;
}

/** The summary as a few lines of text: counts, the worst finding, where to see it. */
export function formatSubmitSummary(r: SubmitSummary): string {
  const s = r.summary;
  const lines = [
    `Submittal ${r.submittalId} "${r.title}" checked with engine ${r.engineVersion}${r.revisionOfId ? ` (revises ${r.revisionOfId})` : ''}`,
    `  ${s.files} file(s), ${s.members} member(s): ${s.bySeverity.error} error(s), ${s.bySeverity.warning} warning(s), ${s.bySeverity.note} note(s)`,
  ];
  const classes = Object.entries(s.byClass).filter(([, n]) => n > 0);
  if (classes.length > 0) lines.push(`  by class: ${classes.map(([c, n]) => `${c} ${n}`).join(', ')}`);
  if (s.worst) {
    const where = s.worst.memberId ? `${s.worst.fileName} ${s.worst.memberId}` : s.worst.fileName;
    lines.push(`  worst: ${s.worst.code} ${s.worst.severity} (${where}) ${s.worst.message}`);
  }
  lines.push(`  ${r.webUrl}`, '', CAUTION);
  return `${lines.join('\n')}\n`;
}

/**
 * Uploads calc files as one submittal and turns the answer into output and an exit code, the same
 * codes as `check`: 0 nothing at or above --fail-on, 1 findings at or above it, 2 invalid input
 * (the server's 422 with every CalcError), usage, authentication, a server that cannot be reached
 * or does not answer within the timeout, or any other failure.
 */
export async function runSubmit(req: SubmitRequest, fetchImpl: Fetch): Promise<SubmitOutcome> {
  const form = new FormData();
  form.append('title', req.title);
  if (req.revisionOf !== undefined) form.append('revisionOf', String(req.revisionOf));
  for (const f of req.files) form.append('files', new Blob([f.text], { type: 'application/json' }), f.name);
  const url = `${req.server.replace(/\/+$/, '')}/api/projects/${req.projectId}/submittals`;
  let status: number;
  let body: string;
  // One deadline for connecting, sending and the whole answer: a server that accepts the
  // connection and never answers must not hold a CI job until its own limit.
  const timeoutMs = req.timeoutMs ?? durationArg(DEFAULT_SUBMIT_TIMEOUT);
  const signal = AbortSignal.timeout(timeoutMs);
  try {
    const res = await fetchImpl(url, {
      method: 'POST',
      headers: { Authorization: `Bearer ${req.token}` },
      body: form,
      signal,
    });
    status = res.status;
    body = await res.text();
  } catch (err) {
    if (signal.aborted) {
      return {
        stdout: '',
        stderr: `ligament submit: no answer from ${req.server} within ${formatDuration(timeoutMs)} (--timeout); nothing is known to be uploaded\n`,
        exitCode: 2,
      };
    }
    const cause = err instanceof Error && err.cause instanceof Error ? `: ${err.cause.message}` : '';
    return { stdout: '', stderr: `ligament submit: cannot reach ${req.server}${cause}\n`, exitCode: 2 };
  }
  let parsed: unknown;
  try {
    parsed = JSON.parse(body);
  } catch {
    return { stdout: '', stderr: `ligament submit: ${status} from the server, not JSON\n`, exitCode: 2 };
  }
  if (status === 201) {
    const r = parsed as SubmitSummary;
    const failing = failingSeverities(req.failOn);
    const bad = failing.some((sev) => (r.summary.bySeverity as Record<string, number>)[sev]! > 0);
    const stdout = req.format === 'json' ? `${JSON.stringify(r, null, 2)}\n` : formatSubmitSummary(r);
    return { stdout, stderr: '', exitCode: bad ? 1 : 0 };
  }
  const err = parsed as { message?: string; details?: unknown[] };
  const message = err.message ?? `HTTP ${status}`;
  if (status === 422 && Array.isArray(err.details)) {
    const lines = (err.details as CalcError[]).map((e) =>
      'file' in e && 'rule' in e ? calcErrorLine(e) : JSON.stringify(e),
    );
    return { stdout: '', stderr: `${lines.join('\n')}\nligament submit: ${message}\n`, exitCode: 2 };
  }
  const hint =
    status === 401
      ? ' (check --token: it may be wrong or revoked)'
      : status === 403
        ? ' (an API token works only for the project it was made for)'
        : '';
  return { stdout: '', stderr: `ligament submit: ${status} ${message}${hint}\n`, exitCode: 2 };
}

/** `ligament submit --server URL --token TOKEN --project ID PATH…`: upload a submittal to a Ligament service. */
export function submitCommand(ctx: CliContext): Command {
  return new Command('submit')
    .description(
      'upload calc files as one submittal to a Ligament service and print its summary and web address',
    )
    .argument('<path...>', 'calc files, directories (searched for *.json), globs, or - for standard input')
    .option('--server <url>', 'the service, e.g. http://localhost:3000 (default: $LIGAMENT_SERVER)')
    .option('--token <token>', 'a personal API token for the project (default: $LIGAMENT_TOKEN)')
    .requiredOption('--project <id>', 'the project id', parsePositiveInt(Number.MAX_SAFE_INTEGER))
    .option('--title <title>', 'submittal title (default: "Submitted with ligament submit, <date>")')
    .option(
      '--revision-of <id>',
      'id of the submittal this one revises',
      parsePositiveInt(Number.MAX_SAFE_INTEGER),
    )
    .addOption(
      new Option(
        '--fail-on <level>',
        'exit 1 on: overstated = any error finding, any = any warning or error, none = never',
      )
        .choices(['overstated', 'any', 'none'])
        .default('overstated'),
    )
    .addOption(
      new Option('-f, --format <format>', 'summary format').choices(['text', 'json']).default('text'),
    )
    .addOption(
      new Option(
        '--timeout <duration>',
        'give up (exit 2) when the service has not answered in full within this time: 60s, 500ms, 2m',
      )
        .argParser(durationArg)
        .default(durationArg(DEFAULT_SUBMIT_TIMEOUT), DEFAULT_SUBMIT_TIMEOUT),
    )
    .addHelpText(
      'after',
      `
Examples:
  $ ligament submit --server http://localhost:3000 --token lgt_… --project 1 calcs/
  $ LIGAMENT_SERVER=https://ligament.example.test LIGAMENT_TOKEN=lgt_… ligament submit --project 1 --revision-of 12 calcs/
${EXIT_CODES_HELP}
     (submit: also a server that cannot be reached or does not answer within --timeout,
     a refused token, or any answer other than 201)`,
    )
    .action(async (paths: string[], flags: SubmitFlags) => {
      const server = flags.server ?? ctx.io.env['LIGAMENT_SERVER'];
      const token = flags.token ?? ctx.io.env['LIGAMENT_TOKEN'];
      if (!server) throw new UsageError('--server (or LIGAMENT_SERVER) is required');
      if (!token) throw new UsageError('--token (or LIGAMENT_TOKEN) is required');
      let base: URL;
      try {
        base = new URL(server);
      } catch {
        throw new UsageError(`--server must be a URL such as http://localhost:3000, not "${server}"`);
      }
      if (base.protocol !== 'http:' && base.protocol !== 'https:')
        throw new UsageError('--server must be http:// or https://');
      const { readSources } = await import('../node/sources.js');
      const files: { name: string; text: string }[] = [];
      const unreadable: CalcError[] = [];
      for await (const s of readSources(paths, { cwd: ctx.io.cwd, readStdin: ctx.io.readStdin })) {
        if ('error' in s) unreadable.push(s.error);
        else files.push({ name: s.file === '<stdin>' ? 'stdin.json' : s.file, text: s.text });
      }
      if (unreadable.length > 0) {
        ctx.io.stderr(`${unreadable.map(calcErrorLine).join('\n')}\nligament submit: nothing was uploaded\n`);
        setExitCode(ctx, 2);
        return;
      }
      if (files.length === 0) throw new UsageError('no calc files found in the paths given');
      const outcome = await runSubmit(
        {
          server: base.toString(),
          token,
          projectId: flags.project,
          title: flags.title ?? `Submitted with ligament submit, ${new Date().toISOString().slice(0, 10)}`,
          ...(flags.revisionOf !== undefined ? { revisionOf: flags.revisionOf } : {}),
          failOn: flags.failOn,
          format: flags.format,
          timeoutMs: flags.timeout,
          files,
        },
        (url, init) => fetch(url, init),
      );
      if (outcome.stdout) ctx.io.stdout(outcome.stdout);
      if (outcome.stderr) ctx.io.stderr(outcome.stderr);
      setExitCode(ctx, outcome.exitCode);
    });
}
