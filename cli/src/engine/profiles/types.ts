/**
 * Code profiles outside AISC 360: EN 1993-1-1 (with EN 1993-1-8 and EN 1090-2 for holes and
 * detailing) and CSA S16. SI only: lengths mm, areas mm², stresses MPa, forces kN.
 */

/** Standards these profiles implement; the core dispatches on `profile.standard`. */
export type ProfileStandard = 'EN 1993-1-1' | 'CSA S16-19';

/** A hole as a profile sizes it. */
export interface ProfileHoleInput {
  /** Nominal bolt diameter, mm (20 for M20). */
  readonly boltDiameter?: number;
  /** Hole diameter given explicitly (e.g. 22 mm punched for a 3/4 in bolt); replaces the table. */
  readonly holeDiameter?: number;
}

/** Width a profile deducts for a hole, with how it was found. */
export interface ProfileHoleWidth {
  /** Nominal hole diameter (d0 in EN). */
  readonly nominal: number;
  /** Added for net area: 0 in EN 1993-1-1, 2 mm in CSA S16. */
  readonly allowance: number;
  /** nominal + allowance. */
  readonly deducted: number;
  readonly source: 'table' | 'explicit';
  readonly clause: string;
}

/** One tensile limit state of a profile. */
export interface ProfileStrength {
  readonly limitState: 'yielding' | 'rupture';
  /** Resistance before the factor (A·fy, 0.9·Anet·fu, Ag·Fy, Ane·Fu), kN. */
  readonly nominal: number;
  /** γM0 / γM2 (EN: divided by) or φ / φu (CSA: multiplied by). */
  readonly factor: number;
  /** Design (factored) resistance, kN. */
  readonly available: number;
  readonly clause: string;
}

/** Areas and material a tension check needs. */
export interface ProfileTensionInput {
  /** Gross area, mm². */
  readonly Ag: number;
  /** Net area, mm². */
  readonly An: number;
  /** Effective net area after shear lag (CSA Ane, EN Anet as reduced for angles); default An. */
  readonly Ae?: number;
  /** Yield strength, MPa. */
  readonly Fy: number;
  /** Tensile strength, MPa. */
  readonly Fu: number;
}

/** Yielding, rupture and the lesser. */
export interface ProfileTensionResult {
  readonly yielding: ProfileStrength;
  readonly rupture: ProfileStrength;
  readonly governing: ProfileStrength;
}

/** Hole spacings as a detailing rule reads them (any may be absent). */
export interface DetailingInput {
  /** Nominal hole diameter d0, mm. */
  readonly d0: number;
  /** Nominal bolt diameter d, mm. */
  readonly boltDiameter?: number;
  /** Thickness of the thinner outer connected part, mm (for maxima). */
  readonly t?: number;
  /** Least end distance along the load. */
  readonly e1?: number;
  /** Least edge distance across the load. */
  readonly e2?: number;
  /** Least spacing along the load (pitch). */
  readonly p1?: number;
  /** Least spacing across the load (gauge) between adjacent lines whose holes are in line. */
  readonly p2?: number;
  /** Least spacing across the load between adjacent staggered lines (EN 1993-1-8 Table 3.3 note 5). */
  readonly p2Staggered?: number;
  /** Least centre-to-centre distance between any two holes. */
  readonly L?: number;
  /**
   * Whether the member is exposed to the weather or other corrosive influences: EN 1993-1-8 Table 3.3
   * maxima apply to a tension member only then (note 1, from memory). Calc files do not say; absent,
   * the maxima are not checked.
   */
  readonly exposed?: boolean;
  /** Greatest end or edge distance (for the maximum rule). */
  readonly eMax?: number;
  /** Greatest spacing (for the maximum rule). */
  readonly pMax?: number;
}

/** One detailing rule a layout breaks. */
export interface DetailingIssue {
  readonly quantity: 'e1' | 'e2' | 'p1' | 'p2' | 'L' | 'e' | 'p';
  readonly kind: 'minimum' | 'maximum';
  readonly value: number;
  readonly limit: number;
  readonly clause: string;
  readonly message: string;
}

/** How a profile computes net area. */
export interface NetAreaRule {
  /** Every profile here takes the least admissible chain (straight or staggered). */
  readonly rule: 'least-chain';
  /** Allowance added to each hole, mm. */
  readonly allowance: number;
  readonly clause: string;
  readonly description: string;
}

/** The common shape of a code profile, so the core can dispatch on `standard`. */
export interface TensionProfile {
  readonly standard: ProfileStandard;
  readonly units: 'mm';
  /** Resistance or partial factors, by name (γM0, γM2 or φ, φu). */
  readonly factors: Readonly<Record<string, number>>;
  readonly netAreaRule: NetAreaRule;
  holeWidth(hole: ProfileHoleInput): ProfileHoleWidth;
  tensionResistance(input: ProfileTensionInput): ProfileTensionResult;
  detailing(input: DetailingInput): DetailingIssue[];
}
