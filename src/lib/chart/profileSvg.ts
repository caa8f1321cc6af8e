/**
 * The profile as a self-contained SVG document (styles as attributes, text as text, hatching
 * patterns so marked spans read in greyscale print), with a title block and a legend. Used by
 * the app's export and by the CLI's `headroute profile --format svg`.
 */
import type { HeadrouteDocument } from '../model/types';
import type { Profile, SolveResult } from '../solver/types';
import {
  exportMeta,
  metaLines,
  SCREENING_CAUTION,
  type ExportMeta,
  type ExportMetaOptions,
} from './exportMeta';
import { profileGeometry, type ProfileGeometry } from './profileChart';
import { PROFILE_INK, PROFILE_LINES, type ProfileLineKey } from './profileStyle';

/** Size of the drawing and the title-block options. */
export interface ProfileSvgOptions extends ExportMetaOptions {
  width?: number;
  height?: number;
}

const FONT = "'IBM Plex Sans', 'Helvetica Neue', Arial, sans-serif";
const TITLE_HEIGHT = 92;
const LEGEND_HEIGHT = 44;
/** A white outline behind text drawn over lines, so it stays legible. */
const HALO = 'stroke="#ffffff" stroke-width="3" stroke-linejoin="round" paint-order="stroke"';

/** Escapes text for use in XML content and attribute values. */
export function escapeXml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/** Draws the profile of a route as a standalone SVG string. */
export function profileSvg(
  doc: HeadrouteDocument,
  result: SolveResult | null,
  profile: Profile,
  options: ProfileSvgOptions = {},
): string {
  const width = options.width ?? 1200;
  const height = options.height ?? 760;
  const meta = exportMeta(doc, result, profile.route, options);
  const chartHeight = height - TITLE_HEIGHT - LEGEND_HEIGHT;
  const g = profileGeometry(
    profile,
    { width, height: chartHeight },
    { system: meta.system, nodes: doc.nodes, pumps: result?.pumps },
  );
  const body = [
    titleBlock(meta, width),
    `<g transform="translate(0 ${TITLE_HEIGHT})">`,
    chart(g),
    `</g>`,
    legend(width, height - LEGEND_HEIGHT),
  ];
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${escapeXml(FONT)}" font-size="11" fill="${PROFILE_INK.text}">`,
    `<title>${escapeXml(`Profile — ${meta.projectName} — ${meta.routeName}`)}</title>`,
    defs(),
    `<rect width="${width}" height="${height}" fill="#ffffff"/>`,
    ...body,
    `</svg>`,
    '',
  ].join('\n');
}

function defs(): string {
  const { stop, caution } = PROFILE_INK;
  return [
    `<defs>`,
    // Stop: dense cross-hatching; caution: sparse single hatching. Distinct without colour.
    `<pattern id="hr-hatch-stop" patternUnits="userSpaceOnUse" width="6" height="6" patternTransform="rotate(45)">`,
    `<rect width="6" height="6" fill="${stop.soft}"/>`,
    `<path d="M0 0V6M0 0H6" stroke="${stop.ink}" stroke-width="1.2"/>`,
    `</pattern>`,
    `<pattern id="hr-hatch-caution" patternUnits="userSpaceOnUse" width="9" height="9" patternTransform="rotate(-45)">`,
    `<rect width="9" height="9" fill="${caution.soft}"/>`,
    `<path d="M0 0V9" stroke="${caution.ink}" stroke-width="0.9"/>`,
    `</pattern>`,
    `</defs>`,
  ].join('\n');
}

function titleBlock(meta: ExportMeta, width: number): string {
  const [project, ...rest] = metaLines(meta);
  const x = 16;
  return [
    `<g data-part="title-block">`,
    `<rect x="8" y="8" width="${width - 16}" height="${TITLE_HEIGHT - 16}" fill="none" stroke="${PROFILE_INK.frame}"/>`,
    `<text x="${x}" y="30" font-size="16" font-weight="600">${escapeXml(`${project} — profile`)}</text>`,
    `<text x="${x}" y="50" font-size="12">${escapeXml(rest.join('   ·   '))}</text>`,
    `<text x="${x}" y="72" font-size="12" font-style="italic" fill="${PROFILE_INK.stop.ink}" data-part="caution">${escapeXml(SCREENING_CAUTION)}</text>`,
    `</g>`,
  ].join('\n');
}

function lineAttrs(key: ProfileLineKey): string {
  const s = PROFILE_LINES[key];
  return `fill="none" stroke="${s.stroke}" stroke-width="${s.width}"${s.dash ? ` stroke-dasharray="${s.dash}"` : ''} stroke-linejoin="round"`;
}

function chart(g: ProfileGeometry): string {
  const { plot } = g;
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;
  const out: string[] = [];
  const clipRect = `x="${f(plot.left)}" y="${f(plot.top)}" width="${f(plot.width)}" height="${f(plot.height)}"`;
  out.push(`<clipPath id="hr-chart-clip"><rect ${clipRect}/></clipPath>`);
  out.push(`<rect ${clipRect} fill="#ffffff" stroke="${PROFILE_INK.frame}"/>`);

  out.push(`<g data-part="grid" stroke="${PROFILE_INK.grid}" stroke-width="1">`);
  for (const t of g.ticks.y)
    out.push(`<line x1="${f(plot.left)}" x2="${f(right)}" y1="${f(t.px)}" y2="${f(t.px)}"/>`);
  for (const t of g.ticks.x)
    out.push(`<line x1="${f(t.px)}" x2="${f(t.px)}" y1="${f(plot.top)}" y2="${f(bottom)}"/>`);
  out.push(`</g>`);

  out.push(`<g clip-path="url(#hr-chart-clip)">`);
  // Vacuum spans come first in g.spans: each span below vapour pressure is drawn over them,
  // opaque and outlined, with a line at its smallest margin.
  for (const s of g.spans) {
    const stop = s.level === 'stop';
    const fill = stop ? 'url(#hr-hatch-stop)' : 'url(#hr-hatch-caution)';
    const w = s.drawX1 - s.drawX0;
    const edge = stop
      ? ` stroke="${PROFILE_INK.stop.ink}" stroke-width="1.5"`
      : ' fill-opacity="0.7"';
    out.push(
      `<rect data-span="${s.kind}" x="${f(s.drawX0)}" y="${f(plot.top)}" width="${f(w)}" height="${f(plot.height)}" fill="${fill}"${edge}/>`,
    );
    if (stop || w > s.x1 - s.x0) {
      const ink = stop ? PROFILE_INK.stop.ink : PROFILE_INK.caution.ink;
      out.push(
        `<line data-span-mark="${s.kind}" x1="${f(s.markX)}" x2="${f(s.markX)}" y1="${f(plot.top)}" y2="${f(bottom)}" stroke="${ink}" stroke-width="1.5"${stop ? '' : ' stroke-dasharray="4 3"'}/>`,
      );
    }
  }
  out.push(`<path data-line="pipe" d="${g.paths.pipe}" ${lineAttrs('pipe')}/>`);
  // The vapour line over the pipe on a white casing: near boiling the two nearly coincide.
  out.push(
    `<path d="${g.paths.vapour}" fill="none" stroke="#ffffff" stroke-width="4" stroke-opacity="0.85" stroke-linejoin="round"/>`,
  );
  out.push(`<path data-line="vapour" d="${g.paths.vapour}" ${lineAttrs('vapour')}/>`);
  out.push(`<path data-line="egl" d="${g.paths.egl}" ${lineAttrs('egl')}/>`);
  out.push(`<path data-line="hgl" d="${g.paths.hgl}" ${lineAttrs('hgl')}/>`);
  for (const l of g.levels) {
    out.push(
      `<g data-part="level"><line x1="${f(l.x1)}" x2="${f(l.x2)}" y1="${f(l.y)}" y2="${f(l.y)}" ${lineAttrs('level')}/>`,
      `<path d="M${f((l.x1 + l.x2) / 2 - 5)} ${f(l.y - 9)}h10l-5 8z" fill="${PROFILE_LINES.level.stroke}"/></g>`,
    );
  }
  for (const s of g.steps) {
    const mark = s.direction === 'rise' ? 'pump' : 'loss';
    out.push(
      `<circle data-step="${mark}" cx="${f(s.x)}" cy="${f(s.yOut)}" r="2.5" fill="${PROFILE_LINES.hgl.stroke}"/>`,
    );
  }
  for (const n of g.nodes) {
    if (n.kind === 'waypoint') {
      out.push(
        `<rect data-node="waypoint" x="${f(n.x - 3)}" y="${f(n.y - 3)}" width="6" height="6" fill="#ffffff" stroke="${PROFILE_LINES.pipe.stroke}"/>`,
      );
    }
  }
  out.push(`</g>`);

  // Span bars on the axis and span labels above the plot.
  for (const s of g.spans) {
    const ink = s.level === 'stop' ? PROFILE_INK.stop.ink : PROFILE_INK.caution.ink;
    const dash = s.level === 'stop' ? '' : ' stroke-dasharray="5 3"';
    const x0 = clamp(s.drawX0, plot.left, right);
    const x1 = clamp(s.drawX1, plot.left, right);
    if (s.level === 'stop' || s.drawX1 - s.drawX0 > s.x1 - s.x0)
      out.push(
        `<path data-span-marker="${s.kind}" d="M${f(s.markX - 5)} ${f(plot.top - 1)}h10l-5 7z" fill="${ink}"/>`,
      );
    out.push(
      `<line x1="${f(x0)}" x2="${f(Math.max(x1, x0 + 1))}" y1="${f(bottom - 2)}" y2="${f(bottom - 2)}" stroke="${ink}" stroke-width="4"${dash}/>`,
      `<text data-span-label="${s.kind}" ${HALO} x="${f(s.labelX)}" y="${f(s.labelY)}" text-anchor="middle" fill="${ink}" font-weight="${s.level === 'stop' ? 600 : 500}">${escapeXml(s.text)}</text>`,
    );
  }

  for (const n of g.npsh) {
    const ink = n.short ? PROFILE_INK.stop.ink : PROFILE_INK.text;
    out.push(
      `<g data-part="npsh" fill="${ink}" ${HALO}>`,
      `<line x1="${f(n.anchorX)}" y1="${f(n.anchorY)}" x2="${f(n.x + 2)}" y2="${f(n.leaderY)}" stroke="${PROFILE_INK.muted}" stroke-width="0.8"/>`,
      `<text x="${f(n.x)}" y="${f(n.y)}">${escapeXml(n.lines[0])}</text>`,
      `<text x="${f(n.x)}" y="${f(n.y + 13)}">${escapeXml(n.lines[1])}</text>`,
      `</g>`,
    );
  }

  out.push(`<g data-part="axes" fill="${PROFILE_INK.muted}">`);
  for (const t of g.ticks.y)
    out.push(
      `<text x="${f(plot.left - 6)}" y="${f(t.px + 4)}" text-anchor="end">${escapeXml(t.text)}</text>`,
    );
  for (const t of g.ticks.x)
    out.push(
      `<text x="${f(t.px)}" y="${f(bottom + 15)}" text-anchor="middle">${escapeXml(t.text)}</text>`,
    );
  out.push(
    `<text x="${f(plot.left + plot.width / 2)}" y="${f(bottom + 30)}" text-anchor="middle">${escapeXml(g.axisTitles.x)}</text>`,
    `<text transform="translate(14 ${f(plot.top + plot.height / 2)}) rotate(-90)" text-anchor="middle">${escapeXml(g.axisTitles.y)}</text>`,
    `</g>`,
  );

  out.push(`<g data-part="labels" fill="${PROFILE_INK.text}">`);
  // Leaders first, then the texts over them (each text's halo hides leaders passing behind).
  for (const l of g.labels) {
    out.push(
      `<line x1="${f(l.anchorX)}" x2="${f(l.x)}" y1="${f(bottom + 34)}" y2="${f(l.y - 10)}" stroke="${PROFILE_INK.grid}"/>`,
    );
  }
  for (const l of g.labels) {
    out.push(
      `<text data-element="${escapeXml(l.elementId)}" ${HALO} x="${f(l.x)}" y="${f(l.y)}" text-anchor="middle">${escapeXml(l.text)}</text>`,
    );
  }
  out.push(`</g>`);
  return out.join('\n');
}

function legend(width: number, top: number): string {
  const items: string[] = [];
  let x = 16;
  const y = top + 22;
  const lineItem = (key: ProfileLineKey, text: string) => {
    items.push(
      `<line x1="${x}" x2="${x + 28}" y1="${y - 4}" y2="${y - 4}" ${lineAttrs(key)}/>`,
      `<text x="${x + 34}" y="${y}">${escapeXml(text)}</text>`,
    );
    x += 50 + text.length * 6.6;
  };
  const patchItem = (id: string, text: string) => {
    items.push(
      `<rect x="${x}" y="${y - 11}" width="28" height="12" fill="url(#${id})" stroke="${PROFILE_INK.frame}"/>`,
      `<text x="${x + 34}" y="${y}">${escapeXml(text)}</text>`,
    );
    x += 50 + text.length * 6.6;
  };
  lineItem('pipe', 'Pipe centreline');
  lineItem('hgl', 'HGL');
  lineItem('egl', 'EGL');
  lineItem('vapour', 'Vapour line');
  lineItem('level', 'Vessel level');
  patchItem('hr-hatch-stop', 'Stop: below vapour pressure');
  patchItem('hr-hatch-caution', 'Caution: vacuum');
  return [
    `<g data-part="legend">`,
    `<line x1="8" x2="${width - 8}" y1="${top}" y2="${top}" stroke="${PROFILE_INK.grid}"/>`,
    ...items,
    `</g>`,
  ].join('\n');
}

function clamp(v: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, v));
}

/** Pixel coordinates to two decimals, enough for print and short to write. */
function f(v: number): string {
  return Number.isFinite(v) ? String(Math.round(v * 100) / 100) : '0';
}
