/**
 * The calc file `ligament init` writes: one staggered splice plate, loaded from either end, with
 * no claims yet, and placeholders for the project, the author and the firm (never the demo's people). Pure: the date comes in.
 */
import type { UnitSystem } from '../engine/types.js';

export interface InitOptions {
  readonly units: UnitSystem;
  /** YYYY-MM-DD. */
  readonly date: string;
  readonly version: string;
}

/** The starter document as a plain object. */
export function starterCalc(options: InitOptions): Record<string, unknown> {
  const inch = options.units === 'in';
  const member = inch
    ? {
        id: 'SP-1',
        kind: 'splice-plate',
        description: 'Bottom chord splice plate, two staggered rows of 3/4 in bolts each side',
        width: 10,
        thickness: '1/2',
        material: { grade: 'A36', Fy: 36, Fu: 58 },
        holes: [
          { id: 'A1', x: 0, y: '1-1/2', bolt: '3/4' },
          { id: 'A2', x: 0, y: 6, bolt: '3/4' },
          { id: 'B1', x: '1-1/2', y: 4, bolt: '3/4' },
          { id: 'B2', x: '1-1/2', y: '8-1/2', bolt: '3/4' },
        ],
        load: { directions: ['-x', '+x'], U: 1.0, required: 150 },
      }
    : {
        id: 'SP-1',
        kind: 'splice-plate',
        description: 'Bottom chord splice plate, two staggered rows of M20 bolts each side',
        width: 250,
        thickness: 12,
        material: { grade: 'A572 Gr. 50', Fy: 345, Fu: 450 },
        holes: [
          { id: 'A1', x: 0, y: 40, bolt: 'M20' },
          { id: 'A2', x: 0, y: 150, bolt: 'M20' },
          { id: 'B1', x: 40, y: 100, bolt: 'M20' },
          { id: 'B2', x: 40, y: 210, bolt: 'M20' },
        ],
        load: { directions: ['-x', '+x'], U: 1.0, required: 650 },
      };
  return {
    $schema: 'urn:ligament:schema:calc:1.0',
    format: 'ligament-calc',
    formatVersion: '1.0',
    meta: {
      project: 'Project name',
      preparedBy: 'Your name',
      firm: 'Your firm',
      date: options.date,
      tool: { name: 'ligament', version: options.version },
      reference: 'Starter file from ligament init: replace the member with your own',
      notes:
        'Add a claims object to each member (chains checked, controllingChain, Ag, An, Ae, yielding, rupture, available) and run ligament check.',
    },
    units: options.units,
    code: { standard: 'AISC 360-22', method: 'LRFD' },
    members: [member],
  };
}

/** The starter file's text. */
export function starterCalcText(options: InitOptions): string {
  return JSON.stringify(starterCalc(options), null, 2) + '\n';
}
