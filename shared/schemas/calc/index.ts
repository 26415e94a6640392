/** Zod contracts of the calculation engine's inputs and results, shared by client and server. */
export * from './bounds';
export * from './units';
export * from './loads';
export * from './materials';
export * from './framing';
export * from './member';
export * from './shoring';
export * from './shortlist';
export * from './span-table';
export * from './load-path';
