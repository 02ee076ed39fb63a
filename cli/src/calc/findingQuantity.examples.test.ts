// Every finding the schema examples raise with a number can be written with its unit: the engine's
// findingQuantity knows what each such code measures. Here, beside the loader, because it reads the
// example files and the engine reads no files (nor does the calc layer outside its tests).
// eslint-disable-next-line no-restricted-imports
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { auditCalc, findingQuantity } from '../engine/index.js';
import { loadCalcText } from './loadCalcText.js';

const examples = new URL('../../../schema/examples/', import.meta.url);

describe('findingQuantity on the schema examples', () => {
  it('covers every catalogue code that a schema example raises with a claimed or recomputed value', () => {
    const seen = new Set<string>();
    for (const name of readdirSync(examples).filter((n) => n.endsWith('.json'))) {
      const loaded = loadCalcText(readFileSync(new URL(name, examples), 'utf8'), name);
      if (!loaded.ok) continue;
      for (const member of auditCalc(loaded.document).members) {
        for (const f of member.findings) {
          if (f.claimed === undefined && f.recomputed === undefined) continue;
          seen.add(f.code);
          expect(findingQuantity(f.code), `${name} ${f.code}`).not.toBeNull();
        }
      }
    }
    expect(seen.size).toBeGreaterThan(5);
  });
});
