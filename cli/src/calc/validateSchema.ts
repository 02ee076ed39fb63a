import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ErrorObject, ValidateFunction } from 'ajv/dist/2020.js';
import * as addFormatsModule from 'ajv-formats';
import { CALC_SCHEMA } from './schema.js';
import { escapeSegment } from './positions.js';

/** One schema violation, before it is given a file name and a position. */
export interface SchemaIssue {
  readonly pointer: string;
  readonly rule: string;
  readonly message: string;
  /** Position the issue at the property's key rather than its value (unknown properties). */
  readonly atKey?: boolean;
}

type FormatsFn = (ajv: unknown) => unknown;

// ajv-formats is CommonJS with only a default export; how it surfaces differs between Node ESM,
// bundlers and CJS transpilers (stack notes §3.2), so take whichever shape arrives.
function formatsPlugin(): FormatsFn {
  const m = addFormatsModule as unknown as { default?: unknown };
  const candidates = [m, m.default, (m.default as { default?: unknown } | undefined)?.default];
  const fn = candidates.find((c): c is FormatsFn => typeof c === 'function');
  if (!fn) throw new Error('calc: ajv-formats did not load');
  return fn;
}

let compiled: ValidateFunction | undefined;

/** The compiled calc schema validator; compiled on first use, then cached. */
export function calcValidator(): ValidateFunction {
  if (!compiled) {
    // strict: unknown keywords or contradictory schemas fail at compile time, not silently.
    // allowUnionTypes: lengths are `number | string`.
    const ajv = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true, verbose: true });
    formatsPlugin()(ajv);
    compiled = ajv.compile(CALC_SCHEMA);
  }
  return compiled;
}

const defs = CALC_SCHEMA['$defs'] as Record<string, unknown>;

// What a value failing a `pattern` should have looked like, by the definition it failed.
const PATTERN_HINTS = new Map<unknown, string>([
  [defs['length'], 'a length: a number greater than 0, or a string such as "2-1/8", "15/16", "3" or "1.5"'],
  [defs['coordinateX'], 'a coordinate: a number, or a string such as "2-1/2", "-3/4" or "7.5"'],
  [defs['coordinateY'], 'a coordinate: a number of 0 or more, or a string such as "2-1/2" or "7.5"'],
  [
    defs['bolt'],
    'a bolt size: "3/4", "7/8", "1-1/8" or a number in an "in" file; "M16" to "M36" or a number in a "mm" file',
  ],
  [
    defs['identifier'],
    'an id of letters, digits, ".", "_" and "-", starting with a letter or digit (at most 40 characters)',
  ],
]);

const TYPE_WORDS: Record<string, string> = {
  number: 'a number',
  integer: 'a whole number',
  string: 'a string',
  object: 'an object',
  array: 'an array',
  boolean: 'true or false',
  null: 'null',
};

function orList(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} or ${items[items.length - 1] ?? ''}`;
}

function show(value: unknown): string {
  if (typeof value === 'number' && !Number.isFinite(value)) return String(value);
  const s = JSON.stringify(value);
  if (s === undefined) return String(value);
  return s.length > 40 ? `${s.slice(0, 37)}...` : s;
}

function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diag = row[0] ?? 0;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const up = row[j] ?? 0;
      const cost = a[i - 1]?.toLowerCase() === b[j - 1]?.toLowerCase() ? 0 : 1;
      row[j] = Math.min(up + 1, (row[j - 1] ?? 0) + 1, diag + cost);
      diag = up;
    }
  }
  return row[b.length] ?? 0;
}

/** The allowed property closest to a misspelt one, if it is close enough to be a likely typo. */
function suggestion(extra: string, parentSchema: unknown): string | undefined {
  const props = (parentSchema as { properties?: Record<string, unknown> } | undefined)?.properties;
  if (!props) return undefined;
  let best: string | undefined;
  let bestD = Infinity;
  for (const name of Object.keys(props)) {
    const d = editDistance(extra, name);
    if (d < bestD) {
      best = name;
      bestD = d;
    }
  }
  return best !== undefined && bestD <= Math.max(1, Math.floor(best.length / 3)) ? best : undefined;
}

function describe(e: ErrorObject): string {
  const p = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'type': {
      const types = Array.isArray(p['type']) ? (p['type'] as string[]) : [String(p['type'])];
      const hint =
        e.parentSchema === defs['slotSize'] ? ' (a slotted hole\'s size is { "width", "length" })' : '';
      return `must be ${orList(types.map((t) => TYPE_WORDS[t] ?? t))}, not ${show(e.data)}${hint}`;
    }
    case 'exclusiveMinimum':
      return `must be greater than ${String(p['limit'])}`;
    case 'minimum':
      return `must be at least ${String(p['limit'])}`;
    case 'maximum':
      return `must be at most ${String(p['limit'])}`;
    case 'exclusiveMaximum':
      return `must be less than ${String(p['limit'])}`;
    case 'pattern': {
      const hint = PATTERN_HINTS.get(e.parentSchema) ?? `text matching ${String(p['pattern'])}`;
      return `${show(e.data)} is not ${hint}`;
    }
    case 'enum': {
      const allowed = ((e.schema as unknown[] | undefined) ?? []).map((v) => show(v));
      return `must be one of ${orList(allowed)}, not ${show(e.data)}`;
    }
    case 'const':
      return `must be ${show(p['allowedValue'])}, not ${show(e.data)}`;
    case 'format':
      return p['format'] === 'date'
        ? `${show(e.data)} is not a date written YYYY-MM-DD`
        : `${show(e.data)} is not a valid ${String(p['format'])}`;
    case 'minItems':
      return `must have at least ${String(p['limit'])} item${p['limit'] === 1 ? '' : 's'}`;
    case 'maxItems':
      return `must have at most ${String(p['limit'])} item${p['limit'] === 1 ? '' : 's'}`;
    case 'uniqueItems':
      return `items ${String(p['j'])} and ${String(p['i'])} are the same (${show((e.data as unknown[])[Number(p['i'])])})`;
    case 'minLength':
      return p['limit'] === 1
        ? 'must not be empty'
        : `must be at least ${String(p['limit'])} characters long`;
    case 'maxLength':
      return `must be at most ${String(p['limit'])} characters long`;
    default:
      return e.message ?? `fails ${e.keyword}`;
  }
}

function label(pointer: string): string {
  return pointer === '' ? '(document)' : pointer;
}

/**
 * Validates a parsed calc file against the calc schema and turns ajv's errors into plain-words
 * issues: one per problem, `if` and `anyOf` bookkeeping folded away.
 */
export function validateSchema(value: unknown): SchemaIssue[] {
  const validate = calcValidator();
  if (validate(value)) return [];
  const errors = validate.errors ?? [];
  const issues: SchemaIssue[] = [];
  // anyOf branches report each failed branch; fold them into the anyOf error itself.
  const anyOfs = errors.filter((e) => e.keyword === 'anyOf');
  const inAnyOf = (e: ErrorObject) =>
    anyOfs.some(
      (a) =>
        a !== e && e.instancePath.startsWith(a.instancePath) && e.schemaPath.startsWith(`${a.schemaPath}/`),
    );
  for (const e of errors) {
    if (e.keyword === 'if' || inAnyOf(e)) continue;
    const p = e.params as Record<string, unknown>;
    if (e.keyword === 'required') {
      const missing = String(p['missingProperty']);
      const hint = missing === 'slot' ? ' (a slotted hole needs "slot": "along" or "across")' : '';
      issues.push({
        pointer: e.instancePath,
        rule: 'required',
        message: `${label(e.instancePath)}: missing required property "${missing}"${hint} (rule required)`,
      });
    } else if (e.keyword === 'additionalProperties') {
      const extra = String(p['additionalProperty']);
      const pointer = `${e.instancePath}/${escapeSegment(extra)}`;
      const near = suggestion(extra, e.parentSchema);
      issues.push({
        pointer,
        rule: 'additionalProperties',
        message: `${pointer}: unknown property "${extra}"${near ? ` (did you mean "${near}"?)` : ''} (rule additionalProperties)`,
        atKey: true,
      });
    } else if (e.keyword === 'anyOf') {
      const branches = errors.filter(
        (b) => b !== e && b.instancePath === e.instancePath && b.schemaPath.startsWith(`${e.schemaPath}/`),
      );
      const names = branches
        .filter((b) => b.keyword === 'required')
        .map((b) => `"${String((b.params as Record<string, unknown>)['missingProperty'])}"`);
      const what =
        names.length === branches.length && names.length > 0
          ? `needs ${orList(names)}`
          : 'matches none of the allowed forms';
      issues.push({
        pointer: e.instancePath,
        rule: 'anyOf',
        message: `${label(e.instancePath)}: ${what} (rule anyOf)`,
      });
    } else {
      issues.push({
        pointer: e.instancePath,
        rule: e.keyword,
        message: `${label(e.instancePath)}: ${describe(e)} (rule ${e.keyword})`,
      });
    }
  }
  return issues;
}
