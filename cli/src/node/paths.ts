/**
 * Where the installed package keeps its files. Works from src/ under tests, from the compiled dist/
 * modules, and from the bundled bin (dist/cli.js and its chunks in dist/chunks/), which sit at
 * different depths: the package root is the nearest folder above this code that holds package.json.
 */

// Through process.getBuiltinModule rather than `import … from 'node:fs'`: an ESM import of a builtin
// builds a module facade over every export, and node:fs's lazy getters (promises, ReadStream …) then
// load the stream modules; this file is on the path of `ligament --help` and `--version`.
const { existsSync, readFileSync } = process.getBuiltinModule('node:fs');
const { fileURLToPath } = process.getBuiltinModule('node:url');

function findPackageRoot(): URL {
  let dir = new URL('./', import.meta.url);
  for (let depth = 0; depth < 4; depth += 1) {
    if (existsSync(new URL('package.json', dir))) return dir;
    dir = new URL('../', dir);
  }
  return new URL('../../', import.meta.url);
}

const ROOT_URL = findPackageRoot();

/** The package root (cli/ in the repository, or the installed package's folder). */
export const PACKAGE_ROOT = fileURLToPath(ROOT_URL);

/** Path of a bundled schema file, e.g. `calc.schema.json`. */
export function schemaPath(name: 'calc.schema.json' | 'result.schema.json'): string {
  return fileURLToPath(new URL(`schema/${name}`, ROOT_URL));
}

/** The package version from package.json. */
export function packageVersion(): string {
  const pkg = JSON.parse(readFileSync(new URL('package.json', ROOT_URL), 'utf8')) as {
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
