import { DEFAULT_TOLERANCE } from '../engine/findings/withinTolerance.js';
import type { UnitSystem } from '../engine/types.js';
import type { AbsoluteTolerance, ToleranceDimension, CommandLineTolerance } from './types.js';
import type { Tolerance } from '../engine/findings/types.js';

/** `--tolerance` when none is given: the engine's DEFAULT_TOLERANCE (0.5 % relative). */
export const DEFAULT_COMMAND_LINE_TOLERANCE: CommandLineTolerance = {
  relative: DEFAULT_TOLERANCE.relative,
  absolute: [],
};

const UNITS: Record<string, { dimension: ToleranceDimension; units: UnitSystem }> = {
  in: { dimension: 'length', units: 'in' },
  mm: { dimension: 'length', units: 'mm' },
  in2: { dimension: 'area', units: 'in' },
  'in^2': { dimension: 'area', units: 'in' },
  'in²': { dimension: 'area', units: 'in' },
  mm2: { dimension: 'area', units: 'mm' },
  'mm^2': { dimension: 'area', units: 'mm' },
  'mm²': { dimension: 'area', units: 'mm' },
  kip: { dimension: 'force', units: 'in' },
  kips: { dimension: 'force', units: 'in' },
  kn: { dimension: 'force', units: 'mm' },
};

/** Factors from the `mm` system to the `in` system: 1 in = 25.4 mm (exact), 1 kip = 4.4482216 kN. */
const MM_PER_IN = 25.4;
const KN_PER_KIP = 4.4482216152605;
const TO_IN: Record<ToleranceDimension, number> = {
  length: 1 / MM_PER_IN,
  area: 1 / (MM_PER_IN * MM_PER_IN),
  force: 1 / KN_PER_KIP,
};

/** Why a tolerance could not be read; the message is fit for a usage error. */
export class ToleranceError extends Error {
  override readonly name = 'ToleranceError';
}

/**
 * Reads one `--tolerance` value: a percentage (`0.5%`) or an absolute value with a unit (`0.02in`,
 * `0.5mm`, `0.01in2`, `5mm2`, `1kip`, `2kN`).
 *
 * @example
 * parseToleranceValue('0.5%') // → { relative: 0.005 }
 * parseToleranceValue('0.02in') // → { absolute: { dimension: 'length', value: 0.02, units: 'in', text: '0.02in' } }
 */
export function parseToleranceValue(text: string): { relative: number } | { absolute: AbsoluteTolerance } {
  const trimmed = text.trim();
  const match = /^(\d+(?:\.\d+)?|\.\d+)\s*(%|[a-zA-Z²^0-9]+)$/.exec(trimmed);
  if (!match) {
    throw new ToleranceError(
      `"${text}" is not a tolerance: write a percentage (0.5%) or a value with a unit (0.02in, 0.5mm, 0.01in2, 5mm2, 1kip, 2kN)`,
    );
  }
  const value = Number(match[1]);
  const unit = match[2] ?? '';
  if (unit === '%') {
    if (value >= 100) throw new ToleranceError(`a relative tolerance of ${trimmed} is not below 100%`);
    return { relative: value / 100 };
  }
  const known = UNITS[unit.toLowerCase()];
  if (!known) {
    throw new ToleranceError(
      `unknown unit "${unit}" in tolerance "${text}": use %, in, mm, in2, mm2, kip or kN`,
    );
  }
  return { absolute: { ...known, value, text: trimmed } };
}

/** Adds one `--tolerance` value to those already given (commander's collect pattern). */
export function collectTolerance(
  text: string,
  previous: CommandLineTolerance | undefined,
): CommandLineTolerance {
  const base = previous ?? DEFAULT_COMMAND_LINE_TOLERANCE;
  const parsed = parseToleranceValue(text);
  if ('relative' in parsed) return { ...base, relative: parsed.relative };
  const others = base.absolute.filter((a) => a.dimension !== parsed.absolute.dimension);
  return { ...base, absolute: [...others, parsed.absolute] };
}

/**
 * The engine's tolerance for a file in the given unit system: absolute values given in the other
 * system are converted (1 in = 25.4 mm, 1 kip = 4.4482 kN).
 */
export function resolveTolerance(spec: CommandLineTolerance, units: UnitSystem): Tolerance {
  if (spec.absolute.length === 0) return { relative: spec.relative };
  const absolute: { length?: number; area?: number; force?: number } = {};
  for (const a of spec.absolute) {
    let value = a.value;
    if (a.units !== units) value = units === 'in' ? value * TO_IN[a.dimension] : value / TO_IN[a.dimension];
    absolute[a.dimension] = value;
  }
  return { relative: spec.relative, absolute };
}

/** How a tolerance reads in a report, e.g. `0.5%, 0.02in`. */
export function describeTolerance(spec: CommandLineTolerance): string {
  const parts = [`${Number((spec.relative * 100).toPrecision(6))}%`];
  for (const a of spec.absolute) parts.push(a.text);
  return parts.join(', ');
}
