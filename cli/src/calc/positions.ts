import type { Node } from 'jsonc-parser';
import type { SourcePosition } from './types.js';

/**
 * Turns character offsets into 1-based line and column numbers. Lines end at LF, CRLF or CR;
 * columns count UTF-16 code units, as editors that speak LSP do.
 */
export function lineIndex(text: string): (offset: number) => SourcePosition {
  const starts = [0];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 13 /* CR */) {
      if (text.charCodeAt(i + 1) === 10) i++;
      starts.push(i + 1);
    } else if (c === 10 /* LF */) {
      starts.push(i + 1);
    }
  }
  return (offset) => {
    let lo = 0;
    let hi = starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if ((starts[mid] ?? 0) <= offset) lo = mid;
      else hi = mid - 1;
    }
    return { line: lo + 1, column: offset - (starts[lo] ?? 0) + 1 };
  };
}

/** Splits an RFC 6901 JSON pointer into its unescaped segments ("" is the whole document). */
export function pointerSegments(pointer: string): string[] {
  if (pointer === '') return [];
  return pointer
    .slice(1)
    .split('/')
    .map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'));
}

/** Escapes one segment for a JSON pointer. */
export function escapeSegment(segment: string | number): string {
  return String(segment).replace(/~/g, '~0').replace(/\//g, '~1');
}

/**
 * The node at a JSON pointer, or the nearest ancestor that exists. `property` nodes are skipped:
 * the result is always a value node. `key` is set when the last segment named an existing property.
 */
export function nodeAtPointer(root: Node, pointer: string): { node: Node; exact: boolean; key?: Node } {
  let node = root;
  let key: Node | undefined;
  for (const seg of pointerSegments(pointer)) {
    let next: Node | undefined;
    key = undefined;
    if (node.type === 'object') {
      // The last of duplicate keys wins, as in JSON.parse.
      for (const prop of node.children ?? []) {
        const [k, v] = prop.children ?? [];
        if (k?.value === seg && v) {
          next = v;
          key = k;
        }
      }
    } else if (node.type === 'array' && /^(0|[1-9]\d*)$/.test(seg)) {
      next = node.children?.[Number(seg)];
    }
    if (!next) return { node, exact: false };
    node = next;
  }
  return key ? { node, exact: true, key } : { node, exact: true };
}
