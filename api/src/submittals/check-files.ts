import { auditCalc, loadCalcText, type CalcAudit, type CalcDocument, type CalcError } from 'ligament';
import { sha256Hex } from '../common/hash.js';

export interface IncomingFile {
  readonly name: string;
  readonly content: Buffer;
}

export interface CheckedFile {
  readonly name: string;
  readonly content: Buffer;
  readonly sha256: string;
  readonly document: CalcDocument;
  readonly audit: CalcAudit;
}

export type CheckOutcome =
  | { readonly ok: true; readonly files: readonly CheckedFile[] }
  | { readonly ok: false; readonly errors: readonly CalcError[]; readonly invalidFiles: number };

export interface CheckRules {
  readonly allowedExtensions: readonly string[];
}

/**
 * How much recomputation one upload may ask for. The engine's time grows with the holes of a member
 * (about 0.1 ms per hole on the 2-core bench machine), so these bound the time one upload can take:
 * 1,000 holes is far beyond a real bolted splice or gusset (common practice: tens to a few hundred),
 * and 20,000 holes per upload is 250 files of 80 holes.
 */
export const RECOMPUTE_LIMITS = { holesPerMember: 1000, holesPerUpload: 20_000 } as const;

function pointerError(file: string, pointer: string, rule: string, message: string): CalcError {
  return {
    file,
    pointer,
    line: 1,
    column: 1,
    rule,
    message: `${file} ${pointer}: ${message} (rule ${rule})`,
  };
}

/** Errors for members with too many holes, and for the member where the upload's budget runs out. */
function workErrors(loaded: readonly { file: IncomingFile; document: CalcDocument }[]): CalcError[] {
  const errors: CalcError[] = [];
  let total = 0;
  let budgetReported = false;
  for (const { file, document } of loaded) {
    document.members.forEach((member, i) => {
      const holes = member.input.holes.length;
      const pointer = `/members/${i}/holes`;
      if (holes > RECOMPUTE_LIMITS.holesPerMember)
        errors.push(
          pointerError(
            file.name,
            pointer,
            'max-holes-per-member',
            `member ${member.input.id} has ${holes} holes; at most ${RECOMPUTE_LIMITS.holesPerMember} are recomputed per member`,
          ),
        );
      total += holes;
      if (total > RECOMPUTE_LIMITS.holesPerUpload && !budgetReported) {
        budgetReported = true;
        errors.push(
          pointerError(
            file.name,
            pointer,
            'max-holes-per-upload',
            `the upload passes ${RECOMPUTE_LIMITS.holesPerUpload} holes in all at this member; split it into smaller submittals`,
          ),
        );
      }
    });
  }
  return errors;
}

function fileError(file: string, rule: string, message: string): CalcError {
  return { file, pointer: '', line: 1, column: 1, rule, message: `${file}: ${message} (rule ${rule})` };
}

/**
 * Validates every file (extension, unique name, UTF-8, the calc loader, RECOMPUTE_LIMITS) and, only
 * when all are valid, recomputes every member with the engine. Pure: no I/O, so the upload can run it before it opens a
 * transaction, and the recheck can run it again on stored bytes.
 */
export function checkFiles(files: readonly IncomingFile[], rules: CheckRules): CheckOutcome {
  const errors: CalcError[] = [];
  const loaded: { file: IncomingFile; document: CalcDocument }[] = [];
  const invalid = new Set<string>();
  const seen = new Set<string>();
  for (const file of files) {
    const own: CalcError[] = [];
    const lower = file.name.toLowerCase();
    if (!rules.allowedExtensions.some((ext) => lower.endsWith(ext))) {
      own.push(
        fileError(
          file.name,
          'file-extension',
          `only ${rules.allowedExtensions.join(', ')} files are accepted`,
        ),
      );
    }
    if (seen.has(file.name))
      own.push(fileError(file.name, 'duplicate-file-name', 'two files in this submittal have this name'));
    seen.add(file.name);
    const text = new TextDecoder('utf-8', { fatal: false }).decode(file.content);
    if (text.includes('\uFFFD'))
      own.push(fileError(file.name, 'encoding', 'the file is not valid UTF-8 text'));
    if (own.length === 0) {
      const result = loadCalcText(text, file.name);
      if (result.ok) loaded.push({ file, document: result.document });
      else own.push(...result.errors);
    }
    if (own.length > 0) {
      invalid.add(file.name);
      errors.push(...own);
    }
  }
  if (errors.length > 0) return { ok: false, errors, invalidFiles: invalid.size };
  const tooMuch = workErrors(loaded);
  if (tooMuch.length > 0)
    return { ok: false, errors: tooMuch, invalidFiles: new Set(tooMuch.map((e) => e.file)).size };
  return {
    ok: true,
    files: loaded.map(({ file, document }) => ({
      name: file.name,
      content: file.content,
      sha256: sha256Hex(file.content),
      document,
      audit: auditCalc(document),
    })),
  };
}
