/**
 * Parsers for option values, used by commander (so a bad value is a usage error, exit 2) and by
 * the actions to build typed settings.
 */
import { InvalidArgumentError, Option } from './commander.js';
import type { LoadDirection } from '../engine/types.js';
import { collectTolerance, ToleranceError } from '../runner/tolerance.js';
import type { CommandLineTolerance } from '../runner/types.js';

export const FORMATS = ['text', 'json', 'junit', 'sarif', 'markdown'] as const;
export type Format = (typeof FORMATS)[number];

export function parsePositiveInt(max: number) {
  return (value: string): number => {
    if (!/^\d+$/.test(value.trim()))
      throw new InvalidArgumentError(`expected a whole number from 1 to ${max}`);
    const n = Number(value);
    if (n < 1 || n > max) throw new InvalidArgumentError(`expected a whole number from 1 to ${max}`);
    return n;
  };
}

/** Longest `--timeout`: a day. */
const MAX_TIMEOUT_MS = 24 * 60 * 60 * 1000;

/**
 * `--timeout 60s`: a duration in milliseconds. Accepts `500ms`, `30s`, `2m`, or a bare number of
 * seconds; from 1 ms to a day.
 */
export function durationArg(value: string): number {
  const m = /^(\d+(?:\.\d+)?)\s*(ms|s|m)?$/.exec(value.trim());
  const ms = m ? Number(m[1]) * (m[2] === 'ms' ? 1 : m[2] === 'm' ? 60_000 : 1000) : NaN;
  if (!Number.isFinite(ms) || ms < 1 || ms > MAX_TIMEOUT_MS)
    throw new InvalidArgumentError('expected a duration such as 60s, 500ms or 2m (at most 24 hours)');
  return Math.round(ms);
}

export function toleranceArg(
  value: string,
  previous: CommandLineTolerance | undefined,
): CommandLineTolerance {
  try {
    return collectTolerance(value, previous);
  } catch (err) {
    if (err instanceof ToleranceError) throw new InvalidArgumentError(err.message);
    throw err;
  }
}

/** `--direction -x|+x|both`, repeatable. */
export function directionArg(value: string, previous: LoadDirection[] | undefined): LoadDirection[] {
  const list = previous ?? [];
  const v = value.trim();
  const wanted: LoadDirection[] = v === 'both' ? ['-x', '+x'] : v === '-x' || v === '+x' ? [v] : [];
  if (wanted.length > 0) return [...list, ...wanted.filter((d) => !list.includes(d))];
  throw new InvalidArgumentError('expected -x, +x or both');
}

export function directionOption(): Option {
  return new Option(
    '--direction <dir>',
    'only this load direction: -x (pulled at the −x end), +x, or both (repeatable)',
  ).argParser(directionArg);
}

export function colorOption(): Option {
  return new Option('--color <when>', 'colour the text output')
    .choices(['auto', 'always', 'never'])
    .default('auto');
}
