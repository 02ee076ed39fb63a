/**
 * `ligament chains`: the k least chains of one member per direction with every leg's s, g and s²/4g,
 * and with `explain`, the least chains that cannot form and the hole that keeps each from forming.
 */
import type { CalcError } from '../calc/types.js';
import { analyseMember, memberLayout, rankChains } from '../engine/index.js';
import type {
  Chain,
  CodeProfile,
  HoleWidth,
  LoadDirection,
  MemberInput,
  RankedChain,
} from '../engine/types.js';
import { engineFailure, pickMember } from './member.js';
import type { Source } from './source.js';
import type { RunOutcome } from './types.js';

export interface ChainsOptions {
  readonly member?: string;
  readonly directions?: readonly LoadDirection[];
  readonly top: number;
  readonly explain: boolean;
}

export interface ChainsReport {
  readonly file: string;
  /** Set when the file could not be used; then nothing else is. */
  readonly errors: readonly CalcError[];
  readonly usage?: string;
  readonly memberId?: string;
  readonly profile?: CodeProfile;
  readonly member?: MemberInput;
  readonly holeWidths: readonly HoleWidth[];
  readonly directions: readonly {
    readonly direction: LoadDirection;
    readonly governing: Chain | null;
    readonly least: readonly Chain[];
  }[];
  /** With explain: the least chains over all chains that cannot form in at least one direction asked for. */
  readonly rejected: readonly RankedChain[];
}

export function runChains(source: Source, options: ChainsOptions): RunOutcome<ChainsReport> {
  const picked = pickMember(source, options.member);
  const empty = { holeWidths: [], directions: [], rejected: [] };
  if (!picked.ok) {
    return {
      result: {
        file: picked.file,
        errors: picked.errors,
        ...(picked.usage ? { usage: picked.usage } : {}),
        ...empty,
      },
      exitCode: 2,
    };
  }
  const { member, document } = picked;
  const input = member.input;
  const directions = options.directions ?? input.directions;
  const profile = document.profile;
  try {
    const result = analyseMember(input, profile, { k: options.top, directions });
    let rejected: RankedChain[] = [];
    if (options.explain) {
      const layout = memberLayout(input, profile, result.holeWidths);
      // Rank more chains than shown so the rejected ones are not crowded out by admissible ones.
      rejected = rankChains(layout, directions, options.top * 3)
        .filter((c) => c.rejections.length > 0)
        .slice(0, options.top);
    }
    return {
      result: {
        file: picked.file,
        errors: [],
        memberId: input.id,
        profile,
        member: input,
        holeWidths: result.holeWidths,
        directions: result.directions.map((d) => ({
          direction: d.direction,
          governing: d.governing,
          least: d.leastChains,
        })),
        rejected,
      },
      exitCode: 0,
    };
  } catch (err) {
    return {
      result: {
        file: picked.file,
        errors: [engineFailure(picked.file, member, err)],
        ...empty,
      },
      exitCode: 2,
    };
  }
}
