/** `ligament draw`: the sketch of one member as SVG. */
import type { CalcError } from '../calc/types.js';
import { analyseMember } from '../engine/index.js';
import { buildDrawing, toSvg, type Drawing } from '../draw/index.js';
import { engineFailure, pickMember } from './member.js';
import type { Source } from './source.js';
import { CAUTION } from '../engine/caution.js';
import type { RunOutcome } from './types.js';
import type { LoadDirection } from '../engine/types.js';

export interface DrawRunOptions {
  readonly member?: string;
  readonly directions?: readonly LoadDirection[];
}

export interface DrawReport {
  readonly file: string;
  readonly errors: readonly CalcError[];
  readonly usage?: string;
  readonly drawing?: Drawing;
  readonly svg?: string;
}

export function runDraw(source: Source, options: DrawRunOptions): RunOutcome<DrawReport> {
  const picked = pickMember(source, options.member);
  if (!picked.ok) {
    return {
      result: { file: picked.file, errors: picked.errors, ...(picked.usage ? { usage: picked.usage } : {}) },
      exitCode: 2,
    };
  }
  const { member, document } = picked;
  try {
    const result = analyseMember(member.input, document.profile, {
      k: 1,
      ...(options.directions ? { directions: options.directions } : {}),
    });
    const drawing = buildDrawing(member.input, result, {
      units: document.profile.units,
      profile: document.profile,
      project: document.meta.project,
      caution: CAUTION,
    });
    return { result: { file: picked.file, errors: [], drawing, svg: toSvg(drawing) }, exitCode: 0 };
  } catch (err) {
    return {
      result: {
        file: picked.file,
        errors: [engineFailure(picked.file, member, err)],
      },
      exitCode: 2,
    };
  }
}
