/**
 * The app's settings, read once and checked here (the only module that reads import.meta.env); a
 * bad value stops the app at start with a message naming it. The API is served on the same origin
 * in production and proxied by Vite in development, so by default requests go to this page's own
 * origin (the API's routes all start with /api).
 *
 * Checked by hand rather than with zod: this module is in the first chunk every visitor loads,
 * and zod is only needed by the lazily loaded forms.
 */
export interface Env {
  /** Origin of the API, or '' for this page's own origin. */
  readonly apiOrigin: string;
  readonly mode: 'development' | 'production' | 'test';
}

function readEnv(): Env {
  const problems: string[] = [];
  const rawOrigin = import.meta.env.VITE_LIGAMENT_API_ORIGIN ?? '';
  let apiOrigin = '';
  if (rawOrigin !== '') {
    try {
      apiOrigin = new URL(rawOrigin).origin;
    } catch {
      problems.push(`VITE_LIGAMENT_API_ORIGIN: "${rawOrigin}" is not a URL`);
    }
  }
  const mode = import.meta.env.MODE;
  if (mode !== 'development' && mode !== 'production' && mode !== 'test')
    problems.push(`MODE: unknown mode "${mode}"`);
  if (problems.length > 0) throw new Error(`Invalid web settings: ${problems.join('; ')}`);
  return { apiOrigin, mode: mode as Env['mode'] };
}

export const env = readEnv();
