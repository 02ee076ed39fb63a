/**
 * The sheet a member is drawn on (paper mm, origin top left, y down): the text sizes, the title
 * block's size and how a load direction is written. Shared by the parts of buildDrawing (model.ts).
 */
import type { LoadDirection, UnitSystem } from '../engine/types.js';

/** Text sizes by role, paper mm. */
export const TEXT = { dim: 2.5, id: 2.3, label: 2.6, title: 3.6, detail: 2.5, caution: 2.2 } as const;

/** The title block in the sheet's bottom right corner. */
export const TITLE = { width: 136, height: 31 } as const;

/** Real millimetres per member unit. */
export const MM_PER: Record<UnitSystem, number> = { in: 25.4, mm: 1 };

/** A load direction as written on the sheet, with a true minus sign. */
export const DIR_TEXT: Record<LoadDirection, string> = { '-x': '−x', '+x': '+x' };

/** Where the member sits on the sheet and how its coordinates become paper mm. */
export interface SheetFrame {
  readonly units: UnitSystem;
  /** Drawn at 1:scale. */
  readonly scale: number;
  /** Paper mm per member unit. */
  readonly k: number;
  readonly sheetW: number;
  readonly sheetH: number;
  /** The plate's outline on the sheet. */
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
  /** The member's gross width, member units. */
  readonly W: number;
  /** Two lengths closer than this (member units) are the same line. */
  readonly eps: number;
  /** Paper x of a member x; paper y of a member y (y up the sheet). */
  readonly X: (x: number) => number;
  readonly Y: (y: number) => number;
}
