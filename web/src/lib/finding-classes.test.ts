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

  it('rank classes in the reading order of cli/docs/method.md §8 and put unknown keys last', () => {
    const shuffled = [
      'input',
      'detailing',
      'overstated',
      'equal-share',
      'understated',
      'chain-width',
      'missed-chain',
      'phantom-chain',
    ];
    expect(shuffled.sort((a, b) => findingClassRank(a) - findingClassRank(b))).toEqual([
      'overstated',
      'understated',
      'missed-chain',
      'phantom-chain',
      'chain-width',
      'equal-share',
      'detailing',
      'input',
    ]);
    expect(findingClassRank('overstated')).toBe(0);
    expect(findingClassRank('input')).toBe(7);
    expect(findingClassRank('no-such-class')).toBe(8);
    expect(findingClassRank(undefined)).toBe(8);
  });
});
