import { parseTree } from 'jsonc-parser';
import { describe, expect, it } from 'vitest';
import { escapeSegment, lineIndex, nodeAtPointer, pointerSegments } from './positions.js';

describe('lineIndex', () => {
  it('gives 1-based line and column for offsets across LF, CRLF and CR line ends', () => {
    const at = lineIndex('ab\ncd\r\nef\rgh');
    expect(at(0)).toEqual({ line: 1, column: 1 });
    expect(at(1)).toEqual({ line: 1, column: 2 });
    expect(at(3)).toEqual({ line: 2, column: 1 });
    expect(at(7)).toEqual({ line: 3, column: 1 });
    expect(at(10)).toEqual({ line: 4, column: 1 });
    expect(at(11)).toEqual({ line: 4, column: 2 });
  });
});

describe('JSON pointers', () => {
  it('splits and unescapes RFC 6901 segments, and escapes them back', () => {
    expect(pointerSegments('')).toEqual([]);
    expect(pointerSegments('/a~1b/~0c/0')).toEqual(['a/b', '~c', '0']);
    expect(escapeSegment('a/b~c')).toBe('a~1b~0c');
  });

  it('finds the value at a pointer, or the nearest existing ancestor', () => {
    const text = '{"members": [{"id": "A", "holes": [{"x": 1}]}], "a/b": 2}';
    const root = parseTree(text)!;
    const hit = nodeAtPointer(root, '/members/0/holes/0/x');
    expect(hit.exact).toBe(true);
    expect(hit.node.offset).toBe(text.indexOf('1}'));
    expect(hit.key?.offset).toBe(text.indexOf('"x"'));
    const miss = nodeAtPointer(root, '/members/0/holes/5/x');
    expect(miss.exact).toBe(false);
    expect(miss.node.offset).toBe(text.indexOf('[{"x"'));
    expect(nodeAtPointer(root, '/a~1b').node.offset).toBe(text.indexOf('2}'));
    expect(nodeAtPointer(root, '/members/01').exact).toBe(false);
  });
});
