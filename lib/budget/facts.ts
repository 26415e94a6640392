import type { TemporaryWallTakeoff } from './temporary-walls';

/**
 * The member's size as the budget prices it. Dimensions in in, weight in lb. `by-hand` is an engineer's
 * member the price book cannot price (a PSL, or a size no catalogue holds): its line waits for an override.
 */
export interface MemberSizeFacts {
  family: 'sawn' | 'glulam' | 'lvl' | 'by-hand';
  materialLabel: string;
  sizeId: string;
  sizeLabel: string;
  plies: number;
  bIn: number;
  dIn: number;
  /** One ply's nominal size as sawn lumber is sold ("2x10"); unused for glulam and LVL. */
  nominal: string;
  /** One piece (ply) at the length to buy, lb. */
  pieceWeightLb: number;
}

/** A post under the member and its new footing pad. Heights in ft, pad sizes in in. */
export interface PostFacts {
  label: string;
  heightFt: number;
  /** Sawn nominal of one piece ("4x4", "6x6", "2x6") and how many pieces make the post. */
  nominal: string;
  pieces: number;
  /** Square pad side and thickness, in (the engine's footing pad). */
  footingSideIn: number;
  padThicknessIn: number;
  /** Floors the load crosses on its way down (a squash block set at each). */
  floorsCrossed: number;
}

/** What the engine and the job say about the member being budgeted. Lengths in ft. */
export interface BudgetFacts {
  memberLabel: string;
  kind: 'header' | 'beam';
  mount: 'dropped' | 'flush' | 'raised';
  clearSpanFt: number;
  /** Clear span + bearing at both ends (the check's length to buy), ft. */
  lengthToBuyFt: number;
  size: MemberSizeFacts;
  /** Joists hung from a flush member, or ceiling joists from a raised one (the check's hanger count). */
  joistsHung: number;
  /** Ends bearing on jack studs (framed beside the opening). */
  endsOnJacks: number;
  posts: PostFacts[];
  /** Temporary walls from the shoring plan; null without a plan (a header with no load to carry). */
  shoring: TemporaryWallTakeoff[] | null;
  yearBuilt: number | null;
}

export const allowanceKinds = ['wiring', 'plumbing', 'duct', 'gas'] as const;
export type AllowanceKind = (typeof allowanceKinds)[number];
export const oldHouseKinds = ['knob-and-tube', 'vent-stack', 'asbestos-test'] as const;
export type OldHouseKind = (typeof oldHouseKinds)[number];
export const memberMaterials = ['wood', 'steel', 'flitch'] as const;
export type MemberMaterial = (typeof memberMaterials)[number];

/** The estimator's choices for one budget. Lengths in ft. */
export interface BudgetChoices {
  /** A header in a wall that stays, or the wall removed under a beam. */
  work: 'opening' | 'wall-removed';
  wallHeightFt: number;
  shoring: 'built' | 'rented';
  delivery: 'auto' | 'standard' | 'boom' | 'crane';
  allowances: readonly AllowanceKind[];
  oldHouse: readonly OldHouseKind[];
  engineerSiteVisit: boolean;
  /** The wood member checked, or a steel or flitch alternate priced as an allowance for the engineer to size. */
  material: MemberMaterial;
  /** The posts' new footings are dug through a slab (saw-cut and slab patch). */
  footingThroughSlab: boolean;
  ceilingStripFt?: number;
  openingHeightFt?: number;
}
