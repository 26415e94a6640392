import {
  buildShortlist,
  CalcInputError,
  checkMember,
  getMaterial,
  getSize,
  listMaterials,
  listSizes,
  pieceWeightLb,
  planShoring,
  sizeFootingPad,
  type MaterialFamily,
  type MemberSize,
} from '@/lib/calc';
import {
  temporaryWalls,
  type BudgetChoices,
  type BudgetFacts,
  type MemberMaterial,
  type MemberSizeFacts,
  type PostFacts,
} from '@/lib/budget';
import type { MemberCheckInput, MemberCheckResult } from '@/shared/schemas/calc/member';
import type { BudgetChoicesInput } from '@/shared/schemas/budgets';
import type { Job } from '@/shared/schemas/jobs';
import type { Member } from '@/shared/schemas/members';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { DESIGNED_MATERIAL_LABELS, type DesignedMaterial } from '@/shared/schemas/requests/reply';

/** Floor to ceiling when the estimator gives none, ft (common practice: an 8 ft wall). */
export const DEFAULT_WALL_HEIGHT_FT = 8;
/** Pad thickness when the member's posts give none, in (common practice, as the engine's default). */
const DEFAULT_PAD_IN = 12;
/** Most shortlist sizes priced side by side. */
export const COMPARED_SIZES = 12;
/** Post width a centre post takes out of the span, ft (a 4x4's 3-1/2 in face, common practice). */
const CENTRE_POST_FT = 3.5 / 12;

/** The choices with every default filled in: the work by the member's kind, the slab by the foundation. */
export function resolveChoices(given: BudgetChoicesInput, member: Member, job: Job): BudgetChoices {
  return {
    work: given.work ?? (member.kind === 'header' ? 'opening' : 'wall-removed'),
    wallHeightFt: given.wallHeightFt ?? DEFAULT_WALL_HEIGHT_FT,
    shoring: given.shoring ?? 'built',
    delivery: given.delivery ?? 'auto',
    allowances: given.allowances,
    oldHouse: given.oldHouse,
    engineerSiteVisit: given.engineerSiteVisit,
    material: given.material ?? 'wood',
    footingThroughSlab: given.footingThroughSlab ?? job.foundation === 'slab',
    ceilingStripFt: given.ceilingStripFt,
    openingHeightFt: given.openingHeightFt,
  };
}

export function sizeFacts(materialId: string, size: MemberSize, lengthToBuyFt: number): MemberSizeFacts {
  const material = getMaterial(materialId);
  return {
    family: material.family,
    materialLabel: material.label,
    sizeId: size.id,
    sizeLabel: size.label,
    plies: size.plies,
    bIn: size.bIn,
    dIn: size.dIn,
    nominal: size.nominal,
    pieceWeightLb: pieceWeightLb(size, lengthToBuyFt),
  };
}

function postFacts(input: MemberCheckInput, result: MemberCheckResult): PostFacts[] {
  if (!input.posts || !result.posts) return [];
  const post = getSize(input.posts.materialId, input.posts.sizeId);
  return result.posts.map((p) => ({
    label: `${p.end[0].toUpperCase()}${p.end.slice(1)} post`,
    heightFt: input.posts!.heightFt,
    nominal: post.nominal,
    pieces: post.plies,
    footingSideIn: p.footingSideIn,
    padThicknessIn: input.posts!.padThicknessIn ?? DEFAULT_PAD_IN,
    floorsCrossed: 0,
  }));
}

/**
 * The temporary walls for the member's loads: one each side of the wall (a wall removed) or one under an
 * opening's header, studs 2x4 Spruce-Pine-Fir No.1/No.2 the wall's height, on floor framing. Null when the
 * member carries no line load (nothing to shore).
 */
export function shoringFor(input: MemberCheckInput, wallHeightFt: number, work: BudgetChoices['work']) {
  const {
    materialId: _m,
    sizeId: _s,
    plies: _p,
    gradeUnknown: _g,
    measuredPly: _mp,
    posts: _posts,
    ...member
  } = input;
  try {
    const plan = planShoring({
      member,
      layout: work === 'opening' ? 'one-side' : 'both-sides',
      studs: {
        studSpacingIn: 16,
        heightFt: wallHeightFt,
        materialId: 'sawn-spruce-pine-fir-no1-no2',
        studSizeId: '2x4',
      },
      standsOn: 'floor-framing-perpendicular',
    });
    return temporaryWalls(plan, input.clearSpanFt);
  } catch (error) {
    if (error instanceof CalcInputError) return null;
    throw error;
  }
}

/**
 * What the budget needs of a member at one size (the stored check gives the hangers and posts). The
 * temporary walls do not depend on the size: pass them in when pricing many sizes.
 */
export function memberFacts(
  member: Member,
  job: Job,
  choices: BudgetChoices,
  size: MemberSizeFacts,
  lengthToBuyFt: number,
  result: MemberCheckResult = member.result,
  shoring: BudgetFacts['shoring'] = shoringFor(member.input, choices.wallHeightFt, choices.work),
): BudgetFacts {
  const input = member.input;
  return {
    memberLabel: member.label,
    kind: member.kind,
    mount: result.mount.kind,
    clearSpanFt: input.clearSpanFt,
    lengthToBuyFt,
    size,
    joistsHung: result.mount.hangers ?? 0,
    endsOnJacks: (input.supportKind ?? 'jacks') === 'jacks' ? 2 : 0,
    posts: postFacts(input, result),
    shoring,
    yearBuilt: job.yearBuilt,
  };
}

/** The member's shortlist in its own material: passing sizes, shallowest first, with their fit. */
export function memberShortlist(
  input: MemberCheckInput,
  limit = COMPARED_SIZES,
  narrow: { plies?: number[]; maxDepthIn?: number } = {},
) {
  const {
    materialId,
    sizeId: _s,
    plies: _p,
    gradeUnknown: _g,
    measuredPly: _mp,
    posts: _posts,
    ...loading
  } = input;
  return buildShortlist({ ...loading, materialIds: [materialId], ...narrow, sortBy: 'shallowest', limit });
}

/**
 * The post-and-footing alternate: a post at mid-span on a new footing, the member continuous over it in two
 * spans, at the shallowest size of its material that passes; null when none does.
 */
export function postAndFootingAlternate(
  member: Member,
  job: Job,
  choices: BudgetChoices,
  shoring: BudgetFacts['shoring'],
): BudgetFacts | null {
  const half = (member.input.clearSpanFt - CENTRE_POST_FT) / 2;
  if (member.input.secondClearSpanFt !== undefined || half < 1) return null;
  const input: MemberCheckInput = {
    ...member.input,
    clearSpanFt: half,
    secondClearSpanFt: half,
    centreBearingIn: 3.5,
  };
  let shortlist;
  try {
    // The member's own ply count and no deeper: the alternate keeps the wall's width and the headroom.
    shortlist = memberShortlist(input, 1, {
      plies: [member.result.member.plies],
      maxDepthIn: member.result.member.dIn,
    });
  } catch (error) {
    if (error instanceof CalcInputError) return null;
    throw error;
  }
  const best = shortlist.passing[0];
  if (!best) return null;
  const result = checkMember({ ...input, sizeId: best.sizeId, plies: undefined });
  const centre = result.reactions.bySupport?.find((s) => s.support === 'centre');
  if (!centre) return null;
  const pad = sizeFootingPad({ loadLb: centre.largestLb, padThicknessIn: DEFAULT_PAD_IN });
  const size = getSize(member.materialId, best.sizeId);
  const facts = memberFacts(
    member,
    job,
    choices,
    sizeFacts(member.materialId, size, shortlist.spans.lengthToBuyFt),
    result.spans.lengthToBuyFt,
    result,
    shoring,
  );
  facts.posts = [
    ...facts.posts,
    {
      label: 'Centre post',
      heightFt: choices.wallHeightFt,
      nominal: '4x4',
      pieces: 1,
      footingSideIn: pad.sideIn,
      padThicknessIn: DEFAULT_PAD_IN,
      floorsCrossed: 0,
    },
  ];
  return facts;
}

/** The engine's family for each designed material the price book prices by size; the rest are priced otherwise. */
const CATALOGUE_FAMILY: Partial<Record<DesignedMaterial, MaterialFamily>> = {
  sawn: 'sawn',
  lvl: 'lvl',
  glulam: 'glulam',
};
/** Sizes within this are the same size, in (dressed sizes are given to 1/16 in). */
const SAME_IN = 1 / 32;

/**
 * The catalogue size the engineer's member is: same family, plies and section within 1/32 in, in the
 * member's own material when it is of that family (its species and grade), else in the family's first.
 */
export function catalogueSizeOf(
  design: MemberDesign,
  ownMaterialId: string,
): { materialId: string; size: MemberSize } | null {
  const family = CATALOGUE_FAMILY[design.material];
  if (!family || design.depthIn === null) return null;
  const own = listMaterials(family).find((m) => m.id === ownMaterialId);
  const materials = own ? [own] : listMaterials(family).slice(0, 1);
  for (const material of materials) {
    const size = listSizes(material.id).find(
      (s) =>
        Math.abs(s.dIn - design.depthIn!) <= SAME_IN &&
        (design.plies === null || s.plies === design.plies) &&
        (design.widthIn === null || Math.abs(s.bIn - design.widthIn) <= SAME_IN),
    );
    if (size) return { materialId: material.id, size };
  }
  return null;
}

/** What the engineer's member is made of, in words ("LVL 2.0E", "Steel W shape"). */
export const designedFamilyLabel = (design: MemberDesign) => DESIGNED_MATERIAL_LABELS[design.material];

/**
 * The budget facts of the engineer's member in place of the preliminary size: priced from the price book by
 * its catalogue size when it has one; a steel W shape or a flitch beam as the steel or flitch line; any other
 * (a PSL, an unusual size) as a line to price by hand. The length to buy takes the engineer's bearing lengths
 * when both are given; hangers, posts and shoring stay the member's own.
 */
export function designedFacts(
  member: Member,
  job: Job,
  choices: BudgetChoices,
  design: MemberDesign,
  shoring: BudgetFacts['shoring'],
): { facts: BudgetFacts; material: MemberMaterial } {
  const lengthToBuyFt =
    design.bearingLeftIn !== null && design.bearingRightIn !== null
      ? member.input.clearSpanFt + (design.bearingLeftIn + design.bearingRightIn) / 12
      : member.result.spans.lengthToBuyFt;
  const label = `${designedFamilyLabel(design)}${design.grade ? ` ${design.grade}` : ''} (engineer's design)`;
  const found = catalogueSizeOf(design, member.materialId);
  if (found) {
    const size = { ...sizeFacts(found.materialId, found.size, lengthToBuyFt), materialLabel: label };
    return {
      facts: memberFacts(member, job, choices, size, lengthToBuyFt, member.result, shoring),
      material: 'wood',
    };
  }
  const preliminary = sizeFacts(member.materialId, getSize(member.materialId, member.sizeId), lengthToBuyFt);
  const size: MemberSizeFacts = {
    ...preliminary,
    family: 'by-hand',
    materialLabel: "(engineer's design)",
    sizeId: 'engineer',
    sizeLabel: design.designation,
    plies: design.plies ?? 1,
    bIn: design.widthIn ?? preliminary.bIn,
    dIn: design.depthIn ?? preliminary.dIn,
  };
  const material: MemberMaterial =
    design.material === 'steel-w' ? 'steel' : design.material === 'flitch' ? 'flitch' : 'wood';
  return { facts: memberFacts(member, job, choices, size, lengthToBuyFt, member.result, shoring), material };
}
