import { createHash, randomBytes } from 'node:crypto';

export function sha256Hex(data: string | Buffer): string {
  return createHash('sha256').update(data).digest('hex');
}

/** A random URL-safe secret with a readable prefix, e.g. `lgt_…` for API tokens. */
export function randomSecret(prefix: string, bytes = 24): string {
  return `${prefix}${randomBytes(bytes).toString('base64url')}`;
}

/** JSON with object keys sorted at every level and 2-space indentation: a stable text form. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value), null, 2);
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value).sort()) out[key] = sortKeys((value as Record<string, unknown>)[key]);
    return out;
  }
  return value;
}
