import type { LoadPathElementResult, LoadPathNode } from '@/shared/schemas/calc/load-path';
import { requiredEnds } from './order-elements';

/** What closing a chain needs to know of one checked element. */
interface Checked {
  label: string;
  checkState: LoadPathElementResult['checkState'];
  ownOpenReasons: string[];
}

/** How a failed step reads from above it. */
function why(below: Checked & { closed: boolean }): string {
  if (below.checkState === 'fails') return 'fails under the load';
  if (below.checkState === 'engineer-required') return 'engineer required';
  return 'its own load path is open';
}

/**
 * From the ground up: an element's chain is closed when it passes its own check and every end bears on an
 * element whose chain is closed, crossing floor framing on blocking where it crosses any; a footing or
 * foundation wall closes only once the user has confirmed it (a slab never does). Each open chain says why,
 * in words, naming the step.
 * @param nodes the elements with their bearings
 * @param order the ids from the top down (orderElements)
 * @param checked each element's own check state, label and own reasons (a footing not yet confirmed)
 * @returns by id, whether the chain is closed and why not
 * @example closeChains(nodes, order, checked).get('beam')?.closed
 * Reference: DESIGN.md §6 "Load path"; common practice (squash blocks or solid blocking under a point load
 *   through floor framing).
 */
export function closeChains(
  nodes: readonly LoadPathNode[],
  order: readonly string[],
  checked: ReadonlyMap<string, Checked>,
): Map<string, { closed: boolean; openReasons: string[] }> {
  const byId = new Map(nodes.map((n) => [n.id, n]));
  const out = new Map<string, { closed: boolean; openReasons: string[] }>();
  for (const id of [...order].reverse()) {
    const node = byId.get(id) as LoadPathNode;
    const own = checked.get(id) as Checked;
    const reasons = [...own.ownOpenReasons];
    const ends = requiredEnds(node);
    if (ends.length === 0 && own.ownOpenReasons.length === 0 && own.checkState === 'passes') {
      out.set(id, { closed: true, openReasons: [] });
      continue;
    }
    for (const end of ends) {
      const bearing = node.bearings.find((b) => b.end === end);
      const where = end === 'bottom' ? 'Bottom' : `${end[0].toUpperCase()}${end.slice(1)} end`;
      if (!bearing) {
        reasons.push(`${where}: say what it bears on.`);
        continue;
      }
      if (bearing.through === 'nothing') {
        reasons.push(
          `${where}: the load crosses floor framing with nothing under it — add squash blocks or solid blocking (common practice).`,
        );
      }
      const below = checked.get(bearing.ontoId) as Checked;
      const chain = out.get(bearing.ontoId) as { closed: boolean };
      if (!chain.closed)
        reasons.push(`${where} → ${below.label}: ${why({ ...below, closed: chain.closed })}.`);
    }
    out.set(id, { closed: own.checkState === 'passes' && reasons.length === 0, openReasons: reasons });
  }
  return out;
}
