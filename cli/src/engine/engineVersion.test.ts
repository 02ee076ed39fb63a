import { describe, expect, it } from 'vitest';
import pkg from '../../package.json' with { type: 'json' };
import { ENGINE_VERSION } from './engineVersion.js';

describe('ENGINE_VERSION', () => {
  it('equals the ligament package version', () => {
    expect(ENGINE_VERSION).toBe(pkg.version);
  });
});
