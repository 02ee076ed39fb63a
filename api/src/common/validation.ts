import { type ArgumentMetadata, BadRequestException, ValidationError, ValidationPipe } from '@nestjs/common';

/** No request of this API nests deeper than a few levels; 32 leaves room and stops stack overflows. */
export const MAX_INPUT_DEPTH = 32;

/** Whole numbers in ids, pages and bodies must fit a safe integer (SQLite refuses larger keys). */
const LONG_DIGITS = /^[+-]?\d{16,}$/;

interface Problem {
  readonly property: string;
  readonly constraints: Record<string, string>;
}

function flatten(errors: ValidationError[], prefix = ''): Problem[] {
  return errors.flatMap((e) => {
    const property = prefix ? `${prefix}.${e.property}` : e.property;
    const own = e.constraints ? [{ property, constraints: e.constraints }] : [];
    return [...own, ...flatten(e.children ?? [], property)];
  });
}

/**
 * Looks at the raw input before class-transformer does (it recurses, and a body nested 3,000 deep
 * overflowed the stack): too deep, or a whole number no id or count can be. Iterative, stops at the
 * first problem.
 */
export function inputProblem(value: unknown, root: string, digitStrings: boolean): Problem | null {
  const stack: { value: unknown; path: string; depth: number }[] = [{ value, path: '', depth: 0 }];
  // A path 3,000 levels long is no help in a message: its start says where.
  const name = (path: string) => (path.length > 80 ? `${path.slice(0, 80)}…` : path || root);
  while (stack.length > 0) {
    const item = stack.pop()!;
    const v = item.value;
    if (typeof v === 'number' && Number.isInteger(v) && !Number.isSafeInteger(v)) {
      return {
        property: name(item.path),
        constraints: { safeInteger: `${name(item.path)} must be a whole number below 2^53, not ${v}` },
      };
    }
    if (digitStrings && typeof v === 'string' && LONG_DIGITS.test(v.trim())) {
      return {
        property: name(item.path),
        constraints: {
          safeInteger: `${name(item.path)} must be a whole number below 2^53, not ${v.trim()}`,
        },
      };
    }
    if (v === null || typeof v !== 'object') continue;
    if (item.depth >= MAX_INPUT_DEPTH) {
      return {
        property: name(item.path),
        constraints: {
          maxDepth: `${name(item.path)} nests more than ${MAX_INPUT_DEPTH} levels deep; no request needs that`,
        },
      };
    }
    for (const [key, child] of Object.entries(v)) {
      const path = Array.isArray(v) ? `${item.path}[${key}]` : item.path ? `${item.path}.${key}` : key;
      stack.push({ value: child, path, depth: item.depth + 1 });
    }
  }
  return null;
}

/**
 * After conversion: a whole number that is not a safe integer, found by walking the converted value
 * beside the raw one, and reported with the text as it came (a multipart field or a query value of
 * 20 digits, or "1e20", converts to 1e20, which no id or count can be). Multipart bodies are text
 * like query strings, but only the DTO knows which of their fields are numbers, so this runs on what
 * the DTO made of them.
 */
export function convertedProblem(converted: unknown, raw: unknown, root: string): Problem | null {
  const stack: { value: unknown; raw: unknown; path: string }[] = [{ value: converted, raw, path: '' }];
  while (stack.length > 0) {
    const item = stack.pop()!;
    const v = item.value;
    if (typeof v === 'number' && Number.isInteger(v) && !Number.isSafeInteger(v)) {
      const name = item.path || root;
      const text = typeof item.raw === 'string' ? item.raw.trim() : String(v);
      return {
        property: name,
        constraints: { safeInteger: `${name} must be a whole number below 2^53, not ${text}` },
      };
    }
    if (v === null || typeof v !== 'object') continue;
    const rawObject =
      item.raw !== null && typeof item.raw === 'object' ? (item.raw as Record<string, unknown>) : {};
    for (const [key, child] of Object.entries(v)) {
      const path = Array.isArray(v) ? `${item.path}[${key}]` : item.path ? `${item.path}.${key}` : key;
      stack.push({ value: child, raw: rawObject[key], path });
    }
  }
  return null;
}

const ROOT_NAMES: Record<ArgumentMetadata['type'], string> = {
  body: 'the request body',
  query: 'the query',
  param: 'the path parameter',
  custom: 'the input',
};

/** The global pipe: strips nothing silently (unknown fields are refused), converts types. */
class LigamentValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type !== 'custom') {
      const root = metadata.type === 'param' && metadata.data ? metadata.data : ROOT_NAMES[metadata.type];
      // Query and path values arrive as text; JSON bodies carry real numbers (and titles may be digits).
      const problem = inputProblem(value, root, metadata.type !== 'body');
      if (problem) {
        throw new BadRequestException({
          message: Object.values(problem.constraints).join('; '),
          details: [problem],
        });
      }
    }
    const converted: unknown = await super.transform(value, metadata);
    if (metadata.type !== 'custom') {
      const root = metadata.type === 'param' && metadata.data ? metadata.data : ROOT_NAMES[metadata.type];
      const problem = convertedProblem(converted, value, root);
      if (problem) {
        throw new BadRequestException({
          message: Object.values(problem.constraints).join('; '),
          details: [problem],
        });
      }
    }
    return converted;
  }
}

export function createValidationPipe(): ValidationPipe {
  return new LigamentValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => {
      const details = flatten(errors);
      const message = details.map((d) => Object.values(d.constraints).join('; ')).join('; ');
      return new BadRequestException({ message: message || 'Invalid request.', details });
    },
  });
}
