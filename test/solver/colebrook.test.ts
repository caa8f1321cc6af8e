import { describe, expect, it } from 'vitest';
import { colebrookWhite } from '../../src/lib/physics/friction';
import { colebrookWhiteFrom } from '../../src/lib/solver/network/colebrook';
import { ColebrookMemo } from '../../src/lib/solver/network/pipeLaw';

// The reference is physics/friction colebrookWhite (Colebrook–White solved from Serghides'
// estimate to machine precision; its own tests check it against published tables). Started
// anywhere positive, the warm-started Newton iteration must land on the same root.
describe('colebrookWhiteFrom (Colebrook–White, Newton from a given start)', () => {
  const reynolds = [4000, 1e4, 5.5e4, 3e5, 2e6, 1e8];
  const roughness = [0, 1e-6, 1e-4, 2e-3, 0.05];

  it('agrees with physics colebrookWhite to 1e-12 relative from near and far starts', () => {
    for (const re of reynolds)
      for (const rr of roughness) {
        const f = colebrookWhite(re, rr);
        const x = 1 / Math.sqrt(f);
        for (const start of [x, x * (1 + 1e-9), x * 1.01, x * 0.7, x * 3, 0.5, 40]) {
          const warm = colebrookWhiteFrom(re, rr, start);
          expect(Math.abs(warm - f) / f).toBeLessThan(1e-12);
        }
      }
  });

  it('from the root at a nearby Reynolds number, as the network iteration starts it', () => {
    for (const rr of roughness) {
      let previous = colebrookWhite(1e4, rr);
      for (let re = 1e4; re < 1e6; re *= 1.37) {
        const warm = colebrookWhiteFrom(re, rr, 1 / Math.sqrt(previous));
        const f = colebrookWhite(re, rr);
        expect(Math.abs(warm - f) / f).toBeLessThan(1e-12);
        previous = warm;
      }
    }
  });

  it('falls back to a start of 1 when the start is not a positive number', () => {
    const f = colebrookWhite(1e5, 1e-4);
    for (const start of [0, -2, NaN, Infinity])
      expect(Math.abs(colebrookWhiteFrom(1e5, 1e-4, start) - f) / f).toBeLessThan(1e-12);
  });
});

describe('ColebrookMemo (Colebrook–White factors shared by the pipes of one solve)', () => {
  it('answers exactly physics colebrookWhite for repeated and distinct (Re, ε/D) pairs', () => {
    const memo = new ColebrookMemo();
    const pairs: Array<[number, number]> = [
      [1e5, 1e-4],
      [1e5, 1e-4],
      [1e5, 2e-4],
      [2e5, 1e-4],
      [99_999.99999999999, 1e-4],
      [1e5, 1e-4],
    ];
    for (const [re, rr] of pairs) expect(memo.factor(re, rr)).toBe(colebrookWhite(re, rr));
  });

  it('still throws for a Reynolds number the equation cannot take, as colebrookWhite does', () => {
    expect(() => new ColebrookMemo().factor(0, 1e-4)).toThrow(RangeError);
  });
});
