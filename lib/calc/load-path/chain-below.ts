import type { LoadPathElementResult, LoadPathResult } from '@/shared/schemas/calc/load-path';

/** One step of a chain: an element, its depth below the top of the chain, and what it bears on. */
export interface ChainStep {
  element: LoadPathElementResult;
  /** 0 for the element the chain starts from, one more than the deepest step bearing on it. */
  depth: number;
}

/**
 * The chain under one element: it and everything its ends bear on, down to the ground, from the top down
 * (each step after every step that bears on it), with each step's depth below the start.
 * @param result an evaluated load path (evaluateLoadPath)
 * @param startId the element the chain starts from (a member's id)
 * @returns the steps from the start down; empty when the id is not in the result
 * @example chainBelow(result, 'beam').map((s) => s.element.label) // ['Kitchen beam', 'Post', 'Basement girder', …]
 * Reference: DESIGN.md §6 "Load path" (the chain followed down to a footing or a foundation wall).
 */
export function chainBelow(result: LoadPathResult, startId: string): ChainStep[] {
  const byId = new Map(result.elements.map((e) => [e.id, e]));
  if (!byId.has(startId)) return [];
  const reached = new Set<string>([startId]);
  const queue = [startId];
  while (queue.length > 0) {
    const element = byId.get(queue.shift() as string) as LoadPathElementResult;
    for (const end of element.ends) {
      if (end.ontoId && !reached.has(end.ontoId)) {
        reached.add(end.ontoId);
        queue.push(end.ontoId);
      }
    }
  }
  const depth = new Map<string, number>([[startId, 0]]);
  const steps: ChainStep[] = [];
  // The result is ordered from the top down, so every step's supports come after it.
  for (const element of result.elements) {
    if (!reached.has(element.id)) continue;
    const d = depth.get(element.id) ?? 0;
    steps.push({ element, depth: d });
    for (const end of element.ends) {
      if (end.ontoId) depth.set(end.ontoId, Math.max(depth.get(end.ontoId) ?? 0, d + 1));
    }
  }
  return steps;
}
