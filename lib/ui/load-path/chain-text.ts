import type { ChainStep } from '@/lib/calc/load-path';
import type { LoadPathElementKind } from '@/shared/schemas/calc/load-path';
import { endWords, kindWords, lbText, pathStateLook } from './words';

/** One step of the chain in words: what it is, its state, what lands on it and what each end passes down. */
export interface ChainLine {
  id: string;
  title: string;
  state: string;
  lines: string[];
}

/** The governing check of a step, as a ratio in words ("bending at 5.13 of capacity"). */
function checkWords(step: ChainStep): string | null {
  const e = step.element;
  if (e.memberResult) {
    const g = e.memberResult.governing;
    return `Check: ${g.check} at ${g.ratio.toFixed(2)} of what it can take (${g.combination ?? 'governing combination'})`;
  }
  const worst = [...e.checks].sort((a, b) => b.ratio - a.ratio)[0];
  if (!worst) return null;
  return `Check: ${worst.label} at ${worst.ratio.toFixed(2)} (${worst.combination})`;
}

/**
 * The text equivalent of the section drawing: each step from the member down to the ground, with the load
 * arriving, its check, where each end goes and why the path is open or needs an engineer.
 * @example chainLines(chainBelow(result, id))[0].title // "1. Kitchen beam — new member"
 */
export function chainLines(steps: readonly ChainStep[]): ChainLine[] {
  const labelOf = new Map(steps.map((s) => [s.element.id, s.element.label]));
  return steps.map((step, i) => {
    const e = step.element;
    const lines: string[] = [];
    const arriving = e.incoming.reduce(
      (sum, l) => sum + Object.values(l.load).reduce((a, b) => a + (b ?? 0), 0),
      0,
    );
    if (e.incoming.length > 0)
      lines.push(
        `Carries ${lbText(arriving)} from ${e.incoming.map((l) => `${l.fromLabel}${l.atFt !== undefined && l.atFt > 0 ? ` at ${l.atFt} ft` : ''}`).join(', ')} (dead + live + roof + snow, unfactored)`,
      );
    const check = checkWords(step);
    if (check) lines.push(check);
    if (e.pad)
      lines.push(`New pad ${e.pad.sideIn} × ${e.pad.sideIn} in at ${e.pad.soilBearingPsf} psf soil bearing`);
    for (const end of e.ends) {
      const where = end.ontoId ? (labelOf.get(end.ontoId) ?? 'another element') : 'nothing yet';
      lines.push(`${endWords[end.end]} → ${where}: ${lbText(end.governingLb)} (${end.governingCombination})`);
    }
    lines.push(...e.openReasons.map((r) => `Open: ${r}`));
    lines.push(...e.engineerReasons.map((r) => `Engineer required: ${r}`));
    return {
      id: e.id,
      title: `${i + 1}. ${e.label} — ${kindWords[e.kind as LoadPathElementKind].toLowerCase()}`,
      state: pathStateLook[e.state].word,
      lines,
    };
  });
}
