// Reading section members, shear lag, block shear and the EN 1993 / CSA S16 code profiles (issue 6).
// eslint-disable-next-line no-restricted-imports
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCalcText } from './loadCalcText.js';
import type { CalcDocument, CalcError, LoadResult } from './types.js';

const EXAMPLES = new URL('../../../schema/examples/', import.meta.url);
const text = (name: string): string => readFileSync(new URL(name, EXAMPLES), 'utf8');

function loaded(r: LoadResult): CalcDocument {
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.document;
}
function failed(r: LoadResult): readonly CalcError[] {
  if (r.ok) throw new Error('expected errors');
  return r.errors;
}
// The variants edit parsed JSON of known shape in place; typing every path would only restate it.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Json = Record<string, any>;
function variant(name: string, change: (doc: Json) => void): string {
  const doc = JSON.parse(text(name)) as Json;
  change(doc);
  return JSON.stringify(doc, null, 2);
}

describe('loadCalcText: section members', () => {
  it('reads an angle: section dimensions to numbers, holes by element and gauge at their unfolded y', () => {
    const doc = loaded(loadCalcText(text('lantern-brace-angle.json'), 'brace.json'));
    const m = doc.members[0]!.input;
    expect(m.kind).toBe('angle');
    expect(m.section).toEqual({ shape: 'angle', a: 4, b: 4, t: 0.375, tabulatedAg: 2.86 });
    // Unfolded width a + b − t = 7.625 (AISC 360 B4.3b); leg a is laid out from its toe: y = a − g.
    expect(m.width).toBeCloseTo(7.625, 12);
    expect(m.thickness).toBe(0.375);
    expect(m.holes.map((h) => [h.element, h.gauge, h.y])).toEqual(
      Array.from({ length: 4 }, () => ['leg-a', 2.5, 1.5]),
    );
    expect(m.shearLag).toEqual({ connected: 'leg', length: 9, xbar: 1.13, fastenersPerLine: 4 });
    expect(m.blockShear).toEqual({ endDistance: 1.5 });
    expect(doc.members[0]!.claims?.blockShear).toBe(81.1);
  });

  it('reads block shear tension factors per outline kind, and rejects an unknown kind by pointer', () => {
    const ok = loaded(
      loadCalcText(
        variant(
          'lantern-brace-angle.json',
          (d) => (d['members'][0].blockShear.byOutline = { 'to-edge': 0.6 }),
        ),
        'brace.json',
      ),
    );
    expect(ok.members[0]!.input.blockShear).toEqual({ endDistance: 1.5, byOutline: { 'to-edge': 0.6 } });
    const errors = failed(
      loadCalcText(
        variant('lantern-brace-angle.json', (d) => (d['members'][0].blockShear.byOutline = { 'u-shape': 1 })),
        'brace.json',
      ),
    );
    expect(errors.some((e) => e.pointer.startsWith('/members/0/blockShear/byOutline'))).toBe(true);
  });

  it('reads the EN 1993-1-1 and CSA S16-19 profiles, with National Annex factors', () => {
    const en = loaded(
      loadCalcText(
        variant('lantern-deck-en1993.json', (d) => (d['code'].nationalAnnex = { gammaM2: 1.1 })),
        'en.json',
      ),
    );
    expect(en.profile).toEqual({
      standard: 'EN 1993-1-1',
      method: 'partial-factor',
      units: 'mm',
      nationalAnnex: { gammaM2: 1.1 },
    });
    expect(loaded(loadCalcText(text('lantern-lap-csa.json'), 'csa.json')).profile.standard).toBe(
      'CSA S16-19',
    );
  });

  it('reports a gauge outside the element and an unknown element as hole-outside-element', () => {
    const errors = failed(
      loadCalcText(
        variant('lantern-brace-angle.json', (d) => {
          d['members'][0].holes[1].gauge = 4.5;
          d['members'][0].holes[2].gauge = '-1/2';
        }),
        'bad.json',
      ),
    );
    expect(errors.map((e) => [e.pointer, e.rule])).toEqual([
      ['/members/0/holes/1/gauge', 'hole-outside-element'],
      ['/members/0/holes/2/gauge', 'hole-outside-element'],
    ]);
    const wrongLeg = failed(
      loadCalcText(
        variant('lantern-hanger-wt.json', (d) => (d['members'][0].holes[0].element = 'web')),
        'tee.json',
      ),
    );
    expect(wrongLeg.map((e) => [e.pointer, e.rule])).toEqual([
      ['/members/0/holes/0/element', 'hole-outside-element'],
    ]);
    expect(wrongLeg[0]!.message).toContain('its elements are flange, stem');
  });

  it('refuses y on a section hole, width on a section member and a section kind for a plate', () => {
    const errors = failed(
      loadCalcText(
        variant('lantern-brace-angle.json', (d) => {
          d['members'][0].holes[0].y = 1;
          d['members'][0].width = 7;
        }),
        'bad.json',
      ),
    );
    expect(errors.map((e) => e.pointer)).toEqual(
      expect.arrayContaining(['/members/0/holes/0/y', '/members/0/width']),
    );
    const kind = failed(
      loadCalcText(
        variant('lantern-brace-angle.json', (d) => (d['members'][0].kind = 'tee')),
        'k.json',
      ),
    );
    expect(kind.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/kind', 'section-kind']]);
  });

  it('reads each code by its own method: partial-factor for EN 1993, LSD for CSA S16, LRFD or ASD for AISC 360; a 1.0 file saying LRFD for EN or CSA stays valid', () => {
    const method = (example: string, m: string) =>
      loadCalcText(
        variant(example, (d) => (d['code'].method = m)),
        'm.json',
      );
    const ok = (r: ReturnType<typeof loadCalcText>) => r.ok;
    expect(ok(method('lantern-deck-en1993.json', 'partial-factor'))).toBe(true);
    expect(ok(method('lantern-deck-en1993.json', 'LRFD'))).toBe(true);
    expect(ok(method('lantern-lap-csa.json', 'LSD'))).toBe(true);
    expect(ok(method('lantern-lap-csa.json', 'LRFD'))).toBe(true);
    expect(ok(method('lantern-hanger-wt.json', 'ASD'))).toBe(true);
    expect(
      failed(method('lantern-deck-en1993.json', 'LSD')).map((e) => [e.pointer, e.rule, e.message]),
    ).toEqual([
      [
        '/code/method',
        'code-method',
        '/code/method: EN 1993-1-1 verifies by partial factors (γM0, γM2); give "method": "partial-factor" (rule code-method)',
      ],
    ]);
    expect(failed(method('lantern-lap-csa.json', 'partial-factor')).map((e) => e.message)).toEqual([
      '/code/method: CSA S16-19 is limit states design with resistance factors (φ, φu); give "method": "LSD" (rule code-method)',
    ]);
    expect(failed(method('lantern-hanger-wt.json', 'LSD')).map((e) => e.message)).toEqual([
      '/code/method: AISC 360-22 offers LRFD or ASD; give "method": "LRFD" or "ASD" (rule code-method)',
    ]);
  });

  it('needs mm for EN 1993 and CSA S16, their own method, and the National Annex only under EN', () => {
    const csa = failed(
      loadCalcText(
        variant('lantern-lap-csa.json', (d) => {
          d['code'].method = 'ASD';
          d['code'].nationalAnnex = { gammaM0: 1.05 };
        }),
        'csa.json',
      ),
    );
    expect(csa.map((e) => e.rule).sort()).toEqual(['code-method', 'national-annex-standard']);
    const units = failed(
      loadCalcText(
        variant('lantern-hanger-wt.json', (d) => (d['code'].standard = 'EN 1993-1-1')),
        'u.json',
      ),
    );
    expect(units.map((e) => e.rule)).toContain('code-units');
  });

  it('names the missing dimensions of a section', () => {
    const errors = failed(
      loadCalcText(
        variant('lantern-hanger-wt.json', (d) => delete d['members'][1].section.tw),
        'w.json',
      ),
    );
    expect(errors.map((e) => [e.pointer, e.rule])).toEqual([['/members/1/section', 'required']]);
  });
});
