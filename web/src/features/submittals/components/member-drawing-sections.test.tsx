import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { screen } from '@testing-library/react';
import { loadCalcText } from 'ligament/calc';
import { buildDrawing, STROKES } from 'ligament/draw';
import { analyseMember } from 'ligament/engine';
import { describe, expect, it } from 'vitest';
import { CAUTION } from 'ligament/engine';
import { renderWithProviders } from '@/testing/render';
import { MemberPanel } from './member-panel';

// The schema's own examples (the demo's fictional scenario) with angle, channel, tee and W members.
const EXAMPLES = ['lantern-brace-angle.json', 'lantern-hanger-wt.json', 'lantern-deck-en1993.json'];

function sectionMembers() {
  return EXAMPLES.flatMap((name) => {
    const text = readFileSync(join(process.cwd(), '..', 'schema', 'examples', name), 'utf8');
    const loaded = loadCalcText(text, name);
    if (!loaded.ok) throw new Error(`${name}: ${loaded.errors.map((e) => e.message).join('; ')}`);
    return loaded.document.members
      .filter((m) => m.input.section !== undefined)
      .map((member) => ({ name, document: loaded.document, member }));
  });
}

const centreDash = STROKES.centre.dash?.join(' ');

describe('MemberDrawing of rolled-shape members', () => {
  const members = sectionMembers();

  it('finds angle, tee and W members among the examples', () => {
    const shapes = new Set<string | undefined>(members.map((m) => m.member.input.section?.shape));
    for (const shape of ['angle', 'tee', 'w-shape']) expect(shapes.has(shape)).toBe(true);
  });

  it.each(members.map((m) => [`${m.name} ${m.member.input.id}`, m] as const))(
    '%s: every strip label (element and thickness) and every dashed junction line is drawn',
    (_, { document, member }) => {
      const result = analyseMember(member.input, document.profile, { k: 5 });
      const model = buildDrawing(member.input, result, {
        units: document.profile.units,
        profile: document.profile,
        project: document.meta.project,
        caution: CAUTION,
      });
      const stripLabels = model.shapes.flatMap((s) =>
        s.kind === 'text' && / · t = /.test(s.text) ? [s.text] : [],
      );
      const junctions = model.shapes.filter((s) => s.kind === 'line' && s.stroke === 'centre').length;
      expect(stripLabels.length).toBeGreaterThanOrEqual(2);

      renderWithProviders(<MemberPanel document={document} member={member} result={result} findings={[]} />);
      const svg = screen.getByTestId('member-drawing');
      const texts = [...svg.querySelectorAll('text')].map((t) => t.textContent);
      for (const label of stripLabels) expect(texts).toContain(label);
      const dashed = [...svg.querySelectorAll('line')].filter(
        (l) => l.getAttribute('stroke-dasharray') === centreDash,
      ).length;
      expect(dashed).toBe(junctions);
    },
  );
});
