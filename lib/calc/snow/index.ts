export { roofSnowLoad, type RoofSnow } from '@/lib/calc/snow/roof-snow';
export { flatRoofSnowPsf } from '@/lib/calc/snow/flat-roof';
export { minimumSnowPsf, LOW_SLOPE_LIMIT_DEG } from '@/lib/calc/snow/minimum';
export { roofSlopeFactor } from '@/lib/calc/snow/slope-factor';
