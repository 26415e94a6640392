import { CalcInputError, type InputFlag, type LoadType, type TypedBeamLoad } from '@/lib/calc/types';
import type { LoadSource, MemberLoadsInput } from '@/shared/schemas/calc/loads';
import { CONTINUOUS_JOIST_FACTOR } from '@/lib/calc/loads/continuous-joist';
import { formatNumberTrimmed as n } from '@/lib/format/number';
import { roofAngleDeg, slopeToHorizontalFactor } from '@/lib/calc/loads/roof-slope';
import type { MemberLoads, TakedownLine } from '@/lib/calc/loads/takedown-line';

/** Positions may sit this far past the span (ft) to absorb rounding of entered values. */
const POSITION_TOLERANCE_FT = 1e-6;

const POINT_LABELS: Record<LoadSourceOf<'point'>['pointKind'], string> = {
  'girder-truss': 'Girder truss',
  'hip-valley-end': 'Hip/valley end',
  'purlin-strut': 'Purlin strut',
  'post-above': 'Post above',
  'heavy-fixture': 'Heavy fixture',
};

const SOURCE_LABELS: Record<Exclude<LoadSource['kind'], 'point'>, string> = {
  roof: 'Roof',
  ceiling: 'Ceiling',
  floor: 'Floor',
  'wall-above': 'Wall above',
};

type LoadSourceOf<K extends LoadSource['kind']> = Extract<LoadSource, { kind: K }>;

interface Extent {
  startFt: number;
  endFt: number;
  partial: boolean;
  text: string;
}

class Takedown {
  readonly loads: TypedBeamLoad[] = [];
  readonly lines: TakedownLine[] = [];
  readonly warnings: string[] = [];
  readonly totalsPlf: Record<LoadType, number> = { D: 0, L: 0, Lr: 0, S: 0 };

  uniform(
    label: string,
    type: LoadType,
    wPlf: number,
    expression: string,
    extent: Extent,
    flag?: InputFlag,
  ): void {
    if (wPlf <= 0) return;
    const text = expression + extent.text;
    if (extent.partial) {
      this.loads.push({ kind: 'uniform', wPlf, startFt: extent.startFt, endFt: extent.endFt, type, label });
      this.lines.push({
        label,
        type,
        expression: text,
        wPlf,
        startFt: extent.startFt,
        endFt: extent.endFt,
        flag,
      });
    } else {
      this.loads.push({ kind: 'uniform', wPlf, type, label });
      this.lines.push({ label, type, expression: text, wPlf, flag });
    }
    this.totalsPlf[type] += wPlf;
  }

  /** A point load at `atFt` on the member, written as at `enteredFt` (where the user measured it). */
  point(label: string, type: LoadType, pLb: number, atFt: number, enteredFt: number, flag: InputFlag): void {
    if (pLb <= 0) return;
    this.loads.push({ kind: 'point', pLb, atFt, type, label });
    this.lines.push({ label, type, expression: `${n(pLb, 0)} lb at ${n(enteredFt, 2)} ft`, pLb, atFt, flag });
  }
}

/**
 * A source's extent on the member (ft along the analysed length), its text in entered positions. An extent
 * left open runs to the member's end; an extent given is entered, so it moves on by `offsetFt`.
 */
function extentOf(
  source: { startFt?: number; endFt?: number },
  input: Pick<MemberLoadsInput, 'spanFt' | 'positionOffsetFt'>,
  field: string,
): Extent {
  const { spanFt, positionOffsetFt: offsetFt } = input;
  const startFt = source.startFt === undefined ? 0 : source.startFt + offsetFt;
  const endFt = source.endFt === undefined ? spanFt : source.endFt + offsetFt;
  if (endFt > spanFt + POSITION_TOLERANCE_FT) {
    throw new CalcInputError(
      `${field}.endFt`,
      `Load end: ${n(endFt - offsetFt, 2)} ft is past the ${n(spanFt - offsetFt, 2)} ft span`,
    );
  }
  if (startFt >= endFt) {
    throw new CalcInputError(`${field}.startFt`, 'Load start: must come before the load end');
  }
  const partial = startFt > 0 || endFt < spanFt;
  const from = Math.max(0, startFt - offsetFt);
  const to = endFt - offsetFt;
  return { startFt, endFt, partial, text: partial ? ` from ${n(from, 2)} to ${n(to, 2)} ft` : '' };
}

function addSource(t: Takedown, source: LoadSource, input: MemberLoadsInput, field: string): void {
  const flag = source.flag;
  if (source.kind === 'point') {
    const label = source.label ?? POINT_LABELS[source.pointKind];
    const offsetFt = input.positionOffsetFt;
    if (source.atFt + offsetFt > input.spanFt + POSITION_TOLERANCE_FT) {
      throw new CalcInputError(
        `${field}.atFt`,
        `${label} position: ${n(source.atFt, 2)} ft is past the ${n(input.spanFt - offsetFt, 2)} ft span`,
      );
    }
    const atFt = Math.min(source.atFt + offsetFt, input.spanFt);
    const enteredFt = atFt - offsetFt;
    t.point(label, 'D', source.deadLb, atFt, enteredFt, flag);
    t.point(label, 'L', source.liveLb, atFt, enteredFt, flag);
    t.point(label, 'Lr', source.roofLiveLb, atFt, enteredFt, flag);
    t.point(label, 'S', source.snowLb, atFt, enteredFt, flag);
    if (source.pointKind === 'purlin-strut') {
      t.warnings.push(
        `${label}: a purlin strut's load depends on the roof framing above; have an engineer confirm it.`,
      );
    }
    return;
  }
  const label = source.label ?? SOURCE_LABELS[source.kind];
  const extent = extentOf(source, input, field);
  if (source.kind === 'wall-above') {
    if (source.wPlf !== undefined) {
      t.uniform(label, 'D', source.wPlf, `${n(source.wPlf, 1)} plf (given)`, extent, flag);
    } else {
      const heightFt = source.heightFt ?? 0;
      const deadPsf = source.deadPsf ?? 0;
      t.uniform(label, 'D', heightFt * deadPsf, `${n(heightFt, 2)} ft × ${n(deadPsf, 1)} psf`, extent, flag);
    }
    return;
  }
  const trib = `${n(source.tributaryFt, 2)} ft`;
  if (source.kind === 'roof') {
    const pitch = input.roofPitchIn12;
    const slopeFactor = source.deadAlongSlope ? slopeToHorizontalFactor(pitch) : 1;
    const deadExpr = `${trib} × ${n(source.deadPsf, 1)} psf`;
    t.uniform(
      label,
      'D',
      source.tributaryFt * source.deadPsf * slopeFactor,
      source.deadAlongSlope && pitch > 0 ? `${deadExpr} ÷ cos ${n(roofAngleDeg(pitch), 1)}°` : deadExpr,
      extent,
      flag,
    );
    t.uniform(
      label,
      'Lr',
      source.tributaryFt * source.roofLivePsf,
      `${trib} × ${n(source.roofLivePsf, 1)} psf`,
      extent,
      flag,
    );
    const snowPsf = source.snowPsf ?? input.roofSnowPsf;
    t.uniform(label, 'S', source.tributaryFt * snowPsf, `${trib} × ${n(snowPsf, 1)} psf`, extent, flag);
    return;
  }
  const factor = source.continuousOver ? CONTINUOUS_JOIST_FACTOR : 1;
  const suffix = factor === 1 ? '' : ` × ${n(factor, 2)} (joists continuous over the member)`;
  t.uniform(
    label,
    'D',
    source.tributaryFt * source.deadPsf * factor,
    `${trib} × ${n(source.deadPsf, 1)} psf${suffix}`,
    extent,
    flag,
  );
  t.uniform(
    label,
    'L',
    source.tributaryFt * source.livePsf * factor,
    `${trib} × ${n(source.livePsf, 1)} psf${suffix}`,
    extent,
    flag,
  );
  if (factor !== 1) {
    t.warnings.push(
      `${label}: joists continuous over the member put 1.25 × their half-span load on it; that factor is for two ` +
        'equal spans. Unequal spans or more than two spans change it: have an engineer confirm.',
    );
  }
}

/**
 * Load takedown: turns the member's load sources into typed beam loads (plf over the span or part of it,
 * lb at a point) and a line-by-line record of the arithmetic.
 * - area sources: tributary width (ft) × psf; roof loads per horizontal projection, a dead load given along
 *   the slope divided by cos θ; roof snow p_s from the snow module (input.roofSnowPsf unless the source
 *   gives its own);
 * - floor or ceiling joists continuous over the member: × 1.25 (two equal spans);
 * - wall above: plf as given, or height × psf; point loads by type at their position; self-weight as D.
 * Zero loads are left out of `loads` and `lines`. Source positions are entered ones (from the face of the left
 * support, say): `positionOffsetFt` moves them onto the analysed member for `loads` and the lines' numbers,
 * while the lines' text and the messages say the positions as entered.
 *
 * @param input parsed memberLoadsInputSchema: spanFt (ft), roofPitchIn12, roofSnowPsf (psf), selfWeightPlf
 *   (plf), sources (tributary widths ft, area loads psf, line loads plf, point loads lb, positions ft as
 *   entered), positionOffsetFt (ft)
 * @returns loads (plf / lb, positions ft), takedown lines, warnings, totalsPlf (plf by load type)
 * @throws CalcInputError (field = "sources.<i>.<name>") for positions or extents off the span (in entered ft)
 * @example
 * buildMemberLoads({ spanFt: 6, roofPitchIn12: 12, roofSnowPsf: 0, selfWeightPlf: 0,
 *   sources: [{ kind: 'roof', flag: 'assumed', tributaryFt: 10, deadPsf: 10, deadAlongSlope: true, roofLivePsf: 20 }] })
 * // loads: D 141.4 plf ("10 ft × 10 psf ÷ cos 45°"), Lr 200 plf
 * Reference: ASCE 7-16/7-22 chapters 4 and 7 (horizontal projection); AWC Design Aid No. 6 (two equal spans,
 * centre reaction 1.25wL).
 */
export function buildMemberLoads(input: MemberLoadsInput): MemberLoads {
  const t = new Takedown();
  for (let i = 0; i < input.sources.length; i++) {
    addSource(t, input.sources[i], input, `sources.${i}`);
  }
  const whole: Extent = { startFt: 0, endFt: input.spanFt, partial: false, text: '' };
  t.uniform('Self-weight', 'D', input.selfWeightPlf, `${n(input.selfWeightPlf, 1)} plf (member)`, whole);
  return { loads: t.loads, lines: t.lines, warnings: t.warnings, totalsPlf: t.totalsPlf };
}
