/**
 * The demo projects shipped in static/examples. They are invented scenarios with realistic
 * values, all SI in the files, and they load through `parseProjectFile` exactly like a user's
 * file. Values were chosen by hand calculation (Darcy–Weisbach with Colebrook–White friction,
 * fitting K values of the Crane kind, water properties from IAPWS-IF97) so each pump runs near its
 * best-efficiency flow:
 *
 * - pump-over-rack: 29.4 m³/h at 22.1 m against 7 m static (vented receiver level 10 m − tank
 *   level 3 m), about 4.9 m friction and fittings in 96.5 m of 3" line, 0.2 m on the 4" suction
 *   and 10.8 m across FV-101 (Kv 100 equal-percentage at 68 % → Kv 28.6), which throttles at the
 *   pump; BEP of P-101 is 30 m³/h. NPSHa about 10.7 m. Past the valve nothing holds the rack up:
 *   it runs under vacuum (down to −28 kPa(g) at the +14 m road crossing, a caution) and the
 *   crossing is the first point to flash as the temperature rises (from about 91 °C).
 * - siphon-over-bund: 4 m level difference drives about 61 m³/h through 50 m of HDPE (90 mm
 *   bore), the intake 0.3 m above the pond bottom so the drawn-down case keeps it covered; the
 *   crest at +5 m sits about 6.2 m below atmospheric pressure (about 40 kPa abs), well above
 *   the 2.3 kPa vapour pressure of water at 20 °C.
 * - branched-with-recirculation: P-301 gives about 45 m³/h at 32 m (BEP 45 m³/h): 20.2 m³/h to
 *   V-302, 18.6 m³/h to V-303 (its top inlet at 5.5 m discharges into the gas space above the
 *   liquid at 4 m) and 6.3 m³/h back through RO-301 (12 mm bore in 1-1/2", permanent loss
 *   K ≈ 320 by ISO 5167-2 eq. (5) with C = 0.61).
 * - pump-trip-over-rack: water at 20 °C, P-401 gives about 30.8 m³/h at 19.2 m (BEP 30 m³/h)
 *   from a feed tank at level 2.5 m into a head tank at 15 m through 147 m of 3" over a rack
 *   whose high point (+17 m) holds only about 6 kPa(g) in steady flow. A trip of P-401 (Joukowsky
 *   a·Δv/g ≈ 252 m against ≈ 19 m of pump head) pulls the rack down to vapour pressure and the
 *   column parts from the riser top along the rack (see `headroute surge … --trip P1`).
 */
import type { ParseResult } from './file/parse';
import { parseProjectFile } from './file/parse';

/** One demo project. */
export interface ExampleProject {
  /** File name under static/examples (served at /examples/<file>). */
  file: string;
  title: string;
  summary: string;
}

/** The demo projects, the first one opened at a first visit. */
export const EXAMPLES: readonly ExampleProject[] = [
  {
    file: 'pump-over-rack.headroute.json',
    title: 'Pump over a pipe rack',
    summary:
      'Warm water (60 °C) pumped from a ground-level tank over a pipe rack (high point +14 m at a road crossing) into a vented receiver; the control valve at the pump leaves the rack under vacuum.',
  },
  {
    file: 'siphon-over-bund.headroute.json',
    title: 'Siphon over a bund wall',
    summary:
      'A gravity siphon in HDPE from a pond over a +5 m bund crest into a basin 4 m lower; the crest runs under vacuum.',
  },
  {
    file: 'branched-with-recirculation.headroute.json',
    title: 'Branched feed with minimum-flow return',
    summary:
      'One pump feeding an elevated head tank and a pressurised receiver through a header, with a minimum-flow line back to the source through a restriction orifice.',
  },
  {
    file: 'pump-trip-over-rack.headroute.json',
    title: 'Pump trip over a rack high point',
    summary:
      'Water pumped over a +17 m rack high point into a head tank; the surge panel shows what a pump trip or a fast valve closure does: the column parts along the rack after a trip.',
  },
];

/** Path of a demo project relative to the site root (prefix with the app's base path). */
export function exampleUrl(example: ExampleProject, base = ''): string {
  return `${base}/examples/${example.file}`;
}

/**
 * Fetch a demo project and read it through the same validated path as a user's file. Network
 * failures come back as messages, like any other unreadable file.
 */
export async function loadExample(
  example: ExampleProject,
  fetchText: (url: string) => Promise<string> = async (url) => {
    const response = await fetch(url);
    if (!response.ok) throw new Error(`HTTP ${response.status}`);
    return response.text();
  },
  base = '',
): Promise<ParseResult> {
  let text: string;
  try {
    text = await fetchText(exampleUrl(example, base));
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    return {
      ok: false,
      errors: [
        { path: '$', message: `The demo project "${example.title}" could not be loaded (${why}).` },
      ],
    };
  }
  return parseProjectFile(text);
}
