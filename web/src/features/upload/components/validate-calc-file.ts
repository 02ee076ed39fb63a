import type { CalcError } from 'ligament/calc';

export type FileCheck =
  | { readonly state: 'checking' }
  | {
      readonly state: 'valid';
      readonly members: readonly string[];
      readonly project: string;
      readonly units: string;
    }
  | { readonly state: 'invalid'; readonly errors: readonly CalcError[] };

/**
 * Runs the same loader the CLI and the server use on a file's text, in the browser, so a bad file
 * is caught with its line, column and JSON pointer before anything is sent.
 */
export async function validateCalcFile(file: File): Promise<FileCheck> {
  const [{ loadCalcText }, text] = await Promise.all([import('ligament/calc'), file.text()]);
  const result = loadCalcText(text, file.name);
  if (!result.ok) return { state: 'invalid', errors: result.errors };
  return {
    state: 'valid',
    members: result.document.members.map((m) => m.input.id),
    project: result.document.meta.project,
    units: result.document.profile.units,
  };
}
