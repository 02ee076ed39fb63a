/**
 * Test helpers: run the program in-process with fake streams (exitOverride, no process exit), or
 * run the built binary (`node dist/cli.js`) as a user would.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Ajv2020 } from 'ajv/dist/2020.js';
import * as addFormatsMod from 'ajv-formats';
import type { FormatsPlugin } from 'ajv-formats';
import { createContext } from '../src/commands/context.js';
import { runProgram } from '../src/program.js';

export const CLI_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const REPO_ROOT = resolve(CLI_ROOT, '..');
export const EXAMPLES = join(REPO_ROOT, 'schema', 'examples');
/** One invalid calc file per kind of error, kept out of examples/ so `ligament validate schema/examples/` passes. */
export const INVALID_EXAMPLES = join(REPO_ROOT, 'schema', 'invalid-examples');
export const FIXTURES = join(CLI_ROOT, 'test', 'fixtures');
export const BIN = join(CLI_ROOT, 'dist', 'cli.js');

export interface RunResult {
  readonly stdout: string;
  readonly stderr: string;
  readonly exitCode: number;
}

export interface RunOptions {
  readonly cwd?: string;
  readonly stdin?: string;
  readonly env?: Record<string, string | undefined>;
  readonly tty?: boolean;
}

/** Runs `ligament ARGS…` in-process. */
export async function run(args: readonly string[], options: RunOptions = {}): Promise<RunResult> {
  let stdout = '';
  let stderr = '';
  const ctx = createContext(
    {
      stdout: (s) => void (stdout += s),
      stderr: (s) => void (stderr += s),
      readStdin: async () => options.stdin ?? '',
      cwd: options.cwd ?? REPO_ROOT,
      env: options.env ?? {},
      stdoutIsTTY: options.tty ?? false,
    },
    '0.1.0',
  );
  const exitCode = await runProgram(ctx, args);
  return { stdout, stderr, exitCode };
}

/** Runs the built binary with Node. */
export function runBin(args: readonly string[], options: RunOptions = {}): RunResult {
  const r = spawnSync(process.execPath, [BIN, ...args], {
    cwd: options.cwd ?? REPO_ROOT,
    input: options.stdin ?? '',
    env: { PATH: process.env['PATH'], ...options.env },
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  return { stdout: r.stdout, stderr: r.stderr, exitCode: r.status ?? -1 };
}

export function tempDir(prefix = 'ligament-test-'): { path: string; remove: () => void } {
  const path = mkdtempSync(join(tmpdir(), prefix));
  return { path, remove: () => rmSync(path, { recursive: true, force: true }) };
}

const m: unknown = addFormatsMod;
const mod = m as { default?: unknown };
const addFormats = (
  typeof m === 'function'
    ? m
    : typeof mod.default === 'function'
      ? mod.default
      : (mod.default as { default: unknown }).default
) as FormatsPlugin;

/** A validator for a JSON Schema file (2020-12). */
export function schemaValidator(path: string) {
  const ajv = new Ajv2020({ allErrors: true, strict: false });
  addFormats(ajv);
  return ajv.compile(JSON.parse(readFileSync(path, 'utf8')) as object);
}

/** The source line (1-based) of a file. */
export function lineOf(path: string, line: number): string {
  return readFileSync(path, 'utf8').split('\n')[line - 1] ?? '';
}
