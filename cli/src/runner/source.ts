import type { CalcError } from '../calc/types.js';

/**
 * One input to a run: the text of a file, or why it could not be read (missing, too large, a
 * symlink loop …). The Node helpers in `node/` produce these; runners never touch the file system.
 */
export type Source =
  { readonly file: string; readonly text: string } | { readonly file: string; readonly error: CalcError };

/** A read error as a CalcError on the whole document (pointer "", line 1, column 1). */
export function sourceError(file: string, rule: string, message: string): Source {
  return { file, error: { file, pointer: '', line: 1, column: 1, rule, message } };
}
