// Bundles the repository's JSON Schemas into the package (cli/schema/), so the published
// tarball and the isomorphic validator carry the exact schema the repo defines.
import { cpSync, mkdirSync, readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const from = join(here, '..', '..', 'schema');
const to = join(here, '..', 'schema');
mkdirSync(to, { recursive: true });
for (const name of readdirSync(from)) {
  if (name.endsWith('.schema.json')) cpSync(join(from, name), join(to, name));
}
