import {
  budgetRange,
  buildMemberBudget,
  changeBaseline,
  cheapestPassing,
  designChange,
  nextSizeUp,
  type BudgetChoices,
  type BudgetFacts,
  type MemberBudget,
  type MemberShape,
  type PriceAmounts,
  type SentMemberBudget,
} from '@/lib/budget';
import { CAUTION_TEXT, checkMember, getMaterial, getSize } from '@/lib/calc';
import type { BudgetOverrides, MemberBudgetView } from '@/shared/schemas/budgets';
import type { Job } from '@/shared/schemas/jobs';
import type { Member } from '@/shared/schemas/members';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { DESIGNED_MATERIAL_LABELS } from '@/shared/schemas/requests/reply';
import {
  designedFacts,
  memberFacts,
  memberShortlist,
  shoringFor,
  postAndFootingAlternate,
  resolveChoices,
  sizeFacts,
} from './budget-facts';
import type { SavedBudget } from './budgets.repository';

export interface PriceBookState {
  amounts: PriceAmounts;
  /** Keys whose price is older than the firm's stale age. */
  stale: ReadonlySet<string>;
}

const NOTES = [
  'The temporary walls are planned with 2x4 studs the wall’s height on floor framing, from the member’s own loads; the shoring itself may need an engineer’s design.',
  'The budget never goes into the engineer’s design request.',
];

/** What the member was budgeted as, in the change order's words. */
function budgetedFamily(member: Member, material: BudgetChoices['material']): string {
  if (material === 'steel') return DESIGNED_MATERIAL_LABELS['steel-w'];
  if (material === 'flitch') return DESIGNED_MATERIAL_LABELS.flitch;
  return DESIGNED_MATERIAL_LABELS[getMaterial(member.materialId).family];
}

/**
 * A member's whole budget: the lines at the preliminary size, the range to the next size up, every shortlist
 * size priced side by side with the cheapest passing one marked, and the scenarios that change the cost most.
 * Once the engineer has designed the member (`design`), the lines and total are rebuilt from the engineer's
 * member, the range closes on it, and a change order rises when it differs from the budgeted size: the
 * member of the budget last sent to the client (`sent`) when there is one, else the preliminary range.
 */
export function memberBudgetView(
  member: Member,
  job: Job,
  saved: SavedBudget | undefined,
  book: PriceBookState,
  design?: MemberDesign,
  sent?: SentMemberBudget,
): MemberBudgetView {
  const given = saved?.choices ?? { allowances: [], oldHouse: [], engineerSiteVisit: false };
  const overrides: BudgetOverrides = saved?.overrides ?? {};
  const choices = resolveChoices(given, member, job);
  const lengthToBuyFt = member.result.spans.lengthToBuyFt;
  const size = getSize(member.materialId, member.sizeId);
  const shoring = shoringFor(member.input, choices.wallHeightFt, choices.work);
  const factsAt = (sizeId: string, result = member.result) =>
    memberFacts(
      member,
      job,
      choices,
      sizeFacts(member.materialId, getSize(member.materialId, sizeId), lengthToBuyFt),
      lengthToBuyFt,
      result,
      shoring,
    );
  const preliminaryFacts = factsAt(member.sizeId);
  const budget = buildMemberBudget(preliminaryFacts, choices, book.amounts, overrides);
  const price = (facts: BudgetFacts, changed: Partial<BudgetChoices> = {}): MemberBudget =>
    buildMemberBudget(facts, { ...choices, ...changed }, book.amounts, {});
  const plain = price(preliminaryFacts);

  const shortlist = memberShortlist(member.input);
  const compared = shortlist.passing.map((entry) => {
    const entrySize = getSize(member.materialId, entry.sizeId);
    const priced = price(factsAt(entry.sizeId));
    return { entry, entrySize, priced };
  });
  if (!compared.some((c) => c.entry.sizeId === member.sizeId)) {
    compared.unshift({
      entry: {
        ...shortlist.passing[0],
        sizeId: member.sizeId,
        sizeLabel: size.label,
        utilization: member.summary.governingRatio,
      },
      entrySize: size,
      priced: plain,
    });
  }
  const options = compared.map(({ entry, priced }) => ({
    id: entry.sizeId,
    label: entry.sizeLabel,
    passes: entry.sizeId === member.sizeId ? member.summary.pass : true,
    totalCents: entry.sizeId === member.sizeId ? budget.totalCents : priced.totalCents,
    complete: priced.missingPrices.length === 0,
  }));
  const cheapest = cheapestPassing(options);
  const comparison = compared.map(({ entry, priced }, i) => ({
    id: entry.sizeId,
    materialLabel: member.summary.materialLabel,
    sizeLabel: entry.sizeLabel,
    passes: options[i].passes,
    utilization: entry.utilization,
    totalCents: options[i].totalCents,
    complete: options[i].complete,
    preliminary: entry.sizeId === member.sizeId,
    cheapest: entry.sizeId === cheapest,
    supply: priced.supply.supply,
  }));

  const up = nextSizeUp(
    { id: size.id, dIn: size.dIn, bIn: size.bIn },
    compared
      .filter((c) => c.entry.sizeId !== member.sizeId)
      .map((c) => ({ id: c.entry.sizeId, dIn: c.entrySize.dIn, bIn: c.entrySize.bIn, priced: c.priced })),
  );
  // The next size up carries the estimator's overrides too: the range moves with them.
  const upBudget = up ? buildMemberBudget(factsAt(up.id), choices, book.amounts, overrides) : null;
  const range = budgetRange(
    { label: size.label, totalCents: budget.totalCents },
    up && upBudget
      ? { label: getSize(member.materialId, up.id).label, totalCents: upBudget.totalCents }
      : null,
  );

  const scenarios: MemberBudgetView['scenarios'] = [];
  const scenario = (id: string, label: string, variant: MemberBudget | null, note: string) => {
    if (variant)
      scenarios.push({
        id,
        label,
        totalCents: variant.totalCents,
        deltaCents: variant.totalCents - plain.totalCents,
        note,
      });
  };
  const otherMount = preliminaryFacts.mount === 'dropped' ? 'flush' : 'dropped';
  const remounted = checkMember({ ...member.input, mount: otherMount });
  scenario(
    `mount-${otherMount}`,
    otherMount === 'flush' ? 'Flush with the joists' : 'Dropped below the joists',
    price(factsAt(member.sizeId, remounted)),
    otherMount === 'flush'
      ? `${remounted.mount.hangers ?? 0} joists hung in hangers, both ceilings opened${remounted.mount.depthFits === false ? '; the member is deeper than the joists' : ''}`
      : 'no hangers; the beam is wrapped below the ceiling',
  );
  for (const material of ['steel', 'flitch'] as const) {
    if (choices.material !== material)
      scenario(
        `material-${material}`,
        material === 'steel' ? 'Steel beam alternate' : 'Flitch beam alternate',
        price(preliminaryFacts, { material }),
        'an allowance per lf: the engineer sizes it',
      );
  }
  const alternate = postAndFootingAlternate(member, job, choices, shoring);
  if (alternate) {
    const alternateSize = alternate.size.sizeLabel;
    scenario(
      'post-and-footing',
      'Post and footing at mid-span',
      price(alternate),
      `${alternateSize} over two spans, a centre post on a new pad${choices.footingThroughSlab ? ' dug through the slab' : ''}; the post is the engineer's to size`,
    );
    if (!choices.footingThroughSlab)
      scenario(
        'post-and-footing-slab',
        'Post and footing dug through the slab',
        price(alternate, { footingThroughSlab: true }),
        'saw-cut, dig, pour and patch the slab',
      );
  }
  const allSurprises = ['knob-and-tube', 'vent-stack', 'asbestos-test'] as const;
  if (allSurprises.some((k) => !choices.oldHouse.includes(k)))
    scenario(
      'old-house',
      'Old-house surprises',
      price(preliminaryFacts, { oldHouse: allSurprises }),
      'knob-and-tube wiring, a vent stack in the wall, an asbestos test',
    );

  let shown = budget;
  let shownRange = range;
  let changeOrder: MemberBudgetView['changeOrder'] = null;
  const preliminaryShape: MemberShape = {
    label: `${size.label} ${member.summary.materialLabel}`,
    family: budgetedFamily(member, choices.material),
    plies: size.plies,
    bIn: size.bIn,
    dIn: size.dIn,
  };
  let pricedShape = preliminaryShape;
  if (design) {
    const designed = designedFacts(member, job, choices, design, shoring);
    shown = buildMemberBudget(
      designed.facts,
      { ...choices, material: designed.material },
      book.amounts,
      overrides,
    );
    shownRange = budgetRange({ label: design.designation, totalCents: shown.totalCents }, null);
    shownRange.basis = `The engineer's member (request ${design.requestNumber}, version ${design.version}): the range closes on it`;
    pricedShape = {
      label: design.designation,
      family: DESIGNED_MATERIAL_LABELS[design.material],
      plies: design.material === 'steel-w' ? 1 : design.plies,
      bIn: design.widthIn,
      dIn: design.depthIn,
    };
    changeOrder = designChange(
      changeBaseline(
        { ...preliminaryShape, lowCents: range.lowCents, highCents: range.highCents },
        sent ?? null,
      ),
      { ...pricedShape, totalCents: shown.totalCents },
    );
  }

  const lines = shown.lines.map((line) => ({
    ...line,
    stalePrice: line.priceKey !== null && book.stale.has(line.priceKey),
  }));
  return {
    memberId: member.id,
    jobId: member.jobId,
    memberLabel: member.label,
    sizeLabel: size.label,
    caution: CAUTION_TEXT,
    choices: given,
    overrides,
    lines,
    subtotalCents: shown.subtotalCents,
    totalCents: shown.totalCents,
    range: shownRange,
    pricedShape,
    design: design
      ? {
          requestId: design.requestId,
          requestNumber: design.requestNumber,
          version: design.version,
          label: `${design.designation} (${DESIGNED_MATERIAL_LABELS[design.material]})`,
        }
      : null,
    preliminaryRange: design ? range : null,
    changeOrder,
    schedule: shown.schedule,
    supply: shown.supply,
    comparison,
    scenarios,
    missingPrices: shown.missingPrices,
    stalePrices: [...new Set(lines.filter((l) => l.stalePrice).map((l) => l.priceKey!))],
    unusedOverrides: shown.unusedOverrides,
    notes: [...NOTES, ...(shown.supply.note ? [shown.supply.note] : [])],
    updatedAt: saved?.updatedAt ?? null,
  };
}
