import { expect } from 'vitest';

/**
 * Asserts that `actual` is within a tolerance of `expected`. Every float check in the test suite goes
 * through this helper so the tolerance is always explicit.
 * @param tol.rel relative tolerance (fraction of |expected|), default 0
 * @param tol.abs absolute tolerance in the value's own unit, default 0
 * The check passes when |actual − expected| ≤ max(abs, rel·|expected|).
 */
export function expectApprox(actual: number, expected: number, tol: { rel?: number; abs?: number }): void {
  const allowed = Math.max(tol.abs ?? 0, (tol.rel ?? 0) * Math.abs(expected));
  if (!Number.isFinite(actual) || Math.abs(actual - expected) > allowed) {
    expect.fail(`expected ${actual} to be within ${allowed} of ${expected}`);
  }
}
