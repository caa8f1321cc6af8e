/**
 * The "methods and sources" section of the review sheet: which published methods the solve
 * used and where the liquid data and the NPSH rule come from.
 */
import { defaultSettings } from '../model/defaults';
import type { HeadrouteDocument, LiquidChoice } from '../model/types';
import { findLibraryLiquid } from '../physics/liquids';
import { PIPE_MATERIALS } from '../physics/materials';
import { formatQuantity } from '../units';
import { escapeHtml } from './html';

/** Plain-words sources of one liquid choice (library entry's sources, or the user's table). */
export function liquidSources(choice: LiquidChoice): { name: string; sources: string[] } {
  if (choice.kind === 'user') {
    return {
      name: choice.name,
      sources: ['User-defined property table, interpolated linearly in temperature (as typed).'],
    };
  }
  const lib = findLibraryLiquid(choice.id);
  if (!lib) return { name: choice.id, sources: ['Unknown library liquid.'] };
  const sources = [
    `density: ${lib.density.source}`,
    `viscosity: ${lib.viscosity.source}`,
    `vapour pressure: ${lib.vapourPressure.source}`,
  ];
  if (lib.id === 'water') {
    sources.unshift(
      'Water: IAPWS-IF97 (saturation pressure, region 4; density, region 1) and IAPWS 2008 (viscosity).',
    );
  }
  return { name: lib.name, sources };
}

function liquidChoices(doc: HeadrouteDocument): LiquidChoice[] {
  const all = [doc.settings.liquid, ...Object.values(doc.cases).map((c) => c.overrides.liquid)];
  const seen = new Set<string>();
  const out: LiquidChoice[] = [];
  for (const c of all) {
    if (!c) continue;
    const key = JSON.stringify(c);
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(c);
  }
  return out;
}

/** The methods and sources section body (HTML). */
export function methodsHtml(doc: HeadrouteDocument): string {
  const system = doc.settings.unitSystem;
  const rule = doc.settings.npshMargin;
  const defaults = defaultSettings().npshMargin;
  const isDefault = rule.ratio === defaults.ratio && rule.metres === defaults.metres;
  const metres = formatQuantity(rule.metres, 'head', system);
  const materials = [...new Set(Object.values(doc.pipes).map((p) => p.material))]
    .map((key) => PIPE_MATERIALS[key])
    .filter((m) => m !== undefined);

  const items: string[] = [
    'Network: the global gradient method (Todini and Pilati, 1988) over the whole sheet; vessels and pressure boundaries as fixed heads, flow boundaries as known withdrawals; no reverse flow through pumps and check valves.',
    'Pipe friction: Darcy–Weisbach; Colebrook–White for turbulent flow; 64/Re for laminar flow; a linear bridge across 2000 < Re < 4000, flagged as uncertain.',
    'Fittings: fixed K as typed; the 2-K method (Hooper, 1981); the 3-K method (Darby, 2001); entrance and exit losses at vessel nozzles; reducers, expanders and restriction orifices from their geometry.',
    'Control valves: liquid sizing equations of IEC 60534-2-1 (Kv or Cv, inherent characteristic, choked flow from FL and FF); a valve that chokes is held at its choked flow at the inlet pressure it leaves, and the figures downstream of it are indicative.',
    'Pumps: head, NPSHr and efficiency curves fitted through the given points; other speeds by the affinity laws (Q ∝ N, H ∝ N², NPSHr ∝ N²).',
    'Atmospheric pressure: the ISA standard atmosphere (ISO 2533:1975) at the site elevation, unless a pressure is typed.',
    `NPSH: NPSHa at the suction flange = (p_abs − p_v)/ρg + v²/2g. Rule: NPSHa ≥ ${rule.ratio} × NPSHr and NPSHa − NPSHr ≥ ${metres}. ${
      isDefault
        ? 'These are the default values: common practice, not taken from a named standard.'
        : 'Values set for this project (the default, 1.1 × and 1 m, is common practice).'
    }`,
    'Grade lines: HGL = z + p_gauge/ρg; EGL = HGL + v²/2g; vapour line = z + (p_v − p_atm)/ρg. Where the HGL falls below the vapour line the absolute pressure is under the vapour pressure.',
  ];
  const liquids = liquidChoices(doc).map((choice) => {
    const { name, sources } = liquidSources(choice);
    return `<li><strong>${escapeHtml(name)}</strong><ul>${sources.map((s) => `<li>${escapeHtml(s)}</li>`).join('')}</ul></li>`;
  });
  const roughness = materials.map((m) => `<li>${escapeHtml(`${m.name}: ${m.source}`)}</li>`);
  return [
    `<ul class="methods">${items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`,
    `<h3>Liquid properties</h3>`,
    `<ul class="methods">${liquids.join('')}</ul>`,
    roughness.length ? `<h3>Pipe roughness</h3><ul class="methods">${roughness.join('')}</ul>` : '',
  ].join('\n');
}
