import type { MemberModel } from '../types.js';

/** The holes of one flat element, in the element's own coordinates. */
export interface ElementHoleGroup {
  /** Element id (`plate` for a plate). */
  readonly element: string;
  /** Width across the load (a section element's centreline span). */
  readonly width: number;
  readonly thickness: number;
  /** Whether the edges at y = 0 and y = width are free edges (not joined to another element). */
  readonly free: { readonly low: boolean; readonly high: boolean };
  readonly holes: readonly {
    readonly index: number;
    readonly id: string;
    readonly x: number;
    /** Across the element: the plate's y, or the position u along the element's centreline. */
    readonly y: number;
    readonly boltDiameter?: number;
    readonly nominal: number;
  }[];
}

/**
 * The member's holes grouped by the flat element they lie in, for detailing rules that measure within
 * one element: a plate is one group with two free edges; a section's element has free edges where no
 * junction attaches (an angle's toe, a flange's tips; never a web).
 *
 * @param model - the member model (a plate's holes, or a section's unfolded holes, with their widths)
 * @returns one group per element with holes, in element order
 * @example
 * elementHoleGroups(memberModel(plate14, aisc))[0]?.free // → { low: true, high: true }
 */
export function elementHoleGroups(model: MemberModel): ElementHoleGroup[] {
  const { input: member, holeWidths } = model;
  if (!model.unfolded) {
    return [
      {
        element: 'plate',
        width: member.width,
        thickness: member.thickness,
        free: { low: true, high: true },
        holes: member.holes.map((h, index) => ({
          index,
          id: h.id,
          x: h.x,
          y: h.y,
          ...(h.boltDiameter !== undefined ? { boltDiameter: h.boltDiameter } : {}),
          nominal: holeWidths[index]!.nominalAcross,
        })),
      },
    ];
  }
  const layout = model.unfolded;
  const eps = layout.tolerance;
  return layout.section.elements.flatMap((e) => {
    const holes = layout.holes.filter((h) => h.element === e.id);
    if (holes.length === 0) return [];
    const at = layout.section.junctions.flatMap((j) =>
      j.attachments.filter((a) => a.element === e.id).map((a) => a.u),
    );
    return [
      {
        element: e.id,
        width: e.span,
        thickness: e.thickness,
        free: { low: !at.some((u) => u <= eps), high: !at.some((u) => u >= e.span - eps) },
        holes: holes.map((h) => {
          const input = member.holes[h.index]!;
          return {
            index: h.index,
            id: h.id,
            x: h.x,
            y: h.u,
            ...(input.boltDiameter !== undefined ? { boltDiameter: input.boltDiameter } : {}),
            nominal: holeWidths[h.index]!.nominalAcross,
          };
        }),
      },
    ];
  });
}
