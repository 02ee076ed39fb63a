// The test reads the READMEs from disk; the engine itself never does.
// eslint-disable-next-line no-restricted-imports
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CAUTION } from './caution.js';

/** A Markdown file's text with its line breaks and blockquote marks read as single spaces. */
const prose = (path: string) =>
  readFileSync(new URL(`../../../${path}`, import.meta.url), 'utf8').replace(/\s*\n>?\s*/g, ' ');

describe('CAUTION', () => {
  it('is word for word the sentence the READMEs and the contributor guide carry', () => {
    expect(CAUTION).toBe(
      'Ligament is a checking aid. The engineer of record decides; the governing code and local requirements apply.',
    );
    for (const path of ['README.md', 'cli/README.md', 'web/README.md', 'DEVELOPERS.md']) {
      expect(prose(path), path).toContain(CAUTION);
    }
  });
});
