/**
 * Multiplier on the half-span (simple-span tributary) load when floor joists run continuous over the
 * member. A beam continuous over two equal spans L under uniform w puts R_centre = 10wL/8 = 1.25·wL on the
 * centre support, while half-span tributary widths give wL/2 + wL/2 = 1.0·wL; so the continuous case is
 * 1.25 × the tributary load. It holds for two equal spans; lapped or spliced joists act as simple spans (1.0).
 *
 * @example CONTINUOUS_JOIST_FACTOR // 1.25
 * Reference: AWC Design Aid No. 6 (Beam Design Formulas), two equal spans, uniformly distributed load.
 */
export const CONTINUOUS_JOIST_FACTOR = 1.25;
