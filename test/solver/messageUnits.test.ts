import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseProjectFile } from '../../src/lib/model/file';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import { messageUnits } from '../../src/lib/solver/findings/messageUnits';
import { profile } from '../../src/lib/solver/profile';
import { defaultRoute } from '../../src/lib/solver/route';
import { routeFindings } from '../../src/lib/solver/routeFindings';
import { solve } from '../../src/lib/solver/solve';

function demo(name: string): HeadrouteDocument {
  const parsed = parseProjectFile(
    readFileSync(join(__dirname, '../../static/examples', name), 'utf8'),
  );
  if (!parsed.ok) throw new Error(`${name} does not parse`);
  return parsed.document;
}

function withSystem(doc: HeadrouteDocument, unitSystem: 'SI' | 'US'): HeadrouteDocument {
  return { ...doc, settings: { ...doc.settings, unitSystem } };
}

describe('numbers in findings messages', () => {
  // Exact factors: 1 ft = 0.3048 m, 1 psi = 6894.757293 Pa, °F = °C × 1.8 + 32
  // (NIST SP 811, 2008, Appendix B.8 and B.9).
  it('US messages convert with the NIST factors', () => {
    const us = messageUnits('US');
    expect(us.pressureAbs(101325)).toBe('14.70 psia');
    expect(us.pressureGauge(-27_800)).toBe('-4.03 psig');
    expect(us.pressureDrop(6894.757293)).toBe('1.00 psi');
    expect(us.ratingGauge(16e5)).toBe('232.1 psig');
    expect(us.head(10.67)).toBe('35.01 ft');
    expect(us.chainage(76.5)).toBe('251.0 ft');
    expect(us.chainageSpan(3.048, 30.48)).toBe('10.0–100.0 ft');
    expect(us.velocity(3.048)).toBe('10.00 ft/s');
    expect(us.temperature(373.15)).toBe('212.0 °F');
  });

  it('SI messages keep kPa, m, m/s, bar(g) and °C', () => {
    const si = messageUnits('SI');
    expect(si.pressureAbs(52_950)).toBe('53.0 kPa');
    expect(si.pressureGauge(-27_800)).toBe('-27.8 kPa(g)');
    expect(si.ratingGauge(16e5)).toBe('16.00 bar(g)');
    expect(si.head(10.674)).toBe('10.67 m');
    expect(si.chainageSpan(3.7, 12)).toBe('3.7–12.0 m');
    expect(si.temperature(368.15)).toBe('95.0 °C');
  });

  it('a project shown in US units gets its findings in US units, with the same codes', () => {
    // Demo 1 raised to 95 °C: the road crossing flashes (stop) and the rack runs under vacuum.
    const base = demo('pump-over-rack.headroute.json');
    const hot = { ...base, settings: { ...base.settings, temperature: 368.15 } };
    const si = solve(withSystem(hot, 'SI'));
    const us = solve(withSystem(hot, 'US'));
    expect(us.findings.map((f) => f.code)).toEqual(si.findings.map((f) => f.code));
    expect(si.findings.some((f) => f.code === 'below-vapour-pressure')).toBe(true);
    for (const f of us.findings) {
      expect(f.message, f.code).not.toMatch(/\bkPa\b|\bbar\b|\d m\b|m\/s|°C/);
    }
    const flash = us.findings.find((f) => f.code === 'below-vapour-pressure')!;
    expect(flash.message).toMatch(/psia is below the vapour pressure [\d.]+ psia/);

    const docUs = withSystem(hot, 'US');
    const route = defaultRoute(docUs, us)!;
    const spans = routeFindings(docUs, us, profile(docUs, us, route));
    expect(spans.length).toBeGreaterThan(0);
    for (const f of spans) expect(f.message).toMatch(/chainage [\d.]+–[\d.]+ ft/);
  });
});
