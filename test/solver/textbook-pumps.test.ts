/**
 * A published worked example of a pump's suction side, solved by the network solver in duty
 * mode (the flow through the pump is fixed) and compared with the book's printed answer.
 *
 * Source: R. Mackay, The Practical Pumping Handbook (Elsevier; edition, publisher and year
 * from memory: 1st ed., 2004), section 4.4.2.5 "Sample NPSHA calculation", book pages 61–62.
 * Text and printed answer read at
 * https://digilib.universitaspertamina.ac.id/ebook/The%20Practical%20Pumping%20Handbook/files/basic-html/page82.html
 * and .../page83.html (the final line, NPSHA = 72.321 feet, is on the second page).
 *
 * The book's data, as printed:
 *   water at 140 °F, 340 gpm through the pump, suction line 6 inches, 25 ft of pipe;
 *   static head Hs = 45 ft (supply-tank liquid surface above the impeller centreline);
 *   surface pressure 14.7 psia → Ha = 14.7 × 2.31 / 0.985 = 34.474 ft;
 *   vapour pressure 2.889 psia → Hvp = 2.889 × 2.31 / 0.985 = 6.775 ft;
 *   pipe friction from the book's friction-loss tables: 0.806 ft per 100 ft, so
 *     0.806 × 25 / 100 = 0.2 ft (printed rounded; unrounded 0.2015 ft);
 *   velocity head V²/2g = 0.222 ft; two flanged gate valves K = 0.11 each (0.049 ft) and two
 *     flanged standard elbows K = 0.29 each (0.129 ft); total friction losses 0.378 ft;
 *   NPSHA = Hs + Ha − Hvp − Hf = 45 + 34.474 − 6.775 − 0.378 = 72.321 ft.
 * The book charges no pipe-entrance loss, so the supply nozzle here has entrance K = 0.
 *
 * How the data map onto the model:
 * - The liquid is user-defined with the book's own conversions: the book turns psi into feet
 *   by 2.31 ft/psi divided by the specific gravity 0.985, which is the same as a density of
 *   0.985 × psi/(g × 2.31 ft) = 983.58 kg/m³; its vapour pressure is the printed 2.889 psia.
 *   (IAPWS-IF97 at 60 °C, via python3-iapws 1.5.2: ρ = 983.18 kg/m³, p_v = 19.946 kPa against
 *   the book's 19.919 kPa; (p_atm − p_v)/ρg then differs by 0.6 mm (0.002 ft). The book's own
 *   figures are used so that each printed head is reproduced term by term.)
 * - The site atmospheric pressure is overridden to the printed 14.7 psia.
 * - "6 inch line": the book's friction table is for new Schedule 40 steel pipe (the book says
 *   so in its section 3.6), inner diameter 6.065 in (ASME B36.10M, from memory); the printed
 *   velocity head 0.222 ft at 340 gpm confirms that bore (checked below).
 * - The book reads its pipe friction from a table (0.806 ft per 100 ft) for cold water rather
 *   than computing it, so the pipe gets the fixed friction factor that gives that gradient:
 *   f = 0.00806 × D / (V²/2g). A fixed f is reproduced by the fully rough Colebrook–White
 *   limit, ε = 3.7·D·10^(−1/(2√f)), with a liquid of negligible viscosity (μ = 1e-12 Pa·s) so
 *   that the Reynolds term vanishes; the solved f then equals the chosen f (checked below).
 */
import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665; // standard gravity, m/s² (CGPM 1901)
const FT = 0.3048; // m, exact (international foot)
const IN = 0.0254; // m, exact
const PSI = (0.45359237 * g) / IN ** 2; // Pa per lbf/in², exact by definition
const GPM = (231 * IN ** 3) / 60; // m³/s per US gal/min (US gallon = 231 in³, exact)

/** |actual − printed| within `abs` (same unit), with a message naming the figure. */
function expectPrinted(name: string, actual: number, printed: number, abs: number): void {
  expect(
    Math.abs(actual - printed),
    `${name}: solver ${actual.toFixed(5)}, book ${printed} (±${abs})`,
  ).toBeLessThanOrEqual(abs);
}

describe('R. Mackay, The Practical Pumping Handbook, 4.4.2.5 "Sample NPSHA calculation" (printed answer read)', () => {
  const sg = 0.985;
  const density = (sg * PSI) / (g * 2.31 * FT); // the book's 2.31 ft/psi ÷ SG, as a density
  const vapourPressure = 2.889 * PSI;
  const atmosphere = 14.7 * PSI;
  const flow = 340 * GPM;
  const diameter = 6.065 * IN;
  const suctionLength = 25 * FT;
  const staticHead = 45 * FT;
  const velocity = flow / ((Math.PI * diameter * diameter) / 4);
  const velocityHead = (velocity * velocity) / (2 * g);
  // The book's table gradient, 0.806 ft per 100 ft, as a Darcy friction factor at this velocity.
  const f = (0.00806 * diameter) / velocityHead;
  // Fully rough Colebrook–White limit: 1/√f = −2 log10(ε/3.7D) ⇒ ε = 3.7 D 10^(−1/(2√f)).
  const roughness = 3.7 * diameter * 10 ** (-1 / (2 * Math.sqrt(f)));

  function suctionSide() {
    const s = new Sheet();
    s.doc.settings.liquid = {
      kind: 'user',
      name: 'Water at 140 °F (Mackay: SG 0.985, p_v 2.889 psia)',
      table: [{ temperature: 333.15, density, viscosity: 1e-12, vapourPressure }],
    };
    s.doc.settings.temperature = 333.15;
    s.doc.settings.atmosphericPressureOverride = atmosphere;
    // Supply tank: liquid surface 45 ft above the pump centreline (pump at z = 0); no entrance loss.
    s.vessel('A', staticHead, { nozzleZ: 2, entranceK: 0, exitK: 1 });
    // Discharge to a tank of our own; it does not enter the suction-side figures.
    s.vessel('B', 30, { nozzleZ: 29, entranceK: 0.5, exitK: 1 });
    // No NPSHr or efficiency curve: the book gives none, and the check is NPSHa alone.
    s.pump('P', { z: 0, mode: 'duty', dutyFlow: flow, npshrCurve: [], efficiencyCurve: [] });
    // Two flanged gate valves (K = 0.11) and two flanged standard elbows (K = 0.29), as printed.
    const fittings = [
      ['GV1', 'gate-valve', 0.11],
      ['E1', 'elbow-90-standard', 0.29],
      ['E2', 'elbow-90-standard', 0.29],
      ['GV2', 'gate-valve', 0.11],
    ] as const;
    // The first valve sits 1 m up, so no run climbs more than its own length (the book's
    // suction figures do not depend on where along the line the fittings sit).
    for (const [id, type, k] of fittings) {
      s.fitting(id, { fittingType: type, lossMethod: 'fixed', fixedK: k, z: id === 'GV1' ? 1 : 0 });
    }
    // 25 ft of 6-inch pipe in five runs between the tank, the four fittings and the pump.
    const run = { length: suctionLength / 5, diameter, roughness };
    s.pipe('S1', at('A', 'N1'), at('GV1', 'in'), run);
    s.pipe('S2', at('GV1', 'out'), at('E1', 'in'), run);
    s.pipe('S3', at('E1', 'out'), at('E2', 'in'), run);
    s.pipe('S4', at('E2', 'out'), at('GV2', 'in'), run);
    s.pipe('S5', at('GV2', 'out'), at('P', 'suction'), run);
    s.pipe('D', at('P', 'discharge'), at('B', 'N1'), {
      length: 50,
      diameter: 0.1,
      roughness: 4.5e-5,
    });
    return s;
  }

  it("the mapped data reproduce the book's inputs: velocity head 0.222 ft, Ha 34.474 ft, Hvp 6.775 ft, f as chosen", () => {
    const s = suctionSide();
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    expect(r.pumps.P.flow).toBeCloseTo(flow, 12);
    const pipe = r.pipes.S5;
    // Printed to 0.001 ft: ±0.0005 ft.
    expectPrinted(
      'velocity head, ft',
      (pipe.velocity * pipe.velocity) / (2 * g) / FT,
      0.222,
      0.0005,
    );
    expectPrinted('Ha, ft', atmosphere / (r.fluid.density * g) / FT, 34.474, 0.0005);
    expectPrinted('Hvp, ft', r.fluid.vapourPressure / (r.fluid.density * g) / FT, 6.775, 0.0005);
    // The fully rough limit with negligible viscosity gives back the chosen f.
    expect(Math.abs(pipe.frictionFactor - f) / f).toBeLessThan(1e-9);
  });

  it('total suction friction losses 0.378 ft (book rounds the pipe share 0.2015 ft to 0.2)', () => {
    const s = suctionSide();
    const r = solve(s.doc);
    const pipes = ['S1', 'S2', 'S3', 'S4', 'S5'].reduce(
      (sum, id) => sum + r.pipes[id].frictionLoss,
      0,
    );
    const fittings = ['GV1', 'E1', 'E2', 'GV2'].reduce((sum, id) => sum + r.nodes[id].headLoss!, 0);
    expectPrinted('pipe friction, ft (unrounded 0.806 × 25/100)', pipes / FT, 0.2015, 1e-6);
    // Printed 0.049 + 0.129 ft from the printed velocity head 0.222 ft: ±0.001 ft covers the
    // velocity head's own rounding (±0.0005 ft × ΣK = 0.8) and the two printed terms' rounding.
    expectPrinted('valves and elbows, ft', fittings / FT, 0.178, 0.001);
    // Total: the book's 0.2-ft rounding (−0.0015 ft) plus the ±0.001 ft above.
    expectPrinted('total suction friction losses, ft', (pipes + fittings) / FT, 0.378, 0.0025);
  });

  it('NPSHA at the suction flange = 72.321 ft, as printed', () => {
    const s = suctionSide();
    const r = solve(s.doc);
    // The book's NPSHA is Hs + Ha − Hvp − Hf at the impeller centreline; the solver's is
    // (p_abs − p_v)/ρg + V²/2g at the suction flange, the same quantity by the energy equation
    // (the pump sits at z = 0 with its flange on the centreline). Tolerance: 0.0025 ft from the
    // losses (previous test) plus 0.0005 ft for the printed total's last digit.
    expectPrinted('NPSHA, ft', r.pumps.P.npshAvailable / FT, 72.321, 0.003);
    // Nothing stops the solve: the suction is far above vapour pressure. (Without an NPSHr
    // curve the solver adds a note that one is missing.)
    expect(r.findings.filter((x) => x.level === 'stop')).toEqual([]);
  });
});
