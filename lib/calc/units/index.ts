export { parseLength, type LengthUnit, type ParseLengthOptions } from '@/lib/calc/units/length';
export { parseLoad, type LoadKind, type ParseLoadOptions } from '@/lib/calc/units/load';
