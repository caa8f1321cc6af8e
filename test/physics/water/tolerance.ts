import { expect } from 'vitest';

/** |actual − expected| / |expected|. */
export function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

/**
 * Expects `actual` to agree with a printed table value to all the digits the table gives:
 * within half a unit in its last significant digit.
 */
export function expectToTableDigits(actual: number, printed: number, significantDigits: number) {
  const lastDigit = 10 ** (Math.floor(Math.log10(Math.abs(printed))) - significantDigits + 1);
  expect(Math.abs(actual - printed)).toBeLessThanOrEqual(0.5 * lastDigit * (1 + 1e-9));
}

/** Expects a relative error of at most `tolerance`. */
export function expectRelativelyClose(actual: number, expected: number, tolerance: number) {
  expect(Number.isFinite(actual)).toBe(true);
  expect(relativeError(actual, expected)).toBeLessThanOrEqual(tolerance);
}
