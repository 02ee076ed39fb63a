/**
 * Types shared by every part of the engine. Numbers are plain JavaScript numbers in the unit system
 * of the calc file they came from:
 *
 * | unit system | length | area | stress | force |
 * |-------------|--------|------|--------|-------|
 * | `in`        | in     | in²  | ksi    | kip   |
 * | `mm`        | mm     | mm²  | MPa    | kN    |
 *
 * (MPa·mm² = N, so forces in an `mm` calc are divided by 1000 to give kN.)
 *
 * Coordinates: `x` runs along the load axis, `y` across the width from one longitudinal edge,
 * 0 ≤ y ≤ width.
 */
import type { SectionGrossArea, SectionLayout } from './sections/types.js';

/** Unit system of a calc file. */
export type UnitSystem = 'in' | 'mm';

/**
 * Where the tension comes from. `-x`: the member is pulled at its −x end toward −x, so the loaded
 * side of any fracture line is its −x side and every hole not in the chain must lie strictly on the
 * +x side. `+x` is the mirror image.
 */
export type LoadDirection = '-x' | '+x';

/** Design code profiles the engine knows. */
export type CodeStandard = 'AISC 360-22' | 'AISC 360-16' | 'AISC 360-10' | 'EN 1993-1-1' | 'CSA S16-19';

/**
 * Design method, named as each code names it: AISC 360 load and resistance factor design (`LRFD`)
 * or allowable strength design (`ASD`); EN 1993 the partial factor method (`partial-factor`); CSA
 * S16 limit states design (`LSD`). A 1.0 file may still say `LRFD` for EN or CSA (designMethodOf).
 */
export type DesignMethod = 'LRFD' | 'ASD' | 'partial-factor' | 'LSD';

/**
 * What the member is: a plate (`plate`, `splice-plate`, `gusset`) or a rolled shape made of flat
 * elements (`angle`, `double-angle`, `tee`, `w-shape`, `channel`; these carry a `section`).
 */
export type MemberKind =
  'plate' | 'splice-plate' | 'gusset' | 'angle' | 'double-angle' | 'tee' | 'w-shape' | 'channel';

export type HoleType = 'standard' | 'oversized' | 'short-slotted' | 'long-slotted';

/** Orientation of a slot's long dimension relative to the load axis. */
export type SlotOrientation = 'along' | 'across';

/** The code profile a member is checked under. */
export interface CodeProfile {
  readonly standard: CodeStandard;
  readonly method: DesignMethod;
  readonly units: UnitSystem;
  /**
   * Partial factors a National Annex sets (EN 1993-1-1 only; recommended γM0 = 1.00, γM2 = 1.25
   * when absent).
   */
  readonly nationalAnnex?: { readonly gammaM0?: number; readonly gammaM2?: number };
}

/** A hole as the engine sees it, after the calc file has been parsed and normalised. */
export interface HoleInput {
  readonly id: string;
  readonly x: number;
  readonly y: number;
  /** Nominal bolt diameter (in or mm). Absent when only an explicit dimension is given. */
  readonly boltDiameter?: number;
  readonly type: HoleType;
  /** Required for slotted holes. */
  readonly slot?: SlotOrientation;
  /**
   * Explicit nominal hole dimensions, replacing the code's hole table: `width` across the load,
   * `length` along the load (equal for round holes). The damage allowance is still added.
   */
  readonly dimension?: { readonly across: number; readonly along: number };
  /** Section members: id of the element the hole lies in (e.g. `leg-a`, `flange-1`, `web`). */
  readonly element?: string;
  /** Section members: gauge as the element's datum says (see sections/README.md §2). */
  readonly gauge?: number;
}

export interface MaterialInput {
  readonly grade?: string;
  /** Specified minimum yield stress (ksi or MPa). */
  readonly Fy: number;
  /** Specified minimum tensile strength (ksi or MPa). */
  readonly Fu: number;
}

/** A rolled shape given by its dimensions (see sections/README.md). */
export interface MemberSectionInput {
  readonly shape: 'angle' | 'tee' | 'w-shape' | 'channel';
  /** Angle: leg lengths a (leg-a), b (leg-b) and thickness t. */
  readonly a?: number;
  readonly b?: number;
  readonly t?: number;
  /** Tee, W-shape, channel: depth d, flange width bf, flange thickness tf, web (stem) thickness tw. */
  readonly d?: number;
  readonly bf?: number;
  readonly tf?: number;
  readonly tw?: number;
  /** Identical pieces acting together (2 for a double angle back to back); default 1. */
  readonly pieces?: number;
  /** Tabulated gross area of all pieces; wins over the elements' sum (the difference is reported). */
  readonly tabulatedAg?: number;
}

/** Connection data for shear lag (AISC 360 Table D3.1, CSA S16 12.3.3.2, EN 1993-1-8 3.10.3). */
export interface ShearLagSpec {
  /** Which element carries the fasteners. */
  readonly connected: 'flange' | 'web' | 'leg' | 'other';
  /** Connection length l, first to last fastener along the load. */
  readonly length?: number;
  /** Connection eccentricity x̄ (or ȳ). */
  readonly xbar?: number;
  /** Fasteners per line along the load (transverse lines of fasteners). */
  readonly fastenersPerLine?: number;
}

/** Block shear input: which bolt group tears out and how. */
export interface BlockShearSpec {
  /** Section members: ids of the connected elements that tear out together (default all with holes). */
  readonly elements?: readonly string[];
  /** End distance from the last bolt row to the loaded end of the member, along the load. */
  readonly endDistance: number;
  /** AISC Ubs (1 uniform, 0.5 not); EN: 1 concentric, 0.5 eccentric; CSA Ut given separately. Default 1. */
  readonly Ubs?: 1 | 0.5;
  /** CSA S16 13.11 efficiency factor Ut (default 1.0). */
  readonly Ut?: number;
  /**
   * Tension factor (AISC Ubs, CSA Ut; EN below 1 means eccentric) of particular outline kinds, e.g.
   * `{ "to-edge": 0.6 }` for an angle's L-shaped block under CSA S16; kinds not named take Ubs / Ut.
   */
  readonly byOutline?: Readonly<Record<string, number>>;
}

/** A member as the engine sees it. */
export interface MemberInput {
  readonly id: string;
  readonly kind: MemberKind;
  /** Gross width across the load. */
  readonly width: number;
  readonly thickness: number;
  readonly material: MaterialInput;
  readonly holes: readonly HoleInput[];
  /** One or both directions, no repeats. */
  readonly directions: readonly LoadDirection[];
  /** Shear lag factor; the engine uses 1.0 for plates (AISC 360 Table D3.1 case 1) when absent. */
  readonly U?: number;
  /** Required strength (Pu for LRFD, Pa for ASD), kip or kN. */
  readonly requiredStrength?: number;
  /**
   * A rolled shape: holes then give `element` and `gauge`; `width` and `thickness` are the unfolded
   * width and the first element's thickness (for drawing), and `y` the unfolded position.
   */
  readonly section?: MemberSectionInput;
  /** Connection data the shear lag factor is found from (ignored when U is given). */
  readonly shearLag?: ShearLagSpec;
  /** Block shear of the bolt group at the loaded end. */
  readonly blockShear?: BlockShearSpec;
}

/** Hole width the engine deducts, with how it was found. */
export interface HoleWidth {
  readonly holeId: string;
  /** Nominal dimension across the load, from the table or given explicitly. */
  readonly nominalAcross: number;
  /** Nominal dimension along the load. */
  readonly nominalAlong: number;
  /** Damage allowance added for net area (AISC 360 B4.3b). */
  readonly allowance: number;
  /** nominalAcross + allowance: the width deducted in net area. */
  readonly deducted: number;
  readonly source: 'table' | 'explicit';
}

/** One gauge space of a chain: a leg between two consecutive holes of the chain. */
export interface ChainLeg {
  readonly from: string;
  readonly to: string;
  /** Stagger (pitch offset) along the load, always ≥ 0. */
  readonly s: number;
  /** Gauge across the load, always > 0. */
  readonly g: number;
  /** s²/(4g). */
  readonly term: number;
}

/** A chain of holes crossing the member, holes in order of increasing y. */
export interface Chain {
  readonly holes: readonly string[];
  readonly legs: readonly ChainLeg[];
  /** Σ deducted hole widths. */
  readonly deducted: number;
  /** Σ s²/4g. */
  readonly staggerSum: number;
  /** width − deducted + staggerSum. */
  readonly netWidth: number;
  /** netWidth · thickness. */
  readonly netArea: number;
}

/** Why a chain cannot fracture under the full load from a direction. */
export interface ChainRejection {
  readonly direction: LoadDirection;
  /** The first hole (in y order) found on the loaded side of, or exactly on, the fracture line. */
  readonly blockingHole: string;
  readonly reason: 'loaded-side' | 'on-line';
}

/** A chain with its standing in each direction asked for. */
export interface RankedChain extends Chain {
  /** Directions in which this chain can form under the full load. */
  readonly admissible: readonly LoadDirection[];
  /** One entry per direction in which it cannot. */
  readonly rejections: readonly ChainRejection[];
}

/** The equal-share rule's chain (cli/docs/method.md §4): each fastener takes an equal share of the load. */
export interface EqualShareChain {
  readonly direction: LoadDirection;
  /** Chain with the least An / share over all chains. */
  readonly chain: Chain;
  /** Fasteners in the chain or on its far side. */
  readonly fastenersCarried: number;
  readonly fastenersTotal: number;
  /** fastenersCarried / fastenersTotal. */
  readonly share: number;
  /** netArea / share: the area that would be needed under the full load to match this chain. */
  readonly equivalentArea: number;
}

/** Net section for one load direction. */
export interface DirectionResult {
  readonly direction: LoadDirection;
  /** Least admissible chain, or null when no chain can form (no holes, or every chain blocked). */
  readonly governing: Chain | null;
  /** The k least admissible chains, ascending by net width, distinct. */
  readonly leastChains: readonly Chain[];
  /** min(governing net area, Ag). */
  readonly An: number;
  readonly share: EqualShareChain | null;
}

/** Tensile yielding, tensile rupture, or block shear (AISC 360 J4.3, EN 1993-1-8 3.10.2, CSA S16 13.11). */
export type LimitState = 'yielding' | 'rupture' | 'block shear';

export interface Strength {
  readonly limitState: LimitState;
  /** Nominal strength Pn. */
  readonly nominal: number;
  /** φ (LRFD) or Ω (ASD). */
  readonly factor: number;
  /** φPn (LRFD) or Pn/Ω (ASD): the design or allowable strength. */
  readonly available: number;
}

/** Everything the engine computes for a member. */
export interface MemberResult {
  readonly memberId: string;
  readonly Ag: number;
  readonly holeWidths: readonly HoleWidth[];
  readonly directions: readonly DirectionResult[];
  /** min over directions of An. */
  readonly An: number;
  /** Direction whose An governs. */
  readonly governingDirection: LoadDirection;
  readonly U: number;
  /** An·U, capped at 0.85 Ag for bolted splice plates (AISC 360 J4.1(b)). */
  readonly Ae: number;
  /** True when the 0.85 Ag cap governed Ae. */
  readonly capped: boolean;
  readonly yielding: Strength;
  readonly rupture: Strength;
  /**
   * The least available strength: yielding, rupture, and block shear when block-shear input is given
   * (then `limitState` is `block shear` and the values are {@link MemberBlockShear}'s).
   */
  readonly governing: Strength;
  /** requiredStrength / governing.available, when a required strength is given. */
  readonly utilisation?: number;
  /** Section members: gross area from the elements and as tabulated. */
  readonly grossArea?: MemberGrossArea;
  /** How U was found (absent for a plate with the default or a given U). */
  readonly shearLag?: MemberShearLag;
  /** Block shear, when block-shear input is given: the governing direction's result. */
  readonly blockShear?: MemberBlockShear;
  /** Clause of each strength, for EN 1993 and CSA S16 profiles. */
  readonly clauses?: { readonly yielding: string; readonly rupture: string };
}

/** Gross area of a section member. */
export interface MemberGrossArea {
  readonly fromElements: number;
  readonly tabulated?: number;
  /** The value used (tabulated when given). */
  readonly used: number;
  /** tabulated − fromElements. */
  readonly difference?: number;
}

/** The shear lag factor and its basis. */
export interface MemberShearLag {
  readonly U: number;
  /** `D3.1 case 2/7/8`, `given`, `CSA S16 12.3.3.2`, `EN 1993-1-8 3.10.3`, or `none`. */
  readonly rule: string;
  /** One line with the numbers. */
  readonly basis: string;
  /** Set when no rule applied to the connection data given: U was taken as 1.0 (LG142). */
  readonly notApplicable?: string;
  /**
   * The net area U multiplies when the rule says it is not the member's An (all pieces): for an EN
   * unequal-leg angle connected by its smaller leg, that of the equivalent equal-leg angle
   * (EN 1993-1-8 3.10.3(2)). Then Ae = area · U; absent, Ae = An · U.
   */
  readonly netArea?: { readonly area: number; readonly clause: string; readonly basis: string };
}

/** One block outline of a member with its areas and strength (all pieces). */
export interface MemberBlockOutline {
  readonly direction: LoadDirection;
  /** `two-plane`, `to-edge`, `to-edges`, each with `+root` when a plane cuts an element's root. */
  readonly kind: string;
  /** The shear planes and tension spans in words. */
  readonly description: string;
  readonly Agv: number;
  readonly Anv: number;
  readonly Agt: number;
  readonly Ant: number;
  /** The outline's own tension factor (Ubs, Ut, or EN's 1 / 0.5). */
  readonly tensionFactor: number;
  readonly nominal: number;
  readonly available: number;
  readonly tensionHoles: readonly string[];
  readonly source: 'code' | 'project-defined';
}

/** Block shear areas and strength of one tear-out (all elements and pieces torn out together). */
export interface MemberBlockShear {
  readonly direction: LoadDirection;
  readonly Agv: number;
  readonly Anv: number;
  readonly Agt: number;
  readonly Ant: number;
  readonly nominal: number;
  readonly factor: number;
  readonly available: number;
  readonly clause: string;
  /** Kind and words of the governing outline (see {@link MemberBlockOutline}). */
  readonly kind: string;
  readonly description: string;
  /** The governing outline's tension factor. */
  readonly tensionFactor: number;
  /** The elements the governing outline runs through, each with the outline's values. */
  readonly parts: readonly {
    readonly element: string;
    readonly kind: string;
    readonly tensionHoles: readonly string[];
    readonly staggerSum: number;
    readonly source: 'code' | 'project-defined';
    readonly available: number;
  }[];
  /** True when any part's tension plane is staggered (project-defined). */
  readonly projectDefined: boolean;
  /** The least outlines over the directions checked (up to 10), least first; the first governs. */
  readonly outlines: readonly MemberBlockOutline[];
}

/**
 * A hole placed in a member, reduced to what the chain search needs: its position, its index in the
 * member's `holes` array (for JSON pointers) and the width it deducts (see {@link HoleWidth}).
 */
export interface PlacedHole {
  readonly id: string;
  /** Index in the member's `holes` array. */
  readonly index: number;
  readonly x: number;
  readonly y: number;
  /** Width deducted in net area: nominal dimension across the load plus the damage allowance. */
  readonly deducted: number;
}

/** The holes of a member with the plate they sit in: the input of every chain search. */
export interface HoleLayout {
  /** Gross width across the load. */
  readonly width: number;
  readonly thickness: number;
  readonly holes: readonly PlacedHole[];
}

/** Where every hole lies relative to a chain's fracture line for a load direction. */
export interface FractureSides {
  readonly direction: LoadDirection;
  /** Holes in the chain. */
  readonly chain: readonly string[];
  /** Holes strictly on the loaded side (they would still push on the freed piece). */
  readonly loaded: readonly string[];
  /** Holes exactly on the fracture line without being in the chain. */
  readonly onLine: readonly string[];
  /** Holes strictly on the far (non-loaded) side. */
  readonly far: readonly string[];
}

/** Why a list of hole ids is not a chain at all. */
export interface ChainDefect {
  readonly reason: 'empty' | 'unknown-hole' | 'same-gauge-line' | 'out-of-order' | 'repeated-hole';
  /** Position in the list of the first offending id (0 for `empty`). */
  readonly position: number;
  readonly holeId?: string;
  readonly message: string;
}

/** Options of {@link analyseMember}. */
export interface AnalyseOptions {
  /** How many least chains to keep per direction (default 10). */
  readonly k?: number;
  /** Only these directions (default: the member's own). */
  readonly directions?: readonly LoadDirection[];
}

/** A problem with the member's input itself (LG3xx), found before any analysis. */
export interface InputIssue {
  readonly code: string;
  readonly name: string;
  /** Rule name as the loader reports it in a CalcError (the same as `name`). */
  readonly rule: string;
  readonly message: string;
  /** JSON pointer suffix relative to the member, e.g. `/holes/3` or `/holes/3/id`. */
  readonly pointer: string;
  /** Hole ids concerned. */
  readonly holes: readonly string[];
}

/**
 * A member built once for an analysis or an audit (member/memberModel.ts): its input and profile, the
 * width every hole deducts, and what the chain searches work on: a plate's hole layout, or a rolled
 * shape's unfolded section with its gross area. The analysis, the claimed-chain tools, and the
 * grazing and detailing findings all take this one value, so nothing is built twice.
 */
export type MemberModel = PlateModel | SectionModel;

interface BuiltMember {
  readonly input: MemberInput;
  readonly profile: CodeProfile;
  /** Width each hole deducts, in hole order (holes/memberHoleWidth.ts). */
  readonly holeWidths: readonly HoleWidth[];
}

/** A plate (`plate`, `splice-plate`, `gusset`) as the chain searches see it. */
export interface PlateModel extends BuiltMember {
  readonly layout: HoleLayout;
  readonly unfolded?: undefined;
}

/** A rolled shape unfolded into flat elements (cli/src/engine/sections/README.md). */
export interface SectionModel extends BuiltMember {
  readonly unfolded: SectionLayout;
  /** Gross area from the elements and as tabulated; `used` is Ag. */
  readonly grossArea: SectionGrossArea;
  readonly layout?: undefined;
}
