import { create, unitDependencies } from 'mathjs';

/**
 * A mathjs instance holding only what unit conversion needs (the Unit type and its dependencies), built with
 * `create()` from the unit factories rather than the full default instance: a bundler that drops unused
 * modules then leaves out the expression parser, matrices and the rest. Conversions use mathjs's exact unit
 * definitions (1 in = 25.4 mm, 1 lbf = 0.45359237 kg × 9.80665 m/s²).
 *
 * @example unit(4.1, 'm').toNumber('inch'); // 161.417…
 * Reference: mathjs 15 "Custom bundling" (create with *Dependencies); NIST SP 811 (exact unit definitions).
 */
const math = create({ unitDependencies });

/** mathjs `unit(value, name)` on the unit-only instance. */
export const unit = math.unit;
