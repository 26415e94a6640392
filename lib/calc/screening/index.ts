/**
 * The bearing screen: answers about one wall → likely bearing / likely nonbearing / engineer required /
 * can't tell yet, with every reason and what to go and look at.
 * Reference: IRC 2021 R602.10, R802.4.5, R802.5.2, R802.10; AWC Design Aid No. 6; common practice.
 */
export {
  applicableQuestions,
  screenWall,
  type ScreenLookAt,
  type ScreenReason,
  type ScreenResult,
} from './screen-wall';
export {
  QUESTION_FACTS,
  ROOF_THRUST,
  type Finding,
  type FindingKind,
  type QuestionFacts,
  type ScreenTopic,
} from './question-facts';
export { SCREEN_SOURCES } from './sources';
