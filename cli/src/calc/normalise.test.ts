// Tests read the example files from disk; the calc layer itself never does.
// eslint-disable-next-line no-restricted-imports
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { normaliseDocument } from './normalise.js';

const example = (name: string) =>
  JSON.parse(readFileSync(new URL(`../../../schema/examples/${name}`, import.meta.url), 'utf8'));

describe('normaliseDocument', () => {
  it('reads the example north-splice-correct.json with no issue: meta, profile and every member', () => {
    const raw = example('north-splice-correct.json');
    const { document, issues } = normaliseDocument(raw);
    expect(issues).toEqual([]);
    expect(document.format).toBe('ligament-calc');
    expect(document.meta.project).toBe(raw.meta.project);
    expect(document.profile).toMatchObject({
      standard: raw.code.standard,
      method: raw.code.method,
      units: 'in',
    });
    expect(document.members.map((m) => [m.index, m.input.id])).toEqual(
      raw.members.map((m: { id: string }, i: number) => [i, m.id]),
    );
  });

  it('duplicate-member-id at the second member, members’ issues before the code’s', () => {
    const raw = example('north-splice-correct.json');
    raw.members = [raw.members[0], { ...raw.members[0], width: '14 in' }];
    raw.code = { ...raw.code, nationalAnnex: { gammaM0: 1 } };
    expect(normaliseDocument(raw).issues.map((i) => [i.pointer, i.rule])).toEqual([
      ['/members/1/id', 'duplicate-member-id'],
      ['/members/1/width', expect.any(String)],
      ['/code/nationalAnnex', 'national-annex-standard'],
    ]);
  });
});
