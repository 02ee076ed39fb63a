import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** A calc file from e2e/fixtures (the demo's fictional scenario), read as text. Tests run from web/. */
export function readFixture(name: string): string {
  return readFileSync(join(process.cwd(), 'e2e', 'fixtures', name), 'utf8');
}
