/**
 * Block shear: types shared by the outline search and the three codes' strength forms. Lengths and
 * areas in the calc file's unit; forces in kip (`in`) or kN (`mm`).
 */

import type { LoadDirection } from '../../types.js';

/** A flat element of the cross-section (a plate is one element; a section has several). */
export interface BlockElement {
  readonly id: string;
  readonly thickness: number;
  /** Length of the centreline; positions `u` on it run over [0, span]. */
  readonly span: number;
  /**
   * Material of the element beyond its centreline ends, so the element owns [−extendLow,
   * span + extendHigh] of the cross-section (negative where another element owns the overlap: a
   * channel flange starts at the web's face). Default 0.
   */
  readonly extendLow?: number;
  readonly extendHigh?: number;
}

/** Where elements meet (an angle's heel, a web-to-flange junction). */
export interface BlockJunction {
  readonly id: string;
  readonly attachments: readonly { readonly element: string; readonly u: number }[];
}

/** A hole of the bolt group, placed on its element. */
export interface BlockHole {
  readonly id: string;
  readonly element: string;
  readonly x: number;
  /** Position along the element's centreline, 0 < u < span. */
  readonly u: number;
  /** Width deducted in net area (nominal plus any allowance of the code). */
  readonly deducted: number;
}

/** The cross-section and the bolt group at the member's end, as block shear sees it. */
export interface BlockShearLayout {
  readonly elements: readonly BlockElement[];
  readonly junctions: readonly BlockJunction[];
  readonly holes: readonly BlockHole[];
  /** Identical pieces torn out together (2 for a double angle); default 1. */
  readonly pieces?: number;
  /**
   * Load direction of the member (`-x` means the member's body lies
   * toward −x and its free end toward +x, beyond the +x-most bolt row). The block tears out toward
   * the free end; its tension plane crosses each bolt line at the hole nearest the body.
   */
  readonly direction: LoadDirection;
  /** x of the member's free end, beyond every hole (greater than every x for `-x`). */
  readonly endX: number;
  /** Lengths closer than this are equal (default 1e-9 · the largest dimension). */
  readonly tolerance?: number;
}

/** Gross and net areas of a block's shear and tension planes (all pieces). */
export interface BlockShearAreas {
  readonly Agv: number;
  readonly Anv: number;
  readonly Agt: number;
  readonly Ant: number;
}

/** A shear plane of an outline: along a bolt line (through its holes) or through an element's root. */
export interface BlockShearPlane {
  readonly element: string;
  /** Position on the element's centreline. */
  readonly u: number;
  /** `line`: along a bolt line; `root`: through the thinner side at a junction (no holes). */
  readonly along: 'line' | 'root';
  /** The junction, for a root plane. */
  readonly junction?: string;
  /** Holes on the plane, for a line. */
  readonly holes: readonly string[];
  readonly thickness: number;
}

/** A stretch of an element the tension plane crosses. */
export interface BlockTensionSpan {
  readonly element: string;
  readonly from: number;
  readonly to: number;
}

/** A proposed block outline with its areas. */
export interface BlockOutline extends BlockShearAreas {
  /**
   * `two-plane`: tension between two shear planes only; `to-edge`: tension reaches one free edge
   * (L-shaped); `to-edges`: it reaches two or more; each with `+root` when a plane cuts through an
   * attached element's root instead of along bolts.
   */
  readonly kind: string;
  /** One line in words: the shear planes and the tension spans. */
  readonly description: string;
  readonly shearPlanes: readonly BlockShearPlane[];
  readonly tension: readonly BlockTensionSpan[];
  /** Holes the tension plane passes through (each bolt line's hole nearest the body). */
  readonly tensionHoles: readonly string[];
  /** Free element ends the tension plane reaches. */
  readonly freeEdges: number;
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
  /** The tension-term factor used for this outline (AISC Ubs, CSA Ut; EN 1 or 0.5). */
  readonly tensionFactor: number;
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
