export { roofSnowLoad, type RoofSnow } from '@/lib/calc/snow/roof-snow';
export { flatRoofSnowPsf } from '@/lib/calc/snow/flat-roof';
export { minimumSnowPsf, LOW_SLOPE_LIMIT_DEG, ASCE_7_22_PM_MAX_PSF } from '@/lib/calc/snow/minimum';
export { roofSlopeFactor } from '@/lib/calc/snow/slope-factor';
export {
  thermalFactor,
  DEFAULT_ROOF_THERMAL_CONDITION,
  ROOF_THERMAL_LABELS,
  type ThermalFactor,
} from '@/lib/calc/snow/thermal-factor';
export { slipperyCurve, WARM_ROOF_SLIPPERY_MIN_R, type SlipperyCurve } from '@/lib/calc/snow/slippery-curve';
