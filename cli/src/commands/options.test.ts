import { InvalidArgumentError } from 'commander';
import { describe, expect, it } from 'vitest';
import { colorEnabled, type CliIO } from './context.js';
import { directionArg, parsePositiveInt, toleranceArg } from './options.js';

const io = (env: Record<string, string>, tty: boolean): CliIO => ({
  stdout: () => undefined,
  stderr: () => undefined,
  readStdin: async () => '',
  cwd: '/',
  env,
  stdoutIsTTY: tty,
});

describe('option parsers', () => {
  it('directionArg accepts -x, +x and both, repeatable, without repeats', () => {
    expect(directionArg('-x', undefined)).toEqual(['-x']);
    expect(directionArg('+x', ['-x'])).toEqual(['-x', '+x']);
    expect(directionArg('both', undefined)).toEqual(['-x', '+x']);
    expect(directionArg('-x', ['-x'])).toEqual(['-x']);
    expect(() => directionArg('x', undefined)).toThrow(InvalidArgumentError);
  });

  it('parsePositiveInt takes whole numbers in range only', () => {
    const p = parsePositiveInt(100);
    expect(p('10')).toBe(10);
    for (const bad of ['0', '101', '2.5', 'ten', '-3']) expect(() => p(bad)).toThrow(InvalidArgumentError);
  });

  it('toleranceArg turns tolerance errors into usage errors', () => {
    expect(toleranceArg('1%', undefined).relative).toBe(0.01);
    expect(() => toleranceArg('1 parsec', undefined)).toThrow(InvalidArgumentError);
  });

  it('colour: --color wins; auto follows NO_COLOR, FORCE_COLOR, TERM=dumb and the terminal', () => {
    expect(colorEnabled('always', io({ NO_COLOR: '1' }, false), false)).toBe(true);
    expect(colorEnabled('never', io({}, true), false)).toBe(false);
    expect(colorEnabled('auto', io({}, true), false)).toBe(true);
    expect(colorEnabled('auto', io({}, false), false)).toBe(false);
    expect(colorEnabled('auto', io({ NO_COLOR: '1' }, true), false)).toBe(false);
    expect(colorEnabled('auto', io({ FORCE_COLOR: '1' }, false), false)).toBe(true);
    expect(colorEnabled('auto', io({ TERM: 'dumb' }, true), false)).toBe(false);
    expect(colorEnabled('auto', io({}, true), true)).toBe(false);
  });
});
