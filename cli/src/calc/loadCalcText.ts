import { getLocation, getNodeValue, parseTree, type Node, type ParseError } from 'jsonc-parser';
import { EngineError, inspectLayout, memberHoleWidth } from '../engine/index.js';
import { netAreaIssues } from './netAreaIssues.js';
import { normaliseDocument } from './normalise.js';
import { lineIndex, nodeAtPointer, escapeSegment } from './positions.js';
import type { CalcError, LoadResult, SourcePosition } from './types.js';
import { validateSchema } from './validateSchema.js';

// jsonc-parser's ParseErrorCode is a const enum; its values are fixed by the package.
const SYNTAX_MESSAGES: Record<number, string> = {
  1: 'unexpected character',
  2: 'invalid number',
  3: 'property name expected (in double quotes)',
  4: 'value expected',
  5: 'colon expected',
  6: 'comma expected',
  7: 'closing brace "}" expected',
  8: 'closing bracket "]" expected',
  9: 'unexpected text after the end of the JSON value',
  10: 'comments are not allowed in calc files',
  11: 'unterminated comment',
  12: 'unterminated string',
  13: 'unexpected end of number',
  14: 'invalid unicode escape',
  15: 'invalid escape character in string',
  16: 'control character in string (escape it)',
};

/** Wraps an issue with the file name and the source position of the pointer. */
function at(
  file: string,
  position: SourcePosition,
  pointer: string,
  rule: string,
  message: string,
): CalcError {
  return { file, pointer, line: position.line, column: position.column, rule, message };
}

function syntaxError(
  file: string,
  text: string,
  e: ParseError,
  position: (o: number) => SourcePosition,
): CalcError {
  let message = SYNTAX_MESSAGES[e.error] ?? 'invalid JSON';
  const before = text.slice(0, e.offset).trimEnd();
  if ((e.error === 3 || e.error === 4) && before.endsWith(','))
    message = 'trailing comma (not allowed in JSON)';
  if (e.offset >= text.length && (e.error === 7 || e.error === 8 || e.error === 4 || e.error === 12)) {
    message += ' before the end of the file';
  }
  const p = position(e.offset);
  return at(
    file,
    p,
    '',
    'json-syntax',
    `JSON syntax error at line ${p.line}, column ${p.column}: ${message} (rule json-syntax)`,
  );
}

/** Objects with the same key twice: JSON readers disagree about which value counts, so refuse. */
function duplicateKeys(root: Node, file: string, position: (o: number) => SourcePosition): CalcError[] {
  const out: CalcError[] = [];
  const walk = (node: Node, pointer: string): void => {
    if (node.type === 'object') {
      const seen = new Map<string, Node>();
      for (const prop of node.children ?? []) {
        const [k, v] = prop.children ?? [];
        if (!k) continue;
        const key = String(k.value);
        const first = seen.get(key);
        const child = `${pointer}/${escapeSegment(key)}`;
        if (first) {
          const fp = position(first.offset);
          out.push(
            at(
              file,
              position(k.offset),
              child,
              'duplicate-key',
              `${child}: property "${key}" appears twice (first at line ${fp.line}, column ${fp.column}); keep one (rule duplicate-key)`,
            ),
          );
        } else {
          seen.set(key, k);
        }
        if (v) walk(v, child);
      }
    } else if (node.type === 'array') {
      (node.children ?? []).forEach((c, i) => walk(c, `${pointer}/${i}`));
    }
  };
  walk(root, '');
  return out;
}

/** A calc file nests about six levels; deeper input is refused before anything recurses over it. */
const MAX_DEPTH = 32;

/**
 * Offset of the first `[` or `{` nested deeper than MAX_DEPTH, or -1. A plain scan of the text: the
 * JSON parser and everything after it recurse, and a file of 20,000 brackets overflowed the stack.
 */
function tooDeepAt(text: string): number {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (inString) {
      if (c === '\\') i++;
      else if (c === '"') inString = false;
    } else if (c === '"') inString = true;
    else if (c === '[' || c === '{') {
      if (++depth > MAX_DEPTH) return i;
    } else if (c === ']' || c === '}') depth--;
  }
  return -1;
}

const byPosition = (a: CalcError, b: CalcError): number => a.line - b.line || a.column - b.column;

/**
 * Reads a calc file's text: JSON syntax (with positions), the calc schema, then the rules the schema
 * cannot express (fractions, units, slots, duplicate ids, holes outside the plate or overlapping).
 *
 * @param text the file's contents
 * @param fileName the name to report errors under
 * @returns the normalised document and a `locate` for pointers, or every error found, each with file,
 *   JSON pointer, 1-based line and column, rule and a message naming all three
 * @example
 * const r = loadCalcText('{"format": "ligament-calc"}', 'a.json');
 * // r.ok === false; r.errors[0]: { pointer: '', rule: 'required', message: '(document): missing required property "formatVersion" (rule required)', … }
 */
export function loadCalcText(text: string, fileName: string): LoadResult {
  const file = fileName;
  // A byte order mark is not JSON; blank it so offsets still match the text.
  const source = text.startsWith('\uFEFF') ? ` ${text.slice(1)}` : text;
  const position = lineIndex(source);
  if (source.trim() === '') {
    return {
      ok: false,
      file,
      errors: [at(file, { line: 1, column: 1 }, '', 'json-syntax', 'file is empty (rule json-syntax)')],
    };
  }
  const deepAt = tooDeepAt(source);
  if (deepAt >= 0) {
    // getLocation stops at the offset, so it recurses only MAX_DEPTH levels.
    const pointer = getLocation(source, deepAt)
      .path.map((segment) => `/${escapeSegment(String(segment))}`)
      .join('');
    const message = `${pointer || '(document)'}: nests more than ${MAX_DEPTH} levels deep; a calc file needs fewer than ten (rule json-depth)`;
    return { ok: false, file, errors: [at(file, position(deepAt), pointer, 'json-depth', message)] };
  }
  const parseErrors: ParseError[] = [];
  const root = parseTree(source, parseErrors, {
    disallowComments: true,
    allowTrailingComma: false,
    allowEmptyContent: false,
  });
  const firstSyntax = parseErrors[0];
  if (firstSyntax || !root) {
    // Later syntax errors are usually echoes of the first; report the first only.
    const e = firstSyntax ?? { error: 4, offset: 0, length: 0 };
    return { ok: false, file, errors: [syntaxError(file, source, e, position)] };
  }

  const locateNode = (pointer: string): { node: Node; exact: boolean; key?: Node } =>
    nodeAtPointer(root, pointer);
  const locate = (pointer: string): SourcePosition => position(locateNode(pointer).node.offset);

  const errors: CalcError[] = duplicateKeys(root, file, position);
  const value: unknown = getNodeValue(root);
  for (const issue of validateSchema(value)) {
    const found = locateNode(issue.pointer);
    const offset = issue.atKey && found.key ? found.key.offset : found.node.offset;
    errors.push(at(file, position(offset), issue.pointer, issue.rule, issue.message));
  }
  if (errors.length > 0) return { ok: false, file, errors: errors.sort(byPosition) };

  const { document, issues } = normaliseDocument(value as Record<string, unknown>);
  for (const issue of issues)
    errors.push(at(file, locate(issue.pointer), issue.pointer, issue.rule, issue.message));
  // Layout checks need every number read; what could not be read has been reported above.
  if (errors.length > 0) return { ok: false, file, errors: errors.sort(byPosition) };
  for (const member of document.members) {
    const m = member.input;
    let sizesKnown = true;
    m.holes.forEach((hole, i) => {
      if (hole.dimension) return;
      try {
        memberHoleWidth(hole, document.profile);
      } catch (err) {
        if (!(err instanceof EngineError)) throw err;
        sizesKnown = false;
        const pointer = `/members/${member.index}/holes/${i}/bolt`;
        errors.push(
          at(
            file,
            locate(pointer),
            pointer,
            'bolt-size',
            `${pointer}: ${err.message.replace(/^ligament\/engine: /, '')}; give an explicit "size" (rule bolt-size)`,
          ),
        );
      }
    });
    if (!sizesKnown) continue;
    // A section's holes were placed by element and gauge above (hole-outside-element); of the plate's
    // layout rules only unique ids apply.
    const layoutIssues = inspectLayout(m, document.profile).filter((f) => !m.section || f.code === 'LG303');
    for (const f of layoutIssues) {
      const pointer = `/members/${member.index}${f.pointer}`;
      errors.push(at(file, locate(pointer), pointer, f.name, `${pointer}: ${f.message} (rule ${f.name})`));
    }
    if (layoutIssues.length > 0) continue;
    // A least chain with a net width or area ≤ 0: an input error, never a negative strength.
    const net = netAreaIssues(m, document.profile);
    if (net) {
      const pointer = `/members/${member.index}${net.pointer}`;
      errors.push(
        at(file, locate(pointer), pointer, net.rule, `${pointer}: ${net.message} (rule ${net.rule})`),
      );
    }
  }
  if (errors.length > 0) return { ok: false, file, errors: errors.sort(byPosition) };
  return { ok: true, file, document, locate };
}
