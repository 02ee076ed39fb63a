import type { UnitSystem } from '../engine/types.js';
import { LengthError, parseLength, type ParseLengthOptions } from './parseLength.js';
import type { CalcReaders, Len, SemanticIssue } from './normaliseTypes.js';

const METRIC_BOLT = /^M(\d+)$/;

/**
 * The readers of a calc file's numbers in its unit system: lengths ({@link parseLength}; in a `mm`
 * file only plain numbers, rule mm-plain-number) and bolt sizes (a diameter, or `M20` in a `mm` file
 * only, rule bolt-units). A value that cannot be read becomes NaN and an issue with its pointer and
 * rule, so every problem of a file is reported at once.
 *
 * @param units - the file's unit system
 * @returns the readers and the issues they collect
 * @example
 * const r = calcReaders('in');
 * r.length('2-1/8', '/members/0/width') // → 2.125
 * r.bolt('M20', '/members/0/holes/0/bolt') // → 20, with a bolt-units issue (metric bolt in an in file)
 */
export function calcReaders(units: UnitSystem): CalcReaders {
  const issues: SemanticIssue[] = [];
  const length = (value: Len, pointer: string, options: ParseLengthOptions = {}): number => {
    if (typeof value === 'string' && units === 'mm') {
      issues.push({
        pointer,
        rule: 'mm-plain-number',
        message: `${pointer}: ${JSON.stringify(value)} is a string; lengths in a "mm" file are plain numbers (rule mm-plain-number)`,
      });
      return Number.NaN;
    }
    try {
      return parseLength(value, options);
    } catch (err) {
      if (!(err instanceof LengthError)) throw err;
      issues.push({ pointer, rule: err.rule, message: `${pointer}: ${err.message} (rule ${err.rule})` });
      return Number.NaN;
    }
  };
  const bolt = (value: Len, pointer: string): number => {
    const metric = typeof value === 'string' ? METRIC_BOLT.exec(value) : null;
    if (metric) {
      if (units !== 'mm') {
        issues.push({
          pointer,
          rule: 'bolt-units',
          message: `${pointer}: metric bolt ${JSON.stringify(value)} in an "in" file; give the diameter in inches, e.g. "3/4" (rule bolt-units)`,
        });
      }
      return Number(metric[1]);
    }
    if (typeof value === 'string' && units === 'mm') {
      issues.push({
        pointer,
        rule: 'bolt-units',
        message: `${pointer}: ${JSON.stringify(value)} in a "mm" file; give a metric size such as "M20" or the diameter in mm (rule bolt-units)`,
      });
      return Number.NaN;
    }
    return length(value, pointer);
  };
  return { units, length, bolt, issues };
}
