import type { BudgetChoices, BudgetFacts } from './facts';
import { finishPatch, type PatchAreas } from './finish-patch';
import { drywallTrips, type Trade, type Trip } from './labour';
import { lineAmount } from './money';
import { plyJoints } from './plies';
import type { PriceReader } from './price-lookup';
import { SAWN_LENGTHS_FT } from './price-catalogue';
import { stockLength, type StockLength } from './stock-length';
import type { BudgetLine, ClientView, LineGroup } from './types';

/** The price key of a member the price book cannot hold: always missing, so the line asks for an override. */
export const BY_HAND_KEY = 'member/by-hand';

/** Floor protection runs this far out on each side of the work, ft (common practice). */
export const FLOOR_PROTECTION_EACH_SIDE_FT = 4;

export interface LineOptions {
  taxable?: boolean;
  lumber?: boolean;
  client?: ClientView;
}

/** Makes priced lines from one price reader; a line of no quantity is left out. */
export function lineMaker(prices: PriceReader) {
  const lines: BudgetLine[] = [];
  const add = (
    id: string,
    group: LineGroup,
    label: string,
    quantity: number,
    unit: string,
    priceKey: string,
    basis: string,
    options: LineOptions = {},
  ) => {
    if (!(quantity > 0)) return;
    const unitCents = prices.cents(priceKey);
    lines.push({
      id,
      group,
      label,
      quantity,
      unit,
      unitCents: unitCents ?? 0,
      amountCents: unitCents === null ? 0 : lineAmount(unitCents, quantity),
      basis,
      priceKey,
      missingPrice: unitCents === null,
      taxable: options.taxable ?? false,
      lumber: options.lumber ?? false,
      client: options.client ?? 'scope',
      override: null,
    });
  };
  return { lines, add };
}

const ft = (value: number) => `${Math.round(value * 100) / 100} ft`;
const round2 = (value: number) => Math.round(value * 100) / 100;

/** The shortest even sawn stock length that is at least `neededFt`, or null past 20 ft. */
export function sawnStockFt(neededFt: number): number | null {
  return SAWN_LENGTHS_FT.find((length) => length + 1e-9 >= neededFt) ?? null;
}

export interface WorkTakeoff {
  supply: StockLength;
  patch: PatchAreas;
  /** Hours by trade, before day minimums (framing) and the finish trips. */
  framingBeforeLoad: number;
  framingAfterLoad: number;
  finishTrips: Trip[];
}

/**
 * Every priced line of the work but the markups, and the takeoff the schedule reads.
 * @param facts the member and job (ft, in, lb)
 * @param choices the estimator's choices
 * @param prices the firm's price book
 * Reference: common practice (how a remodeler prices an engineered beam and its work; DESIGN.md §7
 *   "Budget lines").
 */
export function workLines(facts: BudgetFacts, choices: BudgetChoices, prices: PriceReader) {
  const { lines, add } = lineMaker(prices);
  const size = facts.size;
  const yard = {
    stockedLengthFt: prices.quantity('yard/stocked-length'),
    stockedDepthIn: prices.quantity('yard/stocked-depth'),
    longestLengthFt: prices.quantity('yard/longest-length'),
    leadTimeDays: prices.quantity('yard/lead-time'),
  };
  const supply = stockLength(facts.lengthToBuyFt, size.dIn, yard);
  const buyFt = supply.buyFt;
  const needed = `${ft(facts.lengthToBuyFt)} to buy`;

  // The member.
  if (choices.material === 'wood') {
    if (size.family === 'lvl') {
      add(
        'member',
        'member',
        `${size.sizeLabel} ${size.materialLabel}`,
        size.plies * buyFt,
        'ply-lf',
        `lvl/${size.dIn}`,
        `${size.plies} plies × ${buyFt} ft (${needed}, even lengths)`,
        { taxable: true, lumber: true },
      );
    } else if (size.family === 'glulam') {
      add(
        'member',
        'member',
        `${size.sizeLabel} ${size.materialLabel}`,
        buyFt,
        'lf',
        `glulam/${size.sizeId}`,
        `${buyFt} ft (${needed}, even lengths)`,
        { taxable: true, lumber: true },
      );
    } else if (size.family === 'by-hand') {
      add(
        'member',
        'member',
        `${size.sizeLabel} ${size.materialLabel}`,
        1,
        'each',
        BY_HAND_KEY,
        `${buyFt} ft (${needed}): not in the price book, override this line with the yard's quote`,
        { taxable: true, lumber: true },
      );
    } else {
      const stockFt = sawnStockFt(facts.lengthToBuyFt);
      add(
        'member',
        'member',
        `${size.sizeLabel} ${size.materialLabel}`,
        size.plies,
        'each',
        `sawn/${size.nominal}/${stockFt ?? 'over-20'}`,
        stockFt === null
          ? `sawn stock ends at 20 ft (${needed}): price it by hand`
          : `${size.plies} pieces of ${stockFt} ft (${needed})`,
        { taxable: true, lumber: true },
      );
    }
    if ((size.family === 'lvl' || size.family === 'glulam') && supply.supply === 'stock')
      add(
        'yard-cut',
        'member',
        'Cut to length at the yard',
        size.family === 'lvl' ? size.plies : 1,
        'each',
        'yard/cut',
        'one cut per piece from stock lengths',
      );
    if (supply.supply === 'special-order') {
      const memberLine = lines.find((l) => l.id === 'member');
      const premium = prices.rate('yard/special-order');
      if (memberLine && premium > 0) {
        lines.push({
          ...memberLine,
          id: 'special-order',
          label: 'Special-order premium',
          quantity: premium / 100,
          unit: '%',
          unitCents: null,
          amountCents: Math.round((memberLine.amountCents * premium) / 10_000),
          basis: supply.note ?? 'special order',
          priceKey: 'yard/special-order',
        });
      }
    }
    add(
      'ply-fastening',
      'hardware',
      'Ply-to-ply fastening',
      plyJoints(size.plies) * buyFt,
      'lf',
      'fastener/ply',
      `${plyJoints(size.plies)} ply joints × ${buyFt} ft`,
      { taxable: true },
    );
  } else {
    const key = choices.material === 'steel' ? 'alternate/steel' : 'alternate/flitch';
    add(
      'member',
      'member',
      size.family === 'by-hand'
        ? `${size.sizeLabel} ${choices.material === 'steel' ? 'steel beam' : 'flitch beam'} (engineer's design; priced per lf from the allowance)`
        : choices.material === 'steel'
          ? 'Steel beam (allowance; the engineer sizes it)'
          : 'Flitch beam (allowance; the engineer sizes it)',
      buyFt,
      'lf',
      key,
      `${buyFt} ft (${needed})`,
      { taxable: true, client: 'allowance' },
    );
  }

  // Posts and footings.
  let pads = 0;
  for (const [i, post] of facts.posts.entries()) {
    const stockFt = sawnStockFt(post.heightFt);
    add(
      `post/${i + 1}`,
      'posts-and-footing',
      `${post.label}: ${post.pieces > 1 ? `${post.pieces}-ply ` : ''}${post.nominal} post`,
      post.pieces,
      'each',
      `sawn/${post.nominal}/${stockFt ?? 'over-20'}`,
      `${post.pieces} × ${stockFt ?? 'over 20'} ft for ${ft(post.heightFt)}`,
      { taxable: true, lumber: true },
    );
    add(
      `post/${i + 1}/cap`,
      'posts-and-footing',
      `${post.label}: post cap`,
      1,
      'each',
      'post/cap',
      'one per post',
      { taxable: true },
    );
    add(
      `post/${i + 1}/base`,
      'posts-and-footing',
      `${post.label}: post base`,
      1,
      'each',
      'post/base',
      'one per post',
      { taxable: true },
    );
    add(
      `post/${i + 1}/squash`,
      'posts-and-footing',
      `${post.label}: squash blocks`,
      post.floorsCrossed,
      'each',
      'post/squash-block',
      `${post.floorsCrossed} floors crossed`,
      { taxable: true },
    );
    const padCf = (post.footingSideIn ** 2 * post.padThicknessIn) / 1728;
    const padText = `${post.footingSideIn} × ${post.footingSideIn} × ${post.padThicknessIn} in pad`;
    if (choices.footingThroughSlab)
      add(
        `footing/${i + 1}/saw-cut`,
        'posts-and-footing',
        `${post.label}: saw-cut the slab`,
        1,
        'each',
        'footing/saw-cut',
        'one per pad',
      );
    add(
      `footing/${i + 1}/dig`,
      'posts-and-footing',
      `${post.label}: dig the pad`,
      round2(padCf),
      'cf',
      'footing/dig',
      padText,
    );
    add(
      `footing/${i + 1}/concrete`,
      'posts-and-footing',
      `${post.label}: concrete`,
      round2(padCf),
      'cf',
      'footing/concrete',
      padText,
      { taxable: true },
    );
    add(
      `footing/${i + 1}/rebar`,
      'posts-and-footing',
      `${post.label}: rebar`,
      1,
      'each',
      'footing/rebar',
      'one per pad',
      { taxable: true },
    );
    if (choices.footingThroughSlab)
      add(
        `footing/${i + 1}/slab-patch`,
        'posts-and-footing',
        `${post.label}: patch the slab`,
        round2(post.footingSideIn ** 2 / 144),
        'sf',
        'footing/slab-patch',
        padText,
      );
    pads++;
  }
  if (pads > 0)
    add(
      'footing/inspection',
      'fees',
      'Footing inspection',
      1,
      'each',
      'footing/inspection',
      'before the pour',
    );

  // Hangers.
  if (facts.joistsHung > 0) {
    const strap = facts.mount === 'raised';
    add(
      'hangers',
      'hardware',
      strap ? 'Straps or hangers for the ceiling joists' : 'Joist hangers',
      facts.joistsHung,
      'each',
      strap ? 'hanger/strap' : 'hanger/joist',
      `${facts.joistsHung} joists framing in (the check's count)`,
      { taxable: true },
    );
  }

  // Shoring.
  const walls = facts.shoring ?? [];
  const wallLf = walls.reduce((sum, w) => sum + w.lengthFt, 0);
  const rented = choices.shoring === 'rented' || walls.some((w) => w.spacingIn === null);
  if (walls.length > 0 && !rented) {
    const studs = walls.reduce((sum, w) => sum + w.studs, 0);
    const plate = walls.reduce((sum, w) => sum + w.plateLf, 0);
    const layout = walls
      .map((w) => `wall ${w.side}: ${w.studs} studs at ${w.spacingIn} in on centre over ${ft(w.lengthFt)}`)
      .join('; ');
    add('shoring/studs', 'shoring', 'Temporary wall studs', studs, 'each', 'shoring/stud', layout, {
      taxable: true,
      lumber: true,
    });
    add(
      'shoring/plates',
      'shoring',
      'Temporary wall plates (top and bottom)',
      plate,
      'lf',
      'shoring/plate',
      `${walls.length} walls × 2 plates × ${ft(walls[0].lengthFt)}`,
      { taxable: true, lumber: true },
    );
  }

  // Labour (hours; framing crew).
  const hours = (key: string) => prices.quantity(key);
  const tasks: {
    id: string;
    label: string;
    qty: number;
    unit: string;
    key: string;
    trade: Trade;
    afterLoad: boolean;
  }[] = [
    {
      id: 'labour/shoring',
      label: 'Build and strike the temporary walls',
      qty: walls.length > 0 && !rented ? wallLf : 0,
      unit: 'lf',
      key: 'hours/shoring',
      trade: 'carpenter',
      afterLoad: false,
    },
    {
      id: 'labour/demolition',
      label: choices.work === 'opening' ? 'Open the wall' : 'Take out the old wall',
      qty: facts.clearSpanFt,
      unit: 'lf',
      key: 'hours/demolition',
      trade: 'labourer',
      afterLoad: false,
    },
    {
      id: 'labour/set-member',
      label: 'Set the member',
      qty: buyFt,
      unit: 'lf',
      key: 'hours/set-member',
      trade: 'carpenter',
      afterLoad: false,
    },
    {
      id: 'labour/posts',
      label: 'Set the posts',
      qty: facts.posts.length,
      unit: 'each',
      key: 'hours/post',
      trade: 'carpenter',
      afterLoad: false,
    },
    {
      id: 'labour/footings',
      label: 'Dig, form and pour the pads',
      qty: pads,
      unit: 'each',
      key: 'hours/footing',
      trade: 'labourer',
      afterLoad: false,
    },
    {
      id: 'labour/jacks-and-kings',
      label: 'Frame the ends (jack and king studs)',
      qty: facts.endsOnJacks,
      unit: 'each',
      key: 'hours/jacks-and-kings',
      trade: 'carpenter',
      afterLoad: false,
    },
    {
      id: 'labour/hang-joists',
      label: 'Hang the joists',
      qty: facts.joistsHung,
      unit: 'each',
      key: 'hours/joist-hung',
      trade: 'carpenter',
      afterLoad: true,
    },
  ];
  const patch = finishPatch({
    work: choices.work,
    mount: facts.mount,
    clearSpanFt: facts.clearSpanFt,
    wallHeightFt: choices.wallHeightFt,
    bIn: size.bIn,
    dIn: size.dIn,
    openingHeightFt: choices.openingHeightFt,
    ceilingStripFt: choices.ceilingStripFt,
  });
  tasks.push(
    {
      id: 'labour/floor-patch',
      label: 'Patch the flooring',
      qty: patch.floorLf,
      unit: 'lf',
      key: 'hours/floor-patch',
      trade: 'carpenter',
      afterLoad: true,
    },
    {
      id: 'labour/trim',
      label: 'Trim',
      qty: patch.trimLf,
      unit: 'lf',
      key: 'hours/trim',
      trade: 'carpenter',
      afterLoad: true,
    },
  );
  let framingBeforeLoad = 0;
  let framingAfterLoad = 0;
  for (const task of tasks) {
    const taskHours = round2(task.qty * hours(task.key));
    if (task.afterLoad) framingAfterLoad += taskHours;
    else framingBeforeLoad += taskHours;
    add(
      task.id,
      'labour',
      task.label,
      taskHours,
      'h',
      `rate/${task.trade}`,
      `${round2(task.qty)} ${task.unit} × ${hours(task.key)} h (${task.trade})`,
    );
  }

  // Heavy pieces: more hands than two when a ply outweighs what two people carry.
  const carryLimitLb = prices.quantity('delivery/carry-limit');
  const heavy = carryLimitLb > 0 && size.pieceWeightLb > carryLimitLb;
  if (heavy) {
    const people = Math.ceil(size.pieceWeightLb / (carryLimitLb / 2));
    const setHours = round2(buyFt * hours('hours/set-member'));
    add(
      'delivery/heavy-crew',
      'delivery',
      'Extra crew to carry and set heavy pieces',
      round2((people - 2) * setHours),
      'h',
      'delivery/heavy-crew',
      `${people} people for a ${Math.round(size.pieceWeightLb)} lb piece (two carry ${carryLimitLb} lb), ${setHours} h`,
    );
  }
  const delivery = choices.delivery === 'auto' ? (heavy ? 'boom' : 'standard') : choices.delivery;
  add(
    'delivery',
    'delivery',
    delivery === 'standard' ? 'Delivery' : delivery === 'boom' ? 'Boom truck delivery' : 'Crane delivery',
    1,
    'each',
    `delivery/${delivery}`,
    choices.delivery === 'auto' ? (heavy ? 'heavy piece: boom truck' : 'standard delivery') : 'chosen',
  );

  // Finish trips: drywall hang and coats, then paint, each a trip with the day minimum.
  const dayMinimum = prices.quantity('rate/day-minimum');
  const drywallSf = round2(patch.wallSf + patch.ceilingSf + patch.wrapSf);
  const finishTrips = drywallTrips(
    drywallSf,
    hours('hours/drywall-hang'),
    hours('hours/drywall-coat'),
    prices.quantity('hours/drywall-coats'),
  );
  if (drywallSf > 0)
    finishTrips.push({
      trade: 'painter',
      label: 'Texture and paint',
      hours: drywallSf * hours('hours/paint'),
    });
  for (const [i, trip] of finishTrips.entries()) {
    const charged = round2(Math.max(trip.hours, dayMinimum));
    add(
      `labour/finish-${i + 1}`,
      'labour',
      trip.label,
      charged,
      'h',
      `rate/${trip.trade}`,
      `${round2(trip.hours)} h of work${charged > round2(trip.hours) ? `, charged the ${dayMinimum} h trip minimum` : ''}`,
    );
  }

  // Demolition, allowances, protection, lead-safe work.
  add('demolition/disposal', 'demolition', 'Debris disposal', 1, 'each', 'demolition/disposal', 'one load');
  for (const kind of choices.allowances)
    add(
      `allowance/${kind}`,
      'allowances',
      prices.label(`allowance/${kind}`),
      1,
      'lump',
      `allowance/${kind}`,
      'allowance',
      { client: 'allowance' },
    );
  add(
    'protection/dust',
    'protection',
    'Dust walls and cleanup',
    1,
    'lump',
    'protection/dust',
    'one per job area',
  );
  const floorSf = round2((facts.clearSpanFt + 2) * 2 * FLOOR_PROTECTION_EACH_SIDE_FT);
  add(
    'protection/floor',
    'protection',
    'Floor protection',
    floorSf,
    'sf',
    'protection/floor',
    `(${ft(facts.clearSpanFt)} + 2 ft) × ${FLOOR_PROTECTION_EACH_SIDE_FT} ft each side`,
  );
  if (facts.yearBuilt !== null && facts.yearBuilt < 1978)
    add(
      'lead-safe',
      'protection',
      'Lead-safe work practices',
      1,
      'lump',
      'lead-safe/work',
      `house built in ${facts.yearBuilt}, before 1978`,
    );

  // Finishes (materials).
  add(
    'finish/drywall',
    'finishes',
    'Drywall and compound',
    drywallSf,
    'sf',
    'finish/drywall',
    `wall ${round2(patch.wallSf)} + ceiling ${round2(patch.ceilingSf)} + beam wrap ${round2(patch.wrapSf)} sq ft`,
    { taxable: true },
  );
  add(
    'finish/texture',
    'finishes',
    'Texture',
    round2(patch.ceilingSf + patch.wrapSf),
    'sf',
    'finish/texture',
    'ceiling and beam wrap',
    { taxable: true },
  );
  add('finish/paint', 'finishes', 'Paint', drywallSf, 'sf', 'finish/paint', 'every patched sq ft', {
    taxable: true,
  });
  add(
    'finish/floor-patch',
    'finishes',
    'Flooring patch along the old wall line',
    patch.floorLf,
    'lf',
    'finish/floor-patch',
    'the clear span',
    { taxable: true },
  );
  add('finish/trim', 'finishes', 'Trim', patch.trimLf, 'lf', 'finish/trim', 'casing on both faces', {
    taxable: true,
  });

  // Fees.
  add('permit', 'fees', 'Building permit', 1, 'each', 'permit/building', 'one per job area');
  add('engineer/fee', 'fees', "Engineer's design", 1, 'each', 'engineer/fee', 'one per member');
  if (choices.engineerSiteVisit)
    add('engineer/site-visit', 'fees', "Engineer's site visit", 1, 'each', 'engineer/site-visit', 'chosen');

  // Old-house surprises.
  for (const kind of choices.oldHouse)
    add(
      `old-house/${kind}`,
      'old-house',
      prices.label(`old-house/${kind}`),
      1,
      'lump',
      `old-house/${kind}`,
      'allowance',
      { client: 'allowance' },
    );

  // Rented shores run for the days the house stays shored: added by the caller once the schedule is known.
  const takeoff: WorkTakeoff = { supply, patch, framingBeforeLoad, framingAfterLoad, finishTrips };
  return {
    lines,
    add,
    takeoff,
    rentedShores: walls.length > 0 && rented ? walls.length * prices.quantity('shoring/shores-per-wall') : 0,
  };
}
