export { buildMemberLoads } from '@/lib/calc/loads/build-member-loads';
export { asdCombinations } from '@/lib/calc/loads/combinations';
export { CONTINUOUS_JOIST_FACTOR } from '@/lib/calc/loads/continuous-joist';
export { roofAngleDeg, slopeToHorizontalFactor } from '@/lib/calc/loads/roof-slope';
/** Output types of the load takedown (see takedown-line.ts). */
export type { MemberLoads, TakedownLine } from '@/lib/calc/loads/takedown-line';
export { LOAD_DEFAULTS, type LoadDefault } from '@/lib/calc/loads/defaults';
export {
  ageDefaults,
  ATTIC_EQUIPMENT,
  PLASTER_CEILING_PSF,
  ROOF_COVERINGS,
  whatsAboveSources,
  type AboveSources,
  type AtticEquipment,
  type RoofCovering,
  type WhatsAbove,
} from '@/lib/calc/loads/whats-above';
export { liveLoadPatterns, patternFactor, patternedName } from '@/lib/calc/loads/live-patterns';
