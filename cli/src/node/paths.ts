/** Where the installed package keeps its files (works from src/ under tests and from dist/). */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** The package root (cli/ in the repository, or the installed package's folder). */
export const PACKAGE_ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** Path of a bundled schema file, e.g. `calc.schema.json`. */
export function schemaPath(name: 'calc.schema.json' | 'result.schema.json'): string {
  return fileURLToPath(new URL(`../../schema/${name}`, import.meta.url));
}

/** The package version from package.json. */
export function packageVersion(): string {
  const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as {
    version?: string;
  };
  return pkg.version ?? '0.0.0';
}

/** The version at the end of a bundled schema's `$id` (`urn:ligament:schema:calc:1.0` → `1.0`), without loading ajv. */
export function bundledSchemaVersion(name: 'calc.schema.json' | 'result.schema.json'): string {
  try {
    const schema = JSON.parse(readFileSync(schemaPath(name), 'utf8')) as { $id?: string };
    return schema.$id?.split(':').pop() ?? 'unknown';
  } catch {
    return 'missing';
  }
}
