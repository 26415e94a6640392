import { CAUTION_TEXT } from '@/lib/calc/prescriptive/caution';
import type { BearingScreenOutcome } from '@/shared/schemas/calc/framing';
import type { AnswerBasis, ScreenAnswers, ScreenQuestionId } from '@/shared/schemas/bearing-screen-answers';
import { QUESTION_FACTS, ROOF_THRUST, type FindingKind, type ScreenTopic } from './question-facts';

/** One reason behind the outcome: what was found, how it is known, and the source of the rule. */
export interface ScreenReason {
  topic: ScreenTopic;
  kind: FindingKind | 'unknown';
  text: string;
  /** How the answer behind it is known; null for "not sure" or not answered. */
  basis: AnswerBasis | null;
  source: string;
}

/** Something to go and look at before the wall can be called: the question, and where to look. */
export interface ScreenLookAt {
  topic: ScreenTopic;
  /** Why it must be looked at: "not sure", "assumed", "not answered yet", a trap. */
  why: string;
  where: string;
}

export interface ScreenResult {
  outcome: BearingScreenOutcome;
  /** One sentence for the outcome, shown under its name. */
  headline: string;
  /** Every reason, the deciding ones first. */
  reasons: ScreenReason[];
  /** For "can't tell yet": exactly what to go and look at. Empty for the other outcomes. */
  lookAt: ScreenLookAt[];
  /** For "likely bearing": answers about engineer-class questions that were assumed, still to confirm. */
  toConfirm: ScreenLookAt[];
  /** For "engineer required": the reasons in words, to mark the job "engineer needed". */
  engineerReasons: string[];
  /** The questions that applied to this wall (the others do not, given what is above it). */
  applies: ScreenTopic[];
  caution: string;
  sources: string[];
}

type Known = { value: string; basis: AnswerBasis; from?: string };

const ROOF_QUESTIONS: ReadonlySet<ScreenQuestionId> = new Set([
  'ridge',
  'ceilingJoistsTie',
  'purlinBraces',
  'trusses',
]);
const LANDING_QUESTIONS: ReadonlySet<ScreenQuestionId> = new Set([
  'joistsLand',
  'joistLaps',
  'joistsContinuous',
]);

const known = (answers: ScreenAnswers, id: ScreenQuestionId): Known | null => {
  const a = answers[id];
  return a && a.value !== 'unsure' ? (a as Known) : null;
};
const valueOf = (answers: ScreenAnswers, id: ScreenQuestionId) => answers[id]?.value;

/**
 * Which questions apply to this wall: roof questions only where an attic may be above it, balloon framing
 * only where a floor may be above it, the landing questions only where the joists may cross it, the truss
 * question only where no ridge was found, the ceiling-joist tie only where no ridge beam was.
 */
export function applicableQuestions(answers: ScreenAnswers): ScreenQuestionId[] {
  const above = valueOf(answers, 'above');
  const ridge = valueOf(answers, 'ridge');
  return (Object.keys(QUESTION_FACTS) as ScreenQuestionId[]).filter((id) => {
    if (ROOF_QUESTIONS.has(id) && above === 'floor') return false;
    if (id === 'balloonFraming' && above === 'attic') return false;
    if (LANDING_QUESTIONS.has(id) && valueOf(answers, 'joistDirection') === 'parallel') return false;
    if (id === 'trusses' && (ridge === 'board' || ridge === 'beam')) return false;
    if (id === 'ceilingJoistsTie' && (ridge === 'beam' || ridge === 'none')) return false;
    return true;
  });
}

const ASSUMED = 'Assumed, not seen.';

const weaker = (a: AnswerBasis, b: AnswerBasis): AnswerBasis =>
  a === 'assumed' || b === 'assumed' ? 'assumed' : 'seen';

interface Thrust {
  state: 'present' | 'unknown' | 'absent';
  basis: AnswerBasis | null;
  /** The question to go and look at when unknown. */
  lookTopic: ScreenQuestionId;
}

/** Roof thrust from the ridge and the ceiling joists (IRC R802.5.2): a ridge board with tying joists lapped here. */
function roofThrust(answers: ScreenAnswers, applies: ReadonlySet<ScreenQuestionId>): Thrust | null {
  if (!applies.has('ridge')) return null;
  const ridge = known(answers, 'ridge');
  if (ridge && ridge.value !== 'board') return { state: 'absent', basis: ridge.basis, lookTopic: 'ridge' };
  const tie = known(answers, 'ceilingJoistsTie');
  if (tie?.value === 'no') return { state: 'absent', basis: tie.basis, lookTopic: 'ceilingJoistsTie' };
  if (ridge && tie) return { state: 'present', basis: weaker(ridge.basis, tie.basis), lookTopic: 'ridge' };
  return { state: 'unknown', basis: null, lookTopic: tie ? 'ridge' : 'ceilingJoistsTie' };
}

/** Why an answer is not enough to call the wall nonbearing; null when it is seen. */
function notSeenWhy(answers: ScreenAnswers, id: ScreenQuestionId): string | null {
  const a = answers[id];
  if (!a) return 'Not answered yet.';
  if (a.value === 'unsure') return 'Not sure — could not see.';
  if (a.basis === 'assumed') return ASSUMED;
  if (id === 'joistDirection' && (a as Known).from === 'ceiling-marks') {
    const furring = known(answers, 'furring');
    if (!(furring?.value === 'no' && furring.basis === 'seen')) {
      return furring?.value === 'yes'
        ? 'Read from marks on a furred ceiling: the furring’s screw lines run across the joists.'
        : 'Read from marks on the ceiling, and furring is not ruled out: its screw lines run across the joists.';
    }
  }
  return null;
}

const HEADLINES: Record<BearingScreenOutcome, string> = {
  'engineer-required': 'What this wall carries or holds together needs a licensed engineer’s design.',
  'likely-bearing': 'Treat the wall as carrying load and size the header or beam for it.',
  'likely-nonbearing':
    'Every deciding answer was seen and none points to load. Confirm as you open the wall.',
  'cant-tell': 'Open an inspection hole and look at the places listed before you decide.',
};

/**
 * The bearing screen for one wall: answers → outcome with every reason.
 * - Engineer required when any engineer-class finding is answered yes, seen or assumed: roof thrust (a ridge
 *   board with ceiling joists tying the rafters lapped over the wall), a braced wall panel or shear wall,
 *   purlin braces landing on it, a beam, girder, post or strongback above, a hidden post, a girder truss or
 *   a truss bearing on it, sag or cracks above. These never give "nonbearing".
 * - Can't tell yet when any engineer-class question that applies is "not sure" or not answered (even on a
 *   wall that looks bearing), listing where to look.
 * - Likely bearing on any sign of load (exterior wall, joists landing, lapped, spliced or continuous over it,
 *   a wall above, a bearing line below, balloon framing, tying ceiling joists lapped over it), seen or
 *   assumed; assumed "no" answers to engineer-class questions are listed to confirm.
 * - Likely nonbearing only when every question that applies was answered and seen and none points to load;
 *   otherwise can't tell yet, with each unseen answer to go and look at (a joist direction read from ceiling
 *   marks counts as seen only when furring was seen to be absent).
 *
 * @param answers parsed screenAnswersSchema (no units; the joist spans in ft are not read here)
 * @returns outcome, headline, reasons, what to look at, what to confirm, engineer reasons, caution, sources
 * @example
 * screenWall({ ridge: { value: 'board', basis: 'seen' }, ceilingJoistsTie: { value: 'yes', basis: 'seen' } }).outcome
 * // 'engineer-required'
 * Reference: IRC 2021 R602.10 (braced walls), R802.4.5 (purlins), R802.5.2 (ceiling joists as rafter
 *   ties), R802.10 (trusses); AWC Design Aid No. 6 (continuous joists); common practice for the rest.
 */
export function screenWall(answers: ScreenAnswers): ScreenResult {
  const applying = applicableQuestions(answers);
  const applies = new Set(applying);
  const thrust = roofThrust(answers, applies);
  const reasons: ScreenReason[] = [];
  const dangerUnknown: ScreenLookAt[] = [];
  const assumedClearDanger: ScreenLookAt[] = [];

  for (const id of applying) {
    const facts = QUESTION_FACTS[id];
    const a = known(answers, id);
    if (!a) {
      if (facts.danger) {
        dangerUnknown.push({
          topic: id,
          why: answers[id] ? 'Not sure — could not see.' : 'Not answered yet.',
          where: facts.lookAt,
        });
      }
      continue;
    }
    const finding = facts.findings[a.value];
    reasons.push({
      topic: id,
      kind: finding.kind,
      text: finding.text,
      basis: a.basis,
      source: finding.source,
    });
    if (facts.danger && finding.kind === 'clear' && a.basis === 'assumed') {
      assumedClearDanger.push({ topic: id, why: ASSUMED, where: facts.lookAt });
    }
  }
  if (thrust?.state === 'present') {
    const f = ROOF_THRUST.finding;
    reasons.push({ topic: 'roofThrust', kind: f.kind, text: f.text, basis: thrust.basis, source: f.source });
  }
  if (thrust?.state === 'unknown') {
    dangerUnknown.push({
      topic: 'roofThrust',
      why: ROOF_THRUST.unknownText,
      where: QUESTION_FACTS[thrust.lookTopic].lookAt,
    });
  }

  const of = (kind: FindingKind) => reasons.filter((r) => r.kind === kind);
  const engineer = of('engineer');
  const bearing = of('bearing');
  const ordered = [...engineer, ...bearing, ...of('clear')];
  const sources = [...new Set(ordered.map((r) => r.source))];
  const result = (
    outcome: BearingScreenOutcome,
    extra: Partial<Pick<ScreenResult, 'lookAt' | 'toConfirm' | 'engineerReasons'>> & {
      unknown?: ScreenLookAt[];
    } = {},
  ): ScreenResult => ({
    outcome,
    headline: HEADLINES[outcome],
    reasons: [
      ...ordered,
      // Assumed answers are already among the reasons, marked assumed.
      ...(extra.unknown ?? [])
        .filter((look) => look.why !== ASSUMED)
        .map((look): ScreenReason => ({
          topic: look.topic,
          kind: 'unknown',
          text: `${titleOf(look.topic)}: ${look.why}`,
          basis: null,
          source: sourceOf(look.topic),
        })),
    ],
    lookAt: extra.lookAt ?? [],
    toConfirm: extra.toConfirm ?? [],
    engineerReasons: extra.engineerReasons ?? [],
    applies: [...applying, ...(thrust ? (['roofThrust'] as const) : [])],
    caution: CAUTION_TEXT,
    sources,
  });

  if (engineer.length > 0) {
    return result('engineer-required', { engineerReasons: engineer.map((r) => r.text) });
  }
  if (dangerUnknown.length > 0) {
    return result('cant-tell', { lookAt: dangerUnknown, unknown: dangerUnknown });
  }
  if (bearing.length > 0) return result('likely-bearing', { toConfirm: assumedClearDanger });

  const unseen: ScreenLookAt[] = [];
  for (const id of applying) {
    const why = notSeenWhy(answers, id);
    if (why) unseen.push({ topic: id, why, where: QUESTION_FACTS[id].lookAt });
  }
  if (unseen.length > 0) return result('cant-tell', { lookAt: unseen, unknown: unseen });
  return result('likely-nonbearing');
}

function titleOf(topic: ScreenTopic): string {
  return topic === 'roofThrust' ? ROOF_THRUST.title : QUESTION_FACTS[topic].title;
}

function sourceOf(topic: ScreenTopic): string {
  if (topic === 'roofThrust') return ROOF_THRUST.finding.source;
  return Object.values(QUESTION_FACTS[topic].findings)[0].source;
}
