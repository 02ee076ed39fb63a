import { formatQuantity } from '../engine/findings/formatQuantity.js';
import { codeLabel } from '../engine/strength/codeLabel.js';
import type { MemberInput, MemberResult, UnitSystem } from '../engine/types.js';
import { lengthLabel } from './labels.js';
import { DIR_TEXT, TEXT, TITLE } from './sheet.js';
import { sheetText as text } from './sheetText.js';
import type { DrawOptions, Shape, TextShape } from './types.js';

const KIND_TEXT: Record<MemberInput['kind'], string> = {
  angle: 'angle (legs unfolded)',
  'double-angle': 'double angle (legs unfolded)',
  tee: 'tee (unfolded)',
  'w-shape': 'W-shape (unfolded)',
  channel: 'channel (unfolded)',
  plate: 'plate',
  'splice-plate': 'splice plate',
  gusset: 'gusset plate',
};

/**
 * The title block in the sheet's bottom right corner: the member and its kind, the scale, the plate
 * and material, Ag, An (with its direction), U and Ae, the governing available strength with its
 * symbol (φPn, Pn/Ω, N,Rd or Tr) and code, the units, and the caution line along the foot of the sheet.
 *
 * @param member - the member
 * @param result - its analysis
 * @param options - units, profile, project and caution
 * @param sheetW - sheet width, paper mm
 * @param sheetH - sheet height, paper mm
 * @param scale - the drawing's 1:scale
 * @returns the block's frame, rule and lines of text
 * @example
 * titleBlock(d9, result, { units: 'in' }, 297, 210, 5)[2]?.kind // → 'text' ('D9 — plate')
 */
export function titleBlock(
  member: MemberInput,
  result: MemberResult,
  options: DrawOptions,
  sheetW: number,
  sheetH: number,
  scale: number,
): Shape[] {
  const u = options.units;
  const x = sheetW - 9 - TITLE.width;
  const y = sheetH - 9 - 9 - TITLE.height;
  const shapes: Shape[] = [
    { kind: 'rect', at: [x, y], width: TITLE.width, height: TITLE.height, stroke: 'frame' },
    { kind: 'line', from: [x, y + 8], to: [x + TITLE.width, y + 8], stroke: 'frame' },
  ];
  const line = (
    row: number,
    value: string,
    role: TextShape['role'] = 'title-detail',
    size = TEXT.detail,
  ): TextShape => text([x + 2.5, y + 13.2 + row * 4.4], value, size, role, { anchor: 'start' });
  shapes.push(
    text([x + 2.5, y + 5.6], `${member.id} — ${KIND_TEXT[member.kind]}`, TEXT.title, 'title', {
      anchor: 'start',
      weight: 'bold',
    }),
  );
  shapes.push(
    text([x + TITLE.width - 2.5, y + 5.6], `SCALE 1:${scale}`, TEXT.detail, 'title-detail', {
      anchor: 'end',
    }),
  );
  const m = member.material;
  shapes.push(
    line(
      0,
      `${['plate', 'splice-plate', 'gusset'].includes(member.kind) ? 'PL' : 'unfolded'} ${lengthLabel(member.thickness, u)} × ${lengthLabel(member.width, u)} ${u} · ${m.grade ?? 'steel'} (Fy ${formatQuantity(m.Fy, 'stress', u)}, Fu ${formatQuantity(m.Fu, 'stress', u)}) · ${member.holes.length} holes`,
    ),
  );
  const std = options.profile?.standard ?? '';
  const sym = std.startsWith('EN')
    ? 'N,Rd'
    : std.startsWith('CSA')
      ? 'Tr'
      : options.profile?.method === 'ASD'
        ? 'Pn/Ω'
        : 'φPn';
  shapes.push(
    line(
      1,
      `Ag ${formatQuantity(result.Ag, 'area', u)} · An ${formatQuantity(result.An, 'area', u)} (${DIR_TEXT[result.governingDirection]}) · U ${formatQuantity(result.U, 'ratio', u)} · Ae ${formatQuantity(result.Ae, 'area', u)}${result.capped ? ' (0.85 Ag)' : ''}`,
    ),
  );
  shapes.push(
    line(
      2,
      `${sym} ${formatQuantity(result.governing.available, 'force', u)} (${result.governing.limitState} governs)${blockShearNote(result, u)}${options.profile ? ` · ${codeLabel(options.profile)}` : ''}`,
    ),
  );
  shapes.push(
    line(
      3,
      `${options.project ? `${options.project} · ` : ''}dimensions in ${u === 'in' ? 'inches' : 'mm'} · holes drawn at nominal size`,
    ),
  );
  if (options.caution) {
    shapes.push(
      text([sheetW / 2, sheetH - 8.5], options.caution, TEXT.caution, 'caution', {
        anchor: 'middle',
        italic: true,
      }),
    );
  }
  return shapes;
}

/** Block shear is a connection limit state reported beside the member's: say so when it is lower. */
function blockShearNote(result: MemberResult, units: UnitSystem): string {
  const bs = result.blockShear;
  if (!bs || bs.available >= result.governing.available) return '';
  return ` · block shear ${formatQuantity(bs.available, 'force', units)} is lower`;
}
