/**
 * The calculation engine's only door: everything the app and the server use from lib/calc is exported here.
 * Pure TypeScript, no I/O. Units follow the standards: lengths along a member in ft, section sizes in in,
 * loads in psf, plf and lb, stresses in psi.
 *
 * @example
 * import { checkMember, buildShortlist, buildSpanTable, prescriptiveVerdict, CAUTION_TEXT, ENGINE_VERSION } from '@/lib/calc';
 *
 * Reference: NDS 2018 and NDS Supplement 2018; ASCE 7-16 / 7-22; IRC 2021; AWC Design Aid No. 6.
 */
export * from './types';
export * from './units';
export * from './loads';
export * from './snow';
export * from './materials';
export * from './factors';
export * from './analysis';
export * from './checks';
export * from './columns';
export * from './framing';
export * from './nonbearing';
export * from './shortlist';
export * from './span-table';
export * from './prescriptive';
export * from './screening';
export * from './load-path';
export * from './version';
