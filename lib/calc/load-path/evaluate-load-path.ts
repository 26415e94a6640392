import { CAUTION_TEXT } from '@/lib/calc/prescriptive/caution';
import { LOAD_TYPES } from '@/lib/calc/types';
import {
  groundElementKinds,
  type LoadPathElementResult,
  type LoadPathInput,
  type LoadPathNode,
  type LoadPathResult,
  type TypedLoad,
} from '@/shared/schemas/calc/load-path';
import { checkBeamElement, type LandingLoad } from './check-beam-element';
import { checkGroundElement } from './check-ground-element';
import { checkVerticalElement } from './check-vertical-element';
import { closeChains } from './close-chains';
import { orderElements, requiredEnds } from './order-elements';
import { addLoads, governingLoad, zeroLoad } from './typed-load';

/** How loads cross from one element to the next, said in every result. */
export const LOAD_TRANSFER_TEXT =
  'Each reaction goes down unfactored, by load type (dead, live, roof live, snow); every element forms its own ASD load combinations from what lands on it, and the governing one is named at each step.';

const isGroundKind = (kind: string) => (groundElementKinds as readonly string[]).includes(kind);

type Landing = LandingLoad & { index: number };

/** Everything one element is and passes on, before the chains below are known. */
function checkElement(
  node: LoadPathNode,
  landing: readonly Landing[],
  edition: LoadPathInput['edition'],
): Omit<LoadPathElementResult, 'level' | 'state' | 'closed' | 'ends' | 'openReasons'> & {
  endLoads: Partial<Record<string, Record<string, number>>>;
  ownOpenReasons: string[];
} {
  const total = addLoads(...landing.map((l) => l.load));
  const base = {
    id: node.id,
    label: node.label,
    kind: node.element.kind,
    incoming: landing.map(({ fromId, fromLabel, fromEnd, atFt, load }) => ({
      fromId,
      fromLabel,
      fromEnd,
      atFt,
      load,
    })),
    ownOpenReasons: [] as string[],
  };
  const element = node.element;
  if (element.kind === 'member' || element.kind === 'girder' || element.kind === 'joist') {
    const beam = checkBeamElement(
      { ...element.input, label: element.input.label ?? node.label },
      landing,
      (i) => {
        const from = landing[i];
        return from ? `${from.fromId}.bearings.${from.fromEnd}` : `${node.id}.sources`;
      },
    );
    return {
      ...base,
      checkState: beam.result.pass ? 'passes' : 'fails',
      checks: [],
      memberResult: beam.result,
      endLoads: beam.endLoads,
      engineerReasons: [],
      assumptions: beam.assumptions,
      warnings: beam.warnings,
    };
  }
  if (element.kind === 'footing' || element.kind === 'foundation-wall' || element.kind === 'slab') {
    const ground = checkGroundElement(element, total, edition);
    const failed = ground.checks.some((c) => !c.pass);
    return {
      ...base,
      checkState: ground.engineerReasons.length > 0 ? 'engineer-required' : failed ? 'fails' : 'passes',
      checks: ground.checks,
      pad: ground.pad,
      endLoads: {},
      engineerReasons: ground.engineerReasons,
      assumptions: ground.assumptions,
      warnings: [],
      ownOpenReasons: ground.openReasons,
    };
  }
  const vertical = checkVerticalElement(element, total, edition);
  const failed = vertical.checks.some((c) => !c.pass);
  return {
    ...base,
    checkState: vertical.engineerReasons.length > 0 ? 'engineer-required' : failed ? 'fails' : 'passes',
    checks: vertical.checks,
    endLoads: { bottom: vertical.down },
    engineerReasons: vertical.engineerReasons,
    assumptions: vertical.assumptions,
    warnings: vertical.warnings,
  };
}

/**
 * Follows every end of every element down to the ground. From the top down, each element is checked under
 * its own loads plus what lands on it (a beam, girder or joist with the engine's member check, the loads
 * from above as point sources at their positions; posts, jack studs and columns as columns; footings against
 * the soil bearing), and what each end passes down lands on the element it bears on. Then, from the ground
 * up, each element's chain is closed only when every end bears on something whose own chain is closed, and
 * the chain ends on a footing or foundation wall the user confirmed. An element is "load path open" — never
 * "passes" — until then.
 *
 * Equilibrium: what reaches the ground (plus what sits on ends that bear on nothing yet) equals everything
 * applied, self-weights included; `applied` is each element's reactions less what lands on it.
 *
 * @param input the job's edition and its elements with their bearings (ft, in, lb, psf)
 * @returns each element's result from the top down, the loads applied and arriving at the ground by type (lb)
 * @throws CalcInputError on a cycle, an unknown element or end, or a load off the member it lands on
 * @example evaluateLoadPath({ edition: 'ASCE 7-22', nodes }).elements.map((e) => e.state)
 * Reference: AWC Design Aid No. 6; NDS 2018 §§3.3–3.7, 3.10, 15.3; ASCE 7-16/7-22 §2.4.1; IRC 2021 R401.4.1.
 */
export function evaluateLoadPath(input: LoadPathInput): LoadPathResult {
  const { order, level } = orderElements(input.nodes);
  const byId = new Map(input.nodes.map((n) => [n.id, n]));
  const landing = new Map<string, Landing[]>(input.nodes.map((n) => [n.id, []]));
  const checked = new Map<string, ReturnType<typeof checkElement>>();
  const applied = zeroLoad();
  const atGround = zeroLoad();
  const unresolved = zeroLoad();
  for (const id of order) {
    const node = byId.get(id) as LoadPathNode;
    const arriving = landing.get(id) ?? [];
    const result = checkElement(node, arriving, input.edition);
    checked.set(id, result);
    const inTotal = addLoads(...arriving.map((l) => l.load));
    if (isGroundKind(node.element.kind)) {
      for (const t of LOAD_TYPES) atGround[t] += inTotal[t];
      continue;
    }
    for (const end of requiredEnds(node)) {
      const load = result.endLoads[end] ?? zeroLoad();
      for (const t of LOAD_TYPES) applied[t] += load[t] ?? 0;
      const bearing = node.bearings.find((b) => b.end === end);
      if (!bearing) {
        for (const t of LOAD_TYPES) unresolved[t] += load[t] ?? 0;
        continue;
      }
      const below = landing.get(bearing.ontoId) as Landing[];
      below.push({
        index: below.length,
        fromId: id,
        fromLabel: node.label,
        fromEnd: end,
        atFt: bearing.atFt ?? 0,
        load,
      });
    }
    for (const t of LOAD_TYPES) applied[t] -= inTotal[t];
  }
  const closed = closeChains(input.nodes, order, checked);
  const elements: LoadPathElementResult[] = order.map((id) => {
    const node = byId.get(id) as LoadPathNode;
    const c = checked.get(id) as ReturnType<typeof checkElement>;
    const chain = closed.get(id) as { closed: boolean; openReasons: string[] };
    const { endLoads, ownOpenReasons: _own, ...rest } = c;
    return {
      ...rest,
      level: level.get(id) ?? 0,
      state: c.checkState !== 'passes' ? c.checkState : chain.closed ? 'passes' : 'load-path-open',
      closed: chain.closed,
      openReasons: chain.openReasons,
      ends: requiredEnds(node).map((end) => {
        const load: TypedLoad = endLoads[end] ?? zeroLoad();
        const governing = governingLoad(load, input.edition);
        const bearing = node.bearings.find((b) => b.end === end);
        return {
          end,
          ontoId: bearing?.ontoId ?? null,
          load,
          governingLb: governing.lb,
          governingCombination: governing.combination,
          closed: bearing ? (closed.get(bearing.ontoId)?.closed ?? false) : false,
        };
      }),
    };
  });
  return {
    caution: CAUTION_TEXT,
    transfer: LOAD_TRANSFER_TEXT,
    elements,
    applied,
    atGround,
    unresolved,
    sources: [
      'AWC Design Aid No. 6 beam formulas (point loads by superposition)',
      'NDS 2018 §3.7.1 columns, §15.3 built-up columns',
      'ASCE 7 §2.4.1 ASD combinations at each element',
      'IRC 2021 R401.4.1 presumptive soil bearing',
    ],
  };
}
