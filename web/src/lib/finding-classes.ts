import { tokens } from '@fluentui/react-components';
import { FINDING_CLASSES, type FindingClass, type Severity } from 'ligament/engine';

/** Finding classes in the order a checker reads them: the engine's FINDING_CLASSES. */
export { FINDING_CLASSES };

export const findingClassLabels: Record<FindingClass, string> = {
  overstated: 'Overstated',
  understated: 'Understated',
  'missed-chain': 'Missed chain',
  'phantom-chain': 'Phantom chain',
  'chain-width': 'Chain width',
  'equal-share': 'Equal share',
  detailing: 'Detailing',
  input: 'Input',
};

/**
 * Chart and badge colours per class, as theme tokens. Colour is never the only signal: every use
 * also prints the class name. Input (data missing from the calc file) has a hue of its own: a neutral
 * grey read as "disabled" next to the other classes and turned pale in the dark theme.
 */
export const findingClassColours: Record<FindingClass, string> = {
  overstated: tokens.colorPaletteRedBackground3,
  understated: tokens.colorPaletteLightGreenBackground3,
  'missed-chain': tokens.colorPaletteDarkOrangeBackground3,
  'phantom-chain': tokens.colorPaletteGrapeBorderActive,
  'chain-width': tokens.colorPaletteMarigoldBackground3,
  'equal-share': tokens.colorPaletteBlueBorderActive,
  detailing: tokens.colorPaletteSteelBorderActive,
  input: tokens.colorPalettePinkBorderActive,
};

export const severityLabels: Record<Severity, string> = { error: 'Error', warning: 'Warning', note: 'Note' };

export function isFindingClass(value: string): value is FindingClass {
  return (FINDING_CLASSES as readonly string[]).includes(value);
}

/** Position of a class in the reading order; unknown keys go last (for chart legends and tooltips). */
export function findingClassRank(value: unknown): number {
  const index = FINDING_CLASSES.indexOf(value as FindingClass);
  return index === -1 ? FINDING_CLASSES.length : index;
}
