/**
 * Precompiles the calc-file JSON Schema validator at build time for the browser.
 *
 * The calc loader (cli/src/calc/validateSchema.ts) compiles its ajv validator on first use, which
 * makes ajv generate code with `new Function`. The service sends a Content-Security-Policy without
 * 'unsafe-eval' (helmet's default, rightly), so in the browser that compile is refused. This plugin
 * compiles the same schema with the same ajv options into standalone code (ajv's standalone mode)
 * and hands the loader the finished validator, so no code is generated at run time.
 *
 * Two details keep the loader's messages identical to the CLI's:
 * - ajv's runtime helpers and ajv-formats are imported from the copies the CLI uses (ajv 8).
 * - the loader recognises sub-schemas by identity (its hints for lengths, bolts, ids); the
 *   standalone code would carry copies, so each copied sub-schema is replaced by a reference into
 *   the loader's own CALC_SCHEMA object.
 *
 * The app itself reaches the loader only through the `ligament` package's exports (vite.config.ts).
 * This plugin alone is handed files of the CLI workspace by path, because what it needs is not (and
 * should not be) part of the package's interface: cli/package.json, to require ajv from the CLI's own
 * dependencies (the web workspace resolves another ajv major); the schema JSON, compiled here in Node
 * at build time; cli/src/calc/validateSchema.ts, the one internal module it patches, recognised by its
 * file id; and cli/src/calc/schema.ts, imported by the generated code directly rather than through
 * `ligament/calc`, whose index imports validateSchema.ts and would close an import cycle.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import type { Plugin } from 'vite';

const VIRTUAL_ID = 'virtual:ligament-calc-validator';
const RESOLVED_ID = `\0${VIRTUAL_ID}`;

interface Paths {
  readonly cliPackageJson: string;
  readonly schemaJson: string;
  readonly schemaModule: string;
  readonly validateSchemaModule: string;
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every sub-schema by its canonical JSON, $defs first so a definition keeps its own pointer. */
function indexSubschemas(schema: Json): Map<string, string> {
  const index = new Map<string, string>();
  const visit = (node: Json, pointer: string) => {
    if (node === null || typeof node !== 'object') return;
    const key = JSON.stringify(node);
    if (!index.has(key)) index.set(key, pointer);
    const entries = Array.isArray(node) ? node.map((v, i) => [String(i), v] as const) : Object.entries(node);
    for (const [k, v] of entries) visit(v, `${pointer}/${k.replace(/~/g, '~0').replace(/\//g, '~1')}`);
  };
  const root = schema as { $defs?: Record<string, Json> };
  for (const [name, def] of Object.entries(root.$defs ?? {})) visit(def, `/$defs/${name}`);
  visit(schema, '');
  return index;
}

/** End index (exclusive) of the JSON value starting at `start`. */
function jsonEnd(code: string, start: number): number {
  let depth = 0;
  let inString = false;
  for (let i = start; i < code.length; i++) {
    const c = code[i];
    if (inString) {
      if (c === '\\') i++;
      else if (c === '"') inString = false;
    } else if (c === '"') inString = true;
    else if (c === '{' || c === '[') depth++;
    else if (c === '}' || c === ']') {
      depth--;
      if (depth === 0) return i + 1;
    }
  }
  throw new Error('calc-validator: unbalanced JSON in the standalone code');
}

function generate(paths: Paths): string {
  const requireFromCli = createRequire(paths.cliPackageJson);
  // Types written out here: the web workspace resolves `ajv` to another major version.
  const { Ajv2020 } = requireFromCli('ajv/dist/2020.js') as {
    Ajv2020: new (options: Record<string, unknown>) => { compile: (schema: object) => unknown };
  };
  const { _ } = requireFromCli('ajv') as {
    _: (strings: TemplateStringsArray, ...values: unknown[]) => unknown;
  };
  const standalone = requireFromCli('ajv/dist/standalone/index.js') as {
    default: (ajv: unknown, v: unknown) => string;
  };
  const formatsModule = requireFromCli('ajv-formats') as { default?: unknown };
  const addFormats = (typeof formatsModule === 'function' ? formatsModule : formatsModule.default) as (
    ajv: unknown,
  ) => void;
  const schema = JSON.parse(readFileSync(paths.schemaJson, 'utf8')) as Json;

  // The same options as calcValidator() in cli/src/calc/validateSchema.ts.
  const ajv = new Ajv2020({
    allErrors: true,
    strict: true,
    allowUnionTypes: true,
    verbose: true,
    code: { source: true, esm: true, formats: _`require("ajv-formats/dist/formats").fullFormats` },
  });
  addFormats(ajv);
  let code = standalone.default(ajv, ajv.compile(schema as object));

  // CommonJS requires → imports of the CLI's own copies.
  const imports: string[] = [];
  const seen = new Map<string, string>();
  code = code.replace(/require\("([^"]+)"\)/g, (_m, specifier: string) => {
    let local = seen.get(specifier);
    if (!local) {
      local = `__dep${seen.size}`;
      seen.set(specifier, local);
      // A namespace import reads like `require()` for these __esModule-flagged CommonJS files.
      imports.push(`import * as ${local} from ${JSON.stringify(requireFromCli.resolve(specifier))};`);
    }
    return local;
  });

  // Copied sub-schemas → references into the loader's CALC_SCHEMA.
  const index = indexSubschemas(schema);
  let out = '';
  let cursor = 0;
  const decl = /const (schema\d+) = (?=[{[])/g;
  for (let m = decl.exec(code); m; m = decl.exec(code)) {
    const start = m.index + m[0].length;
    const end = jsonEnd(code, start);
    const pointer = index.get(JSON.stringify(JSON.parse(code.slice(start, end)) as Json));
    if (pointer === undefined) continue;
    out += `${code.slice(cursor, start)}__at(${JSON.stringify(pointer)})`;
    cursor = end;
    decl.lastIndex = end;
  }
  out += code.slice(cursor);

  return [
    ...imports,
    `import { CALC_SCHEMA as __schema } from ${JSON.stringify(paths.schemaModule)};`,
    'const __at = (pointer) => pointer.split("/").slice(1).reduce((node, key) => node[key.replace(/~1/g, "/").replace(/~0/g, "~")], __schema);',
    out.replace(/^"use strict";/, ''),
  ].join('\n');
}

export function calcValidatorPlugin(paths: Paths): Plugin {
  let generated: string | undefined;
  const target = fileURLToPath(new URL(`file://${paths.validateSchemaModule}`));
  return {
    name: 'ligament-precompiled-calc-validator',
    resolveId(id) {
      return id === VIRTUAL_ID ? RESOLVED_ID : null;
    },
    load(id) {
      if (id !== RESOLVED_ID) return null;
      generated ??= generate(paths);
      return generated;
    },
    transform(code, id) {
      if (id.split('?')[0] !== target) return null;
      if (!/^let compiled\b/m.test(code)) {
        this.error(
          'calc-validator: validateSchema.ts no longer caches its validator in `let compiled`; update web/vite/calc-validator-plugin.ts',
        );
      }
      return {
        code: `import __precompiled from '${VIRTUAL_ID}';\n${code}\ncompiled = __precompiled;\n`,
        map: null,
      };
    },
  };
}
