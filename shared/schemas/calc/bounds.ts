/**
 * The stated maximum of every list in the calculation schemas, in one place, so a request's work and a
 * result's size are bounded (a signed-in user must not be able to stall the server). Inputs are refused
 * past these with a field message; results never exceed them (the engine stays inside).
 */
export const CALC_BOUNDS = Object.freeze({
  /** Load sources on one member. */
  sources: 40,
  /** Materials in one shortlist or span table (duplicates are dropped before the work is counted). */
  materialIds: 40,
  /** Ply counts to consider: 1 to 4. */
  plies: 4,
  /** Tributary widths of one span table. */
  tributaryWidths: 12,
  /** Input flags by field name. */
  flags: 120,
  /** Prices by size in one shortlist. */
  prices: 2000,
  /** Sizes in the whole catalogue, any material (bounds shortlist and span table result lists). */
  catalogueSizes: 3000,
  /** Warnings, notes, sources, requirements, reasons or filters in one result. */
  messages: 400,
  /** Lines of one load takedown: four load types per source, plus self-weight. */
  takedownLines: 4 * 40 + 1,
  /** Load combinations of one member, live-load patterns included. */
  combinations: 120,
  /** Factors listed for one check or for the snow. */
  factors: 20,
  /** Echoed inputs of one member check. */
  echoedInputs: 120,
  /** Checks in one member result. */
  checks: 10,
  /** Diagram samples: at most 401 stations plus two per load breakpoint. */
  diagramSamples: 401 + 2 * (4 * 40 * 2 + 8),
  /**
   * Work of one span table: sizes (of every material and ply count asked for) × tributary widths × load
   * combinations that carry load. At the engine's measured speed (about 1.3 µs each) this keeps one request
   * to some 30 ms; the whole sawn catalogue at 8 widths under dead and live load is about 7,000.
   */
  spanTableWork: 24_000,
  /**
   * Work of one shortlist: sizes × load combinations that carry load (live-load patterns of an overhanging
   * or continuous beam count one each). About 0.6 µs each; every size of every material on a simple span
   * with roof, floor and snow loads is about 4,600.
   */
  shortlistWork: 40_000,
});
