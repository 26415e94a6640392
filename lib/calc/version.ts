/**
 * The engine's version, stored beside every saved result. It changes whenever a result for the same input
 * may change: a formula, a factor, a table value, a default, a warning's wording or the shape of the result.
 * A saved member whose `engineVersion` differs from this was computed by another engine and may not match
 * what the engine gives today for the same input.
 *
 * Format: year.month.release (the release counts from 1 within the month).
 *
 * @example
 * const saved = { engineVersion: ENGINE_VERSION, result: checkMember(input) };
 * saved.engineVersion === ENGINE_VERSION; // true until the engine changes
 *
 * Reference: none (a Tributary bookkeeping value, not a published quantity).
 */
export const ENGINE_VERSION = '2026.12.1';
