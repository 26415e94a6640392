/**
 * The boundary every span type implements. Positions along the member are in ft from the left end; shear in lb,
 * moment in lb·ft, deflection in in (positive downward). Simple spans (`createSimpleSpan`) and members that
 * overhang a support or run continuous over a centre post (`createSupportedBeam`) implement this same
 * interface, so the member check, the shortlist and the diagrams never need to know which they hold.
 *
 * Reference: AWC Design Aid No. 6 (2007), "Beam Design Formulas with Shear and Moment Diagrams" — sign
 * conventions follow its diagrams (shear positive just right of the left support, sagging moment positive).
 */

/** A support's position and the force it takes, lb upward. */
export interface SupportReaction {
  atFt: number;
  reactionLb: number;
}

/** An extreme value and where it occurs, ft from the left end. */
export interface Extremum {
  value: number;
  atFt: number;
}

/** Which side of a discontinuity (a point load) a shear value is taken on. */
export type ShearSide = 'before' | 'after';

/** One point of the diagrams: position ft, shear lb, moment lb·ft, deflection in (downward positive). */
export interface DiagramSample {
  xFt: number;
  shearLb: number;
  momentLbFt: number;
  deflectionIn: number;
}

/**
 * A loaded, supported member with its stiffness. Implementations are immutable: build a new model for new loads.
 *
 * @example
 * const beam: SpanModel = createSimpleSpan({ spanFt: 12, eiLbIn2: 1.6e6 * 47.63, loads: [{ kind: 'uniform', wPlf: 400 }] });
 * beam.maxMoment(); // { value: 7200, atFt: 6 } (lb·ft)
 *
 * Reference: AWC Design Aid No. 6 (2007); AISC Steel Construction Manual, Table 3-23.
 */
export interface SpanModel {
  /** Length of the member analysed, ft: the design span of a simple span, end to end with overhangs. */
  readonly spanFt: number;
  /** Support reactions, lb, left to right. */
  reactions(): readonly SupportReaction[];
  /** Shear at x (ft), lb; at a point load `side` picks the value just before or just after it (default after). */
  shearLb(xFt: number, side?: ShearSide): number;
  /** Bending moment at x (ft), lb·ft, sagging positive. */
  momentLbFt(xFt: number): number;
  /** Deflection at x (ft), in, downward positive. */
  deflectionIn(xFt: number): number;
  /** Largest |shear|, lb (signed value), and where. */
  maxShear(): Extremum;
  /** Largest |moment|, lb·ft (signed value), and where; found where the shear crosses zero or at a breakpoint. */
  maxMoment(): Extremum;
  /** Largest |deflection|, in (signed value), and where; found where the slope is zero. */
  maxDeflection(): Extremum;
  /** Positions, ft, where the load changes (supports, point loads, ends of partial loads), sorted, unique. */
  breakpointsFt(): readonly number[];
}
