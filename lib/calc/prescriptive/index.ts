/**
 * Prescriptive path: whether code header tables likely cover a header, and the caution every result carries.
 * Reference: IRC 2021 R602.7 (scope); DESIGN.md §8.
 */
export { CAUTION_TEXT } from './caution';
export { prescriptiveVerdict } from './prescriptive-verdict';
export {
  envelopeReasons,
  MAX_TABLE_BUILDING_WIDTH_FT,
  MAX_TABLE_GROUND_SNOW_PSF,
  MAX_TABLE_SPAN_FT,
} from './envelope';
