import { CalcInputError } from '@/lib/calc/types';
import {
  beamElementKinds,
  groundElementKinds,
  type LoadPathEnd,
  type LoadPathNode,
} from '@/shared/schemas/calc/load-path';

const isBeam = (node: LoadPathNode) => (beamElementKinds as readonly string[]).includes(node.element.kind);
const isGround = (node: LoadPathNode) =>
  (groundElementKinds as readonly string[]).includes(node.element.kind);

/**
 * The ends an element must say something about: a beam's supports (left and right, and centre when it runs on
 * over a centre post), the bottom of a wall, post, column or pier; none for the ground.
 * @example requiredEnds(beamOnTwoSpans) // ['left', 'centre', 'right']
 * Reference: DESIGN.md §6 "Load path" (each end of each member says what it bears on).
 */
export function requiredEnds(node: LoadPathNode): LoadPathEnd[] {
  if (isGround(node)) return [];
  if (!isBeam(node)) return ['bottom'];
  const input = 'input' in node.element ? node.element.input : null;
  return input?.secondClearSpanFt !== undefined ? ['left', 'centre', 'right'] : ['left', 'right'];
}

/** Refuses a bearing that names an end the element does not have, an unknown element or a second bearing. */
function checkBearings(node: LoadPathNode, byId: ReadonlyMap<string, LoadPathNode>): void {
  const ends = requiredEnds(node);
  const seen = new Set<LoadPathEnd>();
  for (const bearing of node.bearings) {
    const where = `${node.id}.bearings.${bearing.end}`;
    if (!ends.includes(bearing.end)) {
      throw new CalcInputError(
        where,
        `${node.label || node.id} has no ${bearing.end} end to bear on something`,
      );
    }
    if (seen.has(bearing.end))
      throw new CalcInputError(where, `The ${bearing.end} end already bears on something`);
    seen.add(bearing.end);
    const onto = byId.get(bearing.ontoId);
    if (!onto) throw new CalcInputError(`${where}.ontoId`, 'It bears on an element that is not in this job');
    if (onto.id === node.id) throw new CalcInputError(`${where}.ontoId`, 'An element cannot bear on itself');
    if (isBeam(onto) && bearing.atFt === undefined) {
      throw new CalcInputError(`${where}.atFt`, `Say where on ${onto.label || onto.id} it lands`);
    }
  }
}

/**
 * One loop among the elements the sort could not place: every one of them has something unplaced bearing on
 * it, so walking up from any of them repeats an element; the walk from that element back to it is the loop.
 */
function findCycle(nodes: readonly LoadPathNode[], placed: ReadonlySet<string>): string[] {
  const bearingOn = new Map<string, string>();
  for (const n of nodes) {
    if (placed.has(n.id)) continue;
    for (const b of n.bearings) if (!placed.has(b.ontoId)) bearingOn.set(b.ontoId, n.id);
  }
  const walk: string[] = [];
  let at = nodes.find((n) => !placed.has(n.id))?.id ?? '';
  while (!walk.includes(at)) {
    walk.push(at);
    at = bearingOn.get(at) ?? at;
  }
  const loop = walk.slice(walk.indexOf(at)).reverse();
  return [...loop, loop[0]];
}

/**
 * Orders the elements from the top down: every element comes after everything that bears on it, so the
 * loads arriving on it are known before it is checked. Also gives each element its level (0 at the top, one
 * more than the deepest element above it).
 * @param nodes the job's elements with their bearings
 * @returns the ids from the top down, and the level of each id
 * @throws CalcInputError on a cycle (A bears on B, which bears on A), naming the elements in it, or on a
 *   bearing that names an unknown element or end
 * @example orderElements(nodes).order // ['beam', 'post', 'girder', 'footing']
 * Reference: Kahn's topological sort; DESIGN.md §6 "Load path" (a cycle is refused with a message).
 */
export function orderElements(nodes: readonly LoadPathNode[]): {
  order: string[];
  level: Map<string, number>;
} {
  const byId = new Map(nodes.map((n) => [n.id, n]));
  if (byId.size !== nodes.length) throw new CalcInputError('nodes', 'Two elements share one id');
  const above = new Map<string, number>(nodes.map((n) => [n.id, 0]));
  for (const node of nodes) {
    checkBearings(node, byId);
    for (const b of node.bearings) above.set(b.ontoId, (above.get(b.ontoId) ?? 0) + 1);
  }
  const level = new Map<string, number>();
  const ready = nodes.filter((n) => above.get(n.id) === 0).map((n) => n.id);
  for (const id of ready) level.set(id, 0);
  const order: string[] = [];
  while (ready.length > 0) {
    const id = ready.shift() as string;
    order.push(id);
    for (const b of byId.get(id)?.bearings ?? []) {
      level.set(b.ontoId, Math.max(level.get(b.ontoId) ?? 0, (level.get(id) ?? 0) + 1));
      const left = (above.get(b.ontoId) ?? 0) - 1;
      above.set(b.ontoId, left);
      if (left === 0) ready.push(b.ontoId);
    }
  }
  if (order.length < nodes.length) {
    const names = findCycle(nodes, new Set(order)).map((id) => byId.get(id)?.label || id);
    throw new CalcInputError(
      'bearings',
      `These elements bear on each other in a loop, so no load reaches the ground: ${names.join(' → ')}. Change what one of them bears on.`,
    );
  }
  return { order, level };
}
