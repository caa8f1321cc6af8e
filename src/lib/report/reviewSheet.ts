/**
 * The review sheet: one static HTML document for a design review, readable without scripts and
 * printable in greyscale on A4 or US Letter. Project and case information, the sheet drawing,
 * each stored route's profile, element tables, findings, the cases side by side, the methods
 * and sources, and the caution.
 */
import { surgeSectionHtml } from './surgeSection';
import type { SurgeResult } from '../solver/surge/types';
import { SCREENING_CAUTION } from '../chart/exportMeta';
import { profileSvg } from '../chart/profileSvg';
import type { HeadrouteDocument, Id } from '../model/types';
import { applyCase } from '../solver/applyCase';
import { compareCases, type CaseComparison } from '../solver/compareCases';
import { profile } from '../solver/profile';
import { defaultRoute } from '../solver/route';
import { routeFindings } from '../solver/routeFindings';
import { solve } from '../solver/solve';
import type { Finding, Profile, SolveResult } from '../solver/types';
import { formatQuantity } from '../units';
import { comparisonTableHtml } from './comparisonCells';
import { caseProfiles, envelopeSpansHtml } from './envelopeTable';
import {
  controlValvesTable,
  fittingsTable,
  formatterFor,
  pipesTable,
  pumpsTable,
  vesselsTable,
} from './elementTables';
import { escapeHtml, sectionHtml } from './html';
import { methodsHtml } from './methods';
import { pipeFittingsTable } from './pipeFittingsTable';
import { REVIEW_SHEET_CSS } from './printCss';
import { sheetDrawingSvg } from './sheetDrawing';

/** Options of the review sheet. */
export interface ReviewSheetOptions {
  /** Case whose results fill the drawing, profiles and tables; null or absent: the base case. */
  caseId?: Id | null;
  /** Date printed on the sheet (default: today). */
  date?: Date;
  /** A comparison already computed for this document (saves solving every case again). */
  comparison?: CaseComparison;
  /** A surge run of this document to show with its event (absent: the section says none). */
  surge?: SurgeResult;
}

/** The full caution of the review sheet (the exports' caution line, spelt out). */
export const REVIEW_CAUTION = `${SCREENING_CAUTION} Headroute is a screening and layout tool: check every figure in detailed design against the codes that apply where the plant is built.`;

/** One profile drawn on the sheet: its name and profile, or why it could not be drawn. */
interface DrawnRoute {
  name: string;
  profile: Profile | null;
  problem: string | null;
}

function routesToDraw(doc: HeadrouteDocument, result: SolveResult): DrawnRoute[] {
  const stored = Object.values(doc.routes);
  const wanted: Array<{ name: string; nodes: Id[] }> = stored.map((r) => ({
    name: r.name,
    nodes: r.nodes,
  }));
  if (wanted.length === 0) {
    const route = defaultRoute(doc, result);
    if (route) wanted.push({ name: 'Default route', nodes: route });
  }
  return wanted.map(({ name, nodes }) => {
    try {
      return { name, profile: profile(doc, result, nodes), problem: null };
    } catch (error) {
      const why = error instanceof Error ? error.message : String(error);
      return { name, profile: null, problem: why };
    }
  });
}

/** Inline form of a standalone SVG: no XML declaration, ids made unique with `suffix`. */
function inlineSvg(svg: string, suffix: string): string {
  return svg
    .replace(/^<\?xml[^>]*\?>\s*/, '')
    .replace(/id="(hr-[\w-]+)"/g, `id="$1-${suffix}"`)
    .replace(/url\(#(hr-[\w-]+)\)/g, `url(#$1-${suffix})`);
}

const LEVEL_ORDER = { stop: 0, caution: 1, note: 2 } as const;

function findingsList(
  list: readonly Finding[],
  system: HeadrouteDocument['settings']['unitSystem'],
): string {
  if (list.length === 0) return `<p class="empty">No findings.</p>`;
  const sorted = [...list].sort((a, b) => LEVEL_ORDER[a.level] - LEVEL_ORDER[b.level]);
  const items = sorted.map((f) => {
    // Route findings already say their chainage in the message.
    const where =
      f.chainage === undefined || /chainage/i.test(f.message)
        ? ''
        : ` (chainage ${formatQuantity(f.chainage, 'length', system, { digits: 4 })})`;
    return `<li data-level="${f.level}" data-code="${escapeHtml(f.code)}"><span class="level level-${f.level}">${f.level.toUpperCase()}</span>${escapeHtml(f.message + where)}</li>`;
  });
  return `<ul class="findings">${items.join('\n')}</ul>`;
}

function caseOverridesText(doc: HeadrouteDocument, caseId: Id): string {
  const o = doc.cases[caseId].overrides;
  const system = doc.settings.unitSystem;
  const name = (id: Id) => (Object.hasOwn(doc.nodes, id) ? doc.nodes[id].name : id);
  const parts: string[] = [];
  if (o.liquid) parts.push(`liquid ${o.liquid.kind === 'user' ? o.liquid.name : o.liquid.id}`);
  if (o.temperature !== undefined) {
    parts.push(`temperature ${formatQuantity(o.temperature, 'temperature', system)}`);
  }
  if (o.atmosphericPressure !== undefined) {
    parts.push(`site pressure ${formatQuantity(o.atmosphericPressure, 'pressureAbs', system)}`);
  }
  for (const [id, v] of Object.entries(o.vessels ?? {})) {
    if (v.liquidLevel !== undefined) {
      parts.push(`${name(id)} level ${formatQuantity(v.liquidLevel, 'elevation', system)}`);
    }
    if (v.gasPressureAbs !== undefined) {
      parts.push(`${name(id)} gas ${formatQuantity(v.gasPressureAbs, 'pressureAbs', system)}`);
    }
  }
  for (const [id, v] of Object.entries(o.pumps ?? {})) {
    if (v.running !== undefined) parts.push(`${name(id)} ${v.running ? 'on' : 'off'}`);
    if (v.speed !== undefined) parts.push(`${name(id)} ${Math.round(v.speed)} rpm`);
    if (v.mode === 'duty' || v.dutyFlow !== undefined) {
      const q = v.dutyFlow !== undefined ? formatQuantity(v.dutyFlow, 'volumeFlow', system) : '';
      parts.push(`${name(id)} ${v.mode ?? 'duty'} ${q}`.trim());
    }
  }
  for (const [id, v] of Object.entries(o.controlValves ?? {})) {
    if (v.opening !== undefined) {
      parts.push(`${name(id)} opening ${formatQuantity(v.opening, 'fraction', system)}`);
    }
  }
  for (const [id, v] of Object.entries(o.boundaries ?? {})) {
    if (v.pressureAbs !== undefined) {
      parts.push(`${name(id)} ${formatQuantity(v.pressureAbs, 'pressureAbs', system)}`);
    }
    if (v.outflow !== undefined) {
      parts.push(`${name(id)} outflow ${formatQuantity(v.outflow, 'volumeFlow', system)}`);
    }
  }
  for (const [id, v] of Object.entries(o.valves ?? {})) {
    if (v.closed !== undefined) parts.push(`${name(id)} ${v.closed ? 'shut' : 'open'}`);
  }
  for (const [id, v] of Object.entries(o.junctions ?? {})) {
    if (v.outflow !== undefined) {
      parts.push(`${name(id)} draw-off ${formatQuantity(v.outflow, 'volumeFlow', system)}`);
    }
  }
  return parts.length ? parts.join('; ') : 'no changes from the base case';
}

function projectFacts(
  doc: HeadrouteDocument,
  result: SolveResult,
  caseName: string,
  date: Date,
): string {
  const s = doc.settings;
  const system = s.unitSystem;
  const facts: Array<[string, string]> = [
    ['Project', doc.name],
    ['Date', date.toISOString().slice(0, 10)],
    ['Case shown', caseName],
    [
      'Liquid',
      `${result.fluid.liquidName} at ${formatQuantity(result.fluid.temperature, 'temperature', system)}`,
    ],
    ['Density', formatQuantity(result.fluid.density, 'density', system)],
    ['Viscosity', formatQuantity(result.fluid.viscosity, 'dynamicViscosity', system)],
    ['Vapour pressure', formatQuantity(result.fluid.vapourPressure, 'pressureAbs', system)],
    [
      'Site',
      `elevation ${formatQuantity(s.siteElevation, 'elevation', system)}; atmospheric pressure ${formatQuantity(result.fluid.atmosphericPressure, 'pressureAbs', system)}`,
    ],
    ['Units', system === 'SI' ? 'SI (metric)' : 'US customary'],
    [
      'Solve',
      `${result.converged ? 'converged' : 'NOT converged'} in ${result.iterations} iterations`,
    ],
  ];
  const rows = facts.map(([k, v]) => `<dt>${escapeHtml(k)}</dt><dd>${escapeHtml(v)}</dd>`);
  const cases = Object.values(doc.cases).map(
    (c) =>
      `<li><strong>${escapeHtml(c.name)}</strong>: ${escapeHtml(caseOverridesText(doc, c.id))}</li>`,
  );
  return [
    `<dl class="facts">${rows.join('')}</dl>`,
    `<h3>Cases</h3>`,
    `<ul><li><strong>Base case</strong>: the project as drawn</li>${cases.join('')}</ul>`,
  ].join('\n');
}

/**
 * The review sheet of `doc` as a complete HTML document (inline CSS and SVG, no scripts).
 * Pure: solves the document (and every case for the comparison) but never changes it. All
 * text from the document is escaped.
 */
export function reviewSheetHtml(doc: HeadrouteDocument, options: ReviewSheetOptions = {}): string {
  const caseId = options.caseId ?? null;
  const date = options.date ?? new Date();
  const known = caseId !== null && Object.hasOwn(doc.cases, caseId);
  const comparison = options.comparison ?? compareCases(doc);
  const shown = comparison.cases.find((c) => c.caseId === (known ? caseId : null));
  const result = shown?.result ?? solve(doc, known ? caseId : null);
  const caseName = known ? doc.cases[caseId!].name : 'Base case';
  const working = applyCase(doc, known ? caseId : null);
  const system = doc.settings.unitSystem;
  const fmt = formatterFor(system);

  const routes = routesToDraw(doc, result);
  const figures = routes.map((r, i) => {
    if (!r.profile) {
      return `<p class="empty">${escapeHtml(`${r.name}: no profile (${r.problem})`)}</p>`;
    }
    const svg = profileSvg(doc, result, r.profile, {
      routeName: r.name,
      date,
      width: 1100,
      height: 700,
    });
    return `<figure data-route="${escapeHtml(r.name)}">${inlineSvg(svg, `r${i + 1}`)}<figcaption>${escapeHtml(`Profile ${i + 1}: ${r.name} — ${caseName}`)}</figcaption></figure>`;
  });

  const envelopes =
    comparison.cases.length > 1
      ? routes
          .filter((r) => r.profile)
          .map((r) =>
            envelopeSpansHtml(r.name, caseProfiles(doc, comparison, r.profile!.route), system),
          )
      : [];

  const routeLists = routes
    .filter((r) => r.profile)
    .map((r) => {
      const list = routeFindings(doc, result, r.profile!, r.name);
      return list.length
        ? `<h3>${escapeHtml(`Along ${r.name}`)}</h3>${findingsList(list, system)}`
        : '';
    });
  const otherCases = comparison.cases
    .filter((c) => c !== shown)
    .map((c) => {
      const serious = c.result.findings.filter((f) => f.level !== 'note');
      return `<h3>${escapeHtml(`In case “${c.name}” (stop and caution)`)}</h3>${findingsList(serious, system)}`;
    });

  const title = `Review sheet — ${doc.name}`;
  const body = [
    `<header><h1>${escapeHtml(title)}</h1>`,
    `<p class="caution" data-part="caution">${escapeHtml(REVIEW_CAUTION)}</p></header>`,
    sectionHtml('project', 'Project and cases', projectFacts(doc, result, caseName, date)),
    sectionHtml(
      'sheet',
      'Sheet',
      `<figure>${sheetDrawingSvg(working, result)}<figcaption>${escapeHtml(`Sheet drawing (plan positions, schematic) with flows in ${caseName}`)}</figcaption></figure>`,
    ),
    sectionHtml(
      'profiles',
      'Profiles',
      figures.length
        ? [...figures, ...envelopes].join('\n')
        : '<p class="empty">No route joins two vessels or boundaries.</p>',
    ),
    sectionHtml(
      'findings',
      'Findings',
      [
        `<h3>${escapeHtml(`On the sheet — ${caseName}`)}</h3>`,
        findingsList(result.findings, system),
        ...routeLists,
        ...otherCases,
      ].join('\n'),
    ),
    sectionHtml('surge', 'Surge screening', surgeSectionHtml(doc, options.surge, system)),
    sectionHtml('comparison', 'Cases compared', comparisonTableHtml(comparison, system)),
    sectionHtml(
      'elements',
      `Elements — ${caseName}`,
      [
        pipesTable(working, result, fmt),
        pipeFittingsTable(working, result, fmt),
        fittingsTable(working, result, fmt),
        controlValvesTable(working, result, fmt),
        pumpsTable(working, result, fmt),
        vesselsTable(working, result, fmt),
      ].join('\n'),
    ),
    sectionHtml('methods', 'Methods and sources', methodsHtml(doc)),
    `<footer><p class="caution">${escapeHtml(REVIEW_CAUTION)}</p><p>${escapeHtml(`Made with Headroute on ${date.toISOString().slice(0, 10)}.`)}</p></footer>`,
  ];
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escapeHtml(title)}</title>`,
    `<style>${REVIEW_SHEET_CSS}</style>`,
    '</head>',
    '<body>',
    ...body,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
