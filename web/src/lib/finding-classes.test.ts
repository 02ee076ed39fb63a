import { tokens } from '@fluentui/react-components';
import {
  FINDING_CLASSES,
  findingClassColours,
  findingClassLabels,
  findingClassRank,
} from './finding-classes';

describe('finding classes', () => {
  it('give every class, input included, a colour of its own and not the grey of an unknown class', () => {
    const colours = FINDING_CLASSES.map((c) => findingClassColours[c]);
    expect(new Set(colours).size).toBe(FINDING_CLASSES.length);
    expect(colours).not.toContain(tokens.colorNeutralForeground3);
    expect(findingClassLabels.input).toBe('Input');
  });

  it('rank classes in the reading order and put unknown keys last', () => {
    expect(findingClassRank('overstated')).toBe(0);
    expect(findingClassRank('input')).toBe(FINDING_CLASSES.length - 1);
    expect(findingClassRank('no-such-class')).toBe(FINDING_CLASSES.length);
    expect(findingClassRank(undefined)).toBe(FINDING_CLASSES.length);
    const alphabetical = [...FINDING_CLASSES].sort();
    expect(alphabetical.sort((a, b) => findingClassRank(a) - findingClassRank(b))).toEqual(FINDING_CLASSES);
  });
});
