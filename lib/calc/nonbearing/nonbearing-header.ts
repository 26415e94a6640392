import type { NonbearingHeaderInput } from '@/shared/schemas/calc/framing';

/** Widest opening the flat 2x4 header rule covers, in (8 ft). */
export const FLAT_HEADER_MAX_OPENING_IN = 96;
/** Largest vertical distance from the header to the parallel nailing surface above, in. */
export const FLAT_HEADER_MAX_NAILING_GAP_IN = 24;

const REFERENCE = 'IRC 2021 R602.7.4 (R602.7.2 in earlier editions): nonbearing walls';

/**
 * What the nonbearing rule allows:
 * - `flat-2x4`: a single flat 2x4 header, no cripples or blocking above it;
 * - `header-on-edge`: outside the rule's limits: a 2x header on edge with cripples, sized for what it carries;
 * - `bearing-header`: the wall is not screened nonbearing: size a bearing header;
 * - `engineer`: the screen sent the wall to an engineer.
 */
export type NonbearingVerdict = 'flat-2x4' | 'header-on-edge' | 'bearing-header' | 'engineer';

/** Output of nonbearingHeader. */
export interface NonbearingHeaderResult {
  verdict: NonbearingVerdict;
  /** One sentence saying what to frame. */
  message: string;
  /** Why the verdict is what it is (each limit that failed, or the screen outcome). */
  reasons: string[];
  /** The rule's conditions, stated so the user can check them against the adopted code. */
  limits: string[];
  reference: string;
}

const LIMITS: readonly string[] = Object.freeze([
  'The wall carries no load: nothing bears on it (the bearing screen says likely nonbearing).',
  `Opening up to 8 ft (${FLAT_HEADER_MAX_OPENING_IN} in) wide.`,
  `The parallel nailing surface above (the top plates) is no more than ${FLAT_HEADER_MAX_NAILING_GAP_IN} in above the header.`,
  'Then no cripples or blocking are required above the header.',
  'Check the exact wording in the code your jurisdiction adopted.',
]);

/**
 * The nonbearing header rule: in a wall the bearing screen found likely nonbearing, a single flat 2x4 may
 * serve as the header for an opening up to 8 ft wide when the parallel nailing surface above is within
 * 24 in, with no cripples or blocking. Outside those limits, a 2x header on edge with cripples, sized by the
 * member check for what it carries (its own weight and the wall above the opening), or an engineer.
 * Other screen outcomes never get the rule.
 *
 * @param input screen outcome, rough opening width (in), distance to the nailing surface above (in)
 * @returns verdict, message, reasons, the rule's limits and its reference
 * @example
 * nonbearingHeader({ screenOutcome: 'likely-nonbearing', roughOpeningWidthIn: 36, nailingSurfaceAboveIn: 12 }).verdict
 * // 'flat-2x4'
 * Reference: IRC 2021 R602.7.4 (R602.7.2 in earlier editions).
 */
export function nonbearingHeader(input: NonbearingHeaderInput): NonbearingHeaderResult {
  const limits = [...LIMITS];
  if (input.screenOutcome === 'engineer-required') {
    return {
      verdict: 'engineer',
      message: 'The bearing screen sent this wall to an engineer: the nonbearing header rule does not apply.',
      reasons: ['Bearing screen outcome: engineer required.'],
      limits,
      reference: REFERENCE,
    };
  }
  if (input.screenOutcome !== 'likely-nonbearing') {
    return {
      verdict: 'bearing-header',
      message: 'Treat the wall as bearing: size the header with the member check, not the nonbearing rule.',
      reasons: [
        input.screenOutcome === 'cant-tell'
          ? "Bearing screen outcome: can't tell. Treat the wall as bearing until you know."
          : 'Bearing screen outcome: likely bearing.',
      ],
      limits,
      reference: REFERENCE,
    };
  }
  const reasons: string[] = [];
  if (input.roughOpeningWidthIn > FLAT_HEADER_MAX_OPENING_IN) {
    reasons.push(
      `The opening is ${input.roughOpeningWidthIn} in wide, over the 8 ft (${FLAT_HEADER_MAX_OPENING_IN} in) limit.`,
    );
  }
  if (input.nailingSurfaceAboveIn > FLAT_HEADER_MAX_NAILING_GAP_IN) {
    reasons.push(
      `The nailing surface above is ${input.nailingSurfaceAboveIn} in above the header, over the ${FLAT_HEADER_MAX_NAILING_GAP_IN} in limit.`,
    );
  }
  if (reasons.length === 0) {
    return {
      verdict: 'flat-2x4',
      message: 'A single flat 2x4 header is allowed here; no cripples or blocking are required above it.',
      reasons: ['Nonbearing wall, opening and nailing gap within the limits.'],
      limits,
      reference: REFERENCE,
    };
  }
  return {
    verdict: 'header-on-edge',
    message:
      'The flat 2x4 rule does not cover this opening: frame a 2x header on edge with cripples to the top plates, ' +
      'sized with the member check for what it carries (its own weight and the wall above the opening), or ask an engineer.',
    reasons,
    limits,
    reference: REFERENCE,
  };
}
