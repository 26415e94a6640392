/**
 * Span tables built from the user's loads, and the closed-form span limits behind them.
 * Reference: AWC Design Aid No. 6 (2007) case 1; NDS 2018 §§3.3–3.5, 3.10.
 */
export { buildSpanTable } from './build-span-table';
export { uniformSpanLimits, type UniformSpanCase, type UniformSpanLimits } from './uniform-span-limits';
