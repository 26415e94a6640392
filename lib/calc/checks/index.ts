/**
 * Member checks (NDS ASD): the front door `checkMember`, and the pieces the shortlist and span table reuse.
 * Reference: NDS 2018 §§3.3–3.5, 3.10; ASCE 7-16/7-22 §2.4.1.
 */
export {
  checkMember,
  DEFAULT_PLATE_MATERIAL_ID,
  DEFAULT_SUPPORT_WIDTH_IN,
  serviceConditions,
  supportSpec,
} from './check-member';
export {
  prepareMember,
  endShearsFor,
  DEFAULT_BEARING_IN,
  type LoadGroup,
  type MemberSpans,
  type PreparedMember,
  type PreparedCombination,
} from './prepare-member';
export { evaluateSize, type SizeEvaluation, type SupportSpec, type CheckNumbers } from './evaluate-size';
export {
  sectionFactors,
  supportFcPerpPsi,
  type SectionFactors,
  type ServiceConditions,
} from './section-factors';
export { describeChecks } from './describe-checks';
export { resolveMember, type ResolvedMember } from './resolve-member';
export { unknownGradeMaterial } from './unknown-grade';
export { DEFLECTION_PRESETS, type DeflectionPreset } from './deflection-presets';
export { creepFactor } from './creep';
export { endShearsAtD, supportSideShears } from './end-shears';
export {
  memberGeometry,
  DEFAULT_CENTRE_BEARING_IN,
  type GeometryRegion,
  type MemberGeometry,
} from './member-geometry';
export { jackStuds, JACK_STUD_IN, TWO_JACKS_OVER_FT, type JackStuds } from './bearing-jacks';
export { combinationDemands, supportNames } from './combination-demands';
export {
  mountRequirements,
  DEFAULT_JOIST_SPACING_IN,
  DEFAULT_MIN_HEADROOM_IN,
  type MountResult,
} from './mount-requirements';
export { echoInputs } from './echo-inputs';
