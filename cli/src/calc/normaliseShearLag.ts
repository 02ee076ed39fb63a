import type { ShearLagSpec } from '../engine/types.js';
import type { CalcReaders, Len, Raw } from './normaliseTypes.js';

/**
 * A member's `load.shearLag` connection data as the engine sees it (AISC 360 Table D3.1, CSA S16
 * 12.3.3.2, EN 1993-1-8 3.10.3): the connected element, and the connection length l and eccentricity
 * x̄ read as lengths.
 *
 * @param raw - the schema-valid `shearLag` object
 * @param pointer - the member's JSON pointer
 * @param read - the file's readers, which collect the issues
 * @returns the connection data
 * @example
 * normaliseShearLag({ connected: 'leg', length: 9, xbar: '1-1/8', fastenersPerLine: 4 }, '/members/0', calcReaders('in'))
 * // → { connected: 'leg', length: 9, xbar: 1.125, fastenersPerLine: 4 }
 */
export function normaliseShearLag(raw: Raw, pointer: string, read: CalcReaders): ShearLagSpec {
  const lag: { -readonly [K in keyof ShearLagSpec]: ShearLagSpec[K] } = {
    connected: raw['connected'] as ShearLagSpec['connected'],
  };
  if (raw['length'] !== undefined)
    lag.length = read.length(raw['length'] as Len, `${pointer}/load/shearLag/length`);
  if (raw['xbar'] !== undefined) lag.xbar = read.length(raw['xbar'] as Len, `${pointer}/load/shearLag/xbar`);
  if (raw['fastenersPerLine'] !== undefined) lag.fastenersPerLine = raw['fastenersPerLine'] as number;
  return lag;
}
