import { formatLb, formatNumber, formatPlf } from '@/lib/format';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';

type TakedownLine = MemberCheckResult['takedown'][number];
export type LoadType = TakedownLine['type'];

/** One load type's part of a drawn load: plf for a uniform load, lb for a point load. */
export interface LoadPart {
  type: LoadType;
  value: number;
}

/**
 * One source's load as drawn: the takedown's lines of that source, one part per load type, unfactored;
 * the total is their plain sum (shown only where the parts add up, see addsUp). Positions are in the analysis
 * frame (ft from the member's left end as analysed), as in the takedown.
 */
export type DrawnLoad =
  | {
      kind: 'uniform';
      label: string;
      parts: LoadPart[];
      totalPlf: number;
      startFt: number;
      endFt: number;
      full: boolean;
    }
  | { kind: 'point'; label: string; parts: LoadPart[]; totalLb: number; atFt: number };

const TYPE_ORDER: readonly LoadType[] = ['D', 'L', 'Lr', 'S'];

/** Where a takedown line sits, so that lines of one source (same label, same place) group together. */
function placeKey(line: TakedownLine): string {
  if (line.pLb !== undefined) return `p:${line.atFt}`;
  return `u:${line.startFt ?? 'start'}:${line.endFt ?? 'end'}`;
}

/**
 * Groups the takedown into the loads to draw: consecutive lines with the same label and place and
 * different load types are one source (the engine writes a source's D, L, Lr and S lines one after the
 * other), so "Floor" D 144 plf and L 480 plf become one "Floor · D+L 624 plf". Unfactored (service) loads.
 *
 * @param takedown the result's takedown (plf, lb; positions ft, analysis frame)
 * @param lengthFt the analysed length, ft: a uniform line without extent covers 0 to it
 * @returns loads in takedown order
 * @example groupLoads(result.takedown, memberFrame(result).analysedLengthFt)[0] // { kind: 'uniform', label: 'Floor', totalPlf: 624, … }
 */
export function groupLoads(takedown: readonly TakedownLine[], lengthFt: number): DrawnLoad[] {
  const loads: DrawnLoad[] = [];
  let lastKey = '';
  for (const line of takedown) {
    const value = line.pLb ?? line.wPlf;
    if (value === undefined || value <= 0) continue;
    const key = `${line.label}|${placeKey(line)}`;
    const current = loads[loads.length - 1];
    if (current && key === lastKey && !current.parts.some((p) => p.type === line.type)) {
      current.parts.push({ type: line.type, value });
      if (current.kind === 'point') current.totalLb += value;
      else current.totalPlf += value;
    } else if (line.pLb !== undefined) {
      loads.push({
        kind: 'point',
        label: line.label,
        parts: [{ type: line.type, value }],
        totalLb: value,
        atFt: line.atFt ?? 0,
      });
    } else {
      const full = line.startFt === undefined && line.endFt === undefined;
      loads.push({
        kind: 'uniform',
        label: line.label,
        parts: [{ type: line.type, value }],
        totalPlf: value,
        startFt: line.startFt ?? 0,
        endFt: line.endFt ?? lengthFt,
        full,
      });
    }
    lastKey = key;
  }
  for (const load of loads)
    load.parts.sort((a, b) => TYPE_ORDER.indexOf(a.type) - TYPE_ORDER.indexOf(b.type));
  return loads;
}

/** True when the load has at most one variable type beside dead load, so its parts add up in one combination. */
export function addsUp(load: DrawnLoad): boolean {
  return load.parts.filter((p) => p.type !== 'D').length <= 1;
}

/**
 * The size a load is drawn at, plf or lb: dead plus its largest variable part (roof live and snow, say,
 * are not summed: no ASD combination takes both in full).
 */
export function drawnMagnitude(load: DrawnLoad): number {
  const dead = load.parts.find((p) => p.type === 'D')?.value ?? 0;
  return dead + Math.max(0, ...load.parts.filter((p) => p.type !== 'D').map((p) => p.value));
}

/**
 * The types and amount of a drawn load: "D+L 624 plf" and "D+L 1,500 lb" where the parts add up,
 * each part otherwise ("D 120, Lr 160, S 224 plf").
 * @example amountText(floorLoad) // "D+L 624 plf"
 */
export function amountText(load: DrawnLoad): string {
  const unit = load.kind === 'point' ? 'lb' : 'plf';
  if (!addsUp(load))
    return `${load.parts.map((p) => `${p.type} ${formatNumber(p.value)}`).join(', ')} ${unit}`;
  const types = load.parts.map((p) => p.type).join('+');
  return `${types} ${load.kind === 'point' ? formatLb(load.totalLb) : formatPlf(load.totalPlf)}`;
}

/**
 * The label drawn beside a load: "Floor · D+L 624 plf", "Post above · D+L 1,500 lb".
 * @example loadLabelText(groupLoads(takedown, 14.375)[0]) // "Floor · D+L 624 plf"
 */
export function loadLabelText(load: DrawnLoad): string {
  return `${load.label} · ${amountText(load)}`;
}
