import type { MemberInput, MemberResult } from '../engine/types.js';
import { axisShapes } from './axisShapes.js';
import { dimensionStrings } from './dimensionStrings.js';
import { fractureShapes } from './fractureShapes.js';
import { holeIdLabels } from './holeIdLabels.js';
import { holeShapes } from './holeShapes.js';
import { lengthLabel } from './labels.js';
import { loadArrowShapes } from './loadArrowShapes.js';
import { outlineShapes } from './outlineShapes.js';
import { sheetFrame } from './sheetFrame.js';
import { titleBlock } from './titleBlock.js';
import type { DrawOptions, Drawing } from './types.js';

function round(v: number): number {
  return Math.round(v * 100) / 100;
}

/**
 * The sketch of a member and its result: plate outline, holes at their nominal size (slots as
 * slots), centre lines, gauge and pitch dimension strings, load arrows at the loaded end(s), the
 * governing fracture line of each direction labelled with its net width, hole ids and a title block.
 *
 * The plate's length is not part of a calc file, so the outline runs a generous end distance past
 * the outermost holes.
 *
 * @param member - the member as the engine sees it
 * @param result - the engine's result for it (hole widths, governing chains)
 * @param options - units, code profile and project for the title block
 * @returns the drawing model (paper mm)
 * @example
 * buildDrawing(member, analyseMember(member, profile), { units: 'in', profile }).scale // → 5 for a 14 in plate
 */
export function buildDrawing(member: MemberInput, result: MemberResult, options: DrawOptions): Drawing {
  const frame = sheetFrame(member, result, options.units);
  const { right, bottom } = frame;
  // The gauge string, the overall width outside it, and the pitch string below the plate.
  const at = { gaugeAt: right + 24, widthAt: right + 36, pitchAt: bottom + 12 };
  const fractures = fractureShapes(member, result, frame);
  const shapes = [
    ...outlineShapes(member, frame),
    ...holeShapes(member, result, frame, at.gaugeAt, at.pitchAt),
    ...dimensionStrings(member, frame, at),
    ...loadArrowShapes(member, result, frame),
    ...fractures,
    ...axisShapes(frame),
    ...holeIdLabels(member, result, frame, fractures),
    ...titleBlock(member, result, options, frame.sheetW, frame.sheetH, frame.scale),
  ];
  const units = options.units;
  return {
    width: round(frame.sheetW),
    height: round(frame.sheetH),
    scale: frame.scale,
    paperPerUnit: frame.k,
    units,
    memberId: member.id,
    title: `${member.id}: ${member.holes.length} holes, ${lengthLabel(member.thickness, units)} × ${lengthLabel(member.width, units)} ${units} plate, scale 1:${frame.scale}`,
    shapes,
  };
}
