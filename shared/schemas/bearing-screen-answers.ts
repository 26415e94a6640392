import { z } from 'zod';

/**
 * The answers of a bearing screen (DESIGN.md §3 "Bearing screen"): one entry per question, each either
 * "not sure — I can't see" (`{ value: 'unsure' }`) or a value with how it is known (`basis`: seen with your
 * own eyes, or assumed). A question left out is not answered yet. lib/calc/screening reads these answers.
 */

export const answerBases = ['seen', 'assumed'] as const;
export const answerBasisSchema = z.enum(answerBases);
export type AnswerBasis = z.infer<typeof answerBasisSchema>;

const unsure = z.object({ value: z.literal('unsure') });

/** An answer to a question whose known values are `values`, or "not sure". */
function answer<const T extends readonly [string, ...string[]]>(values: T) {
  return z.union([unsure, z.object({ value: z.enum(values), basis: answerBasisSchema })]);
}

const yesNo = ['yes', 'no'] as const;

/** Where the joist direction was read: from above the ceiling (attic, a hole, exposed joists) or from marks on it. */
export const directionSources = ['above', 'ceiling-marks'] as const;

/** Every question of the screen, with the values it takes besides "unsure". */
export const screenQuestionValues = {
  /** Is this an outside wall of the house? */
  exterior: yesNo,
  /** What is directly above the wall's ceiling: an attic (roof framing) or another floor. */
  above: ['attic', 'floor'],
  /** Which way the ceiling or floor joists above run: across the wall or parallel to it. */
  joistDirection: ['across', 'parallel'],
  /** Trap: furring strips or strapping under the ceiling, whose screw lines run across the joists. */
  furring: yesNo,
  /** Do joists end (land) on this wall's top plate? */
  joistsLand: yesNo,
  /** Are joists lapped or spliced over this wall? */
  joistLaps: yesNo,
  /** Trap: joists run unbroken over the wall and touch its top plate. */
  joistsContinuous: yesNo,
  /** A beam, girder, post or strongback above that bears on this wall. */
  beamAbove: yesNo,
  /** Trap: a post or king-stud pack hidden inside the wall. */
  hiddenPost: yesNo,
  /** Purlin braces or struts from the roof that land on this wall. */
  purlinBraces: yesNo,
  /** A wall stacked directly above this one. */
  wallAbove: yesNo,
  /** What is directly below the wall. */
  below: ['beam', 'wall', 'footing', 'slab', 'joists-only'],
  /** What the rafters meet at the top: a ridge board, a ridge beam, or no ridge (trusses, flat or shed roof). */
  ridge: ['board', 'beam', 'none'],
  /** Ceiling joists run parallel to the rafters and are lapped or spliced over this wall. */
  ceilingJoistsTie: yesNo,
  /** Trap: roof trusses, and whether one is a girder truss or bears on this wall by design. */
  trusses: ['none', 'clear-span', 'girder-or-interior-bearing'],
  /** Trap: balloon framing, studs running past the floor line. */
  balloonFraming: yesNo,
  /** A braced wall panel or shear wall: structural sheathing, hold-downs, a let-in brace. */
  bracedWall: yesNo,
  /** Sag or cracks above the wall. */
  sag: yesNo,
} as const satisfies Record<string, readonly [string, ...string[]]>;

export type ScreenQuestionId = keyof typeof screenQuestionValues;
export const screenQuestionIds = Object.keys(screenQuestionValues) as ScreenQuestionId[];

/** The joist direction also says where it was read (furring misleads marks on the ceiling). */
const joistDirectionAnswer = z.union([
  unsure,
  z.object({
    value: z.enum(screenQuestionValues.joistDirection),
    basis: answerBasisSchema,
    from: z.enum(directionSources).optional(),
  }),
]);

const spanFt = (side: string) =>
  z
    .number({ message: `Enter the joist span on side ${side}` })
    .finite()
    .positive({ message: 'The joist span must be above 0' })
    .max(40, { message: 'At most 40 ft' });

export const screenAnswersSchema = z.object({
  exterior: answer(screenQuestionValues.exterior).optional(),
  above: answer(screenQuestionValues.above).optional(),
  joistDirection: joistDirectionAnswer.optional(),
  furring: answer(screenQuestionValues.furring).optional(),
  joistsLand: answer(screenQuestionValues.joistsLand).optional(),
  joistLaps: answer(screenQuestionValues.joistLaps).optional(),
  joistsContinuous: answer(screenQuestionValues.joistsContinuous).optional(),
  beamAbove: answer(screenQuestionValues.beamAbove).optional(),
  hiddenPost: answer(screenQuestionValues.hiddenPost).optional(),
  purlinBraces: answer(screenQuestionValues.purlinBraces).optional(),
  wallAbove: answer(screenQuestionValues.wallAbove).optional(),
  below: answer(screenQuestionValues.below).optional(),
  ridge: answer(screenQuestionValues.ridge).optional(),
  ceilingJoistsTie: answer(screenQuestionValues.ceilingJoistsTie).optional(),
  trusses: answer(screenQuestionValues.trusses).optional(),
  balloonFraming: answer(screenQuestionValues.balloonFraming).optional(),
  bracedWall: answer(screenQuestionValues.bracedWall).optional(),
  sag: answer(screenQuestionValues.sag).optional(),
  /**
   * Not a deciding question: the joist spans each side of the wall (ft), measured or estimated, which a
   * bearing outcome turns into tributary widths of a new member.
   */
  joistSpanAFt: spanFt('A').optional(),
  joistSpanBFt: spanFt('B').optional(),
});
export type ScreenAnswers = z.infer<typeof screenAnswersSchema>;
export type ScreenAnswer = { value: 'unsure' } | { value: string; basis: AnswerBasis; from?: string };
