/**
 * Block shear: types shared by the outline proposals and the three codes' strength forms. Lengths and
 * areas in the calc file's unit; forces in kip (`in`) or kN (`mm`).
 */

import type { LoadDirection } from '../types.js';

/** A hole of the connected element, placed in its flat layout. */
export interface BlockHole {
  readonly id: string;
  readonly x: number;
  /** Across the load, 0 ≤ y ≤ width. */
  readonly y: number;
  /** Width deducted in net area (nominal plus any allowance of the code). */
  readonly deducted: number;
}

/** The connected element and its bolt group, as block shear sees it. */
export interface BlockShearLayout {
  /** Width of the connected element across the load (y runs over [0, width]). */
  readonly width: number;
  readonly thickness: number;
  /** Identical pieces torn out together (2 for a double angle); default 1. */
  readonly pieces?: number;
  readonly holes: readonly BlockHole[];
  /** Load direction: the block tears out toward the member's loaded end (−x end for `-x`). */
  readonly direction: LoadDirection;
  /** x of the loaded end edge the block leaves through; every hole lies beyond it. */
  readonly endX: number;
  /** Which longitudinal edges are free (an angle's heel is not: the other leg is attached there). */
  readonly freeEdges: { readonly low: boolean; readonly high: boolean };
}

export type BlockOutlineKind = 'two-plane' | 'one-plane-to-low-edge' | 'one-plane-to-high-edge';

/** Gross and net areas of a block's shear and tension planes (all pieces). */
export interface BlockShearAreas {
  readonly Agv: number;
  readonly Anv: number;
  readonly Agt: number;
  readonly Ant: number;
}

/** A proposed block outline with its areas. */
export interface BlockOutline extends BlockShearAreas {
  readonly kind: BlockOutlineKind;
  /** y of each shear plane (along an outer bolt line). */
  readonly shearPlanes: readonly number[];
  /** Holes the tension plane passes through (the last hole of each gauge line it crosses), in y order. */
  readonly tensionHoles: readonly string[];
  /** Σ s²/4g along the tension plane (0 when it runs straight across). */
  readonly staggerSum: number;
  /**
   * `project-defined` when the tension plane is staggered (no published example takes s²/4g on a
   * block's tension plane; the rule is AISC 360 J4.3's, the vectors are ours).
   */
  readonly source: 'code' | 'project-defined';
}

/** Block shear strength of one outline under one code. */
export interface BlockShearStrength {
  /** Nominal strength (Rn, Veff,Rd before γ, or Tr/φu), kip or kN. */
  readonly nominal: number;
  /** φ (LRFD, CSA), Ω (ASD), or γM2 as the EN partial factor on the tension term. */
  readonly factor: number;
  /** Design, allowable or factored resistance, kip or kN. */
  readonly available: number;
  /** Which term governed, in words of the clause. */
  readonly governs: string;
  /** Clause the value comes from. */
  readonly clause: string;
}

/** An outline with its strength. */
export interface BlockShearCase extends BlockOutline {
  readonly strength: BlockShearStrength;
}

/** All outlines for a bolt group and the governing one. */
export interface BlockShearResult {
  readonly cases: readonly BlockShearCase[];
  /** The least available strength, or null when no outline can form (no holes). */
  readonly governing: BlockShearCase | null;
}
