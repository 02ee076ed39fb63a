// The member the drawing's tests draw. Not part of the package build (tsconfig.build.json).
import { analyseMember } from '../engine/analyseMember.js';
import { d9Member } from '../engine/members.fixtures.js';
import type { CodeProfile, MemberInput } from '../engine/types.js';
import { sheetFrame } from './sheetFrame.js';

export const aisc: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

/**
 * AISC Design Examples v13.0 D.9 (conformance/SOURCES.md R1), loaded from both ends. By hand: 13/16 in
 * holes, outline 2.8 in (a fifth of 14 in) past the holes, 8.1 in long; at 1:5 (5.08 paper mm per in)
 * 41.148 × 71.12 mm, on a 164 × 168.12 mm sheet with the plate's left edge at 52.426 mm.
 */
export const d9: MemberInput = d9Member;
export const d9Result = analyseMember(d9, aisc);
export const d9Frame = sheetFrame(d9, d9Result, 'in');
