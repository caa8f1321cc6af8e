/**
 * The surge envelope and the time plot as standalone SVG strings, and the envelope as CSV:
 * shared by the app (drawn and exported) and the CLI. Plain string building, no DOM.
 *
 * Envelope chart: chainage across, head up; the pipe centreline, the vapour line, the steady
 * HGL, the band between the lowest and highest HGL of the event, and a mark at every section
 * where the column parted (its size grows with the cavity's largest volume).
 */
import { SCREENING_CAUTION } from './exportMeta';
import type { SurgeResult } from '../solver/surge/types';

/** Options of the charts. */
export interface SurgeChartOptions {
  width?: number;
  height?: number;
  /** Title line (project, route, event). */
  title?: string;
}

/** Colours of the surge charts (our own). */
export const SURGE_COLOURS = {
  pipe: '#5b5b5b',
  vapour: '#b23a48',
  steady: '#1f5f99',
  max: '#d17a00',
  min: '#6a3d9a',
  band: 'rgba(209, 122, 0, 0.12)',
  cavity: '#b23a48',
  grid: '#e2e2e2',
  text: '#222',
} as const;

const M = { left: 64, right: 20, top: 46, bottom: 64 };

function esc(s: string): string {
  return s
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;');
}

function niceTicks(lo: number, hi: number, count: number): number[] {
  const span = hi - lo || 1;
  const raw = span / count;
  const mag = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => span / s <= count) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + 1e-9; v += step)
    out.push(Number(v.toPrecision(12)));
  return out;
}

interface Frame {
  x: (v: number) => number;
  y: (v: number) => number;
  svg: string[];
}

function frame(
  xs: [number, number],
  ys: [number, number],
  width: number,
  height: number,
  labels: { x: string; y: string; title: string },
): Frame {
  const [x0, x1] = xs;
  const pad = (ys[1] - ys[0]) * 0.05 || 1;
  const y0 = ys[0] - pad;
  const y1 = ys[1] + pad;
  const w = width - M.left - M.right;
  const h = height - M.top - M.bottom;
  const x = (v: number) => M.left + ((v - x0) / (x1 - x0 || 1)) * w;
  const y = (v: number) => M.top + h - ((v - y0) / (y1 - y0 || 1)) * h;
  const svg: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="sans-serif" font-size="12">`,
    `<rect width="${width}" height="${height}" fill="#fff"/>`,
    `<text x="${M.left}" y="20" font-size="14" fill="${SURGE_COLOURS.text}">${esc(labels.title)}</text>`,
  ];
  for (const t of niceTicks(x0, x1, 10)) {
    svg.push(
      `<line x1="${x(t).toFixed(1)}" x2="${x(t).toFixed(1)}" y1="${M.top}" y2="${M.top + h}" stroke="${SURGE_COLOURS.grid}"/>`,
    );
    svg.push(`<text x="${x(t).toFixed(1)}" y="${M.top + h + 16}" text-anchor="middle">${t}</text>`);
  }
  for (const t of niceTicks(y0, y1, 8)) {
    svg.push(
      `<line x1="${M.left}" x2="${M.left + w}" y1="${y(t).toFixed(1)}" y2="${y(t).toFixed(1)}" stroke="${SURGE_COLOURS.grid}"/>`,
    );
    svg.push(`<text x="${M.left - 6}" y="${(y(t) + 4).toFixed(1)}" text-anchor="end">${t}</text>`);
  }
  svg.push(
    `<text x="${M.left + w / 2}" y="${M.top + h + 34}" text-anchor="middle">${esc(labels.x)}</text>`,
  );
  svg.push(
    `<text transform="translate(16 ${M.top + h / 2}) rotate(-90)" text-anchor="middle">${esc(labels.y)}</text>`,
  );
  svg.push(
    `<text x="${M.left}" y="${height - 10}" font-size="10" fill="#555">${esc(SCREENING_CAUTION)}</text>`,
  );
  return { x, y, svg };
}

function path(f: Frame, xs: readonly number[], ys: readonly number[]): string {
  return xs.map((v, i) => `${i ? 'L' : 'M'}${f.x(v).toFixed(1)},${f.y(ys[i]).toFixed(1)}`).join('');
}

function legend(f: Frame, width: number, items: Array<[string, string, string?]>): void {
  let x = width - M.right - items.length * 120;
  for (const [label, colour, dash] of items) {
    f.svg.push(
      `<line x1="${x}" x2="${x + 22}" y1="34" y2="34" stroke="${colour}" stroke-width="2"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`,
    );
    f.svg.push(`<text x="${x + 26}" y="38">${esc(label)}</text>`);
    x += 120;
  }
}

/** The envelope chart of a surge run (SI: m). Empty chart with its findings' count if not ok. */
export function surgeEnvelopeSvg(run: SurgeResult, options: SurgeChartOptions = {}): string {
  const width = options.width ?? 1200;
  const height = options.height ?? 560;
  const e = run.envelope;
  const title = options.title ?? 'Surge envelope';
  if (!run.ok || e.length === 0) {
    const f = frame([0, 1], [0, 1], width, height, {
      x: 'chainage (m)',
      y: 'head (m)',
      title: `${title} — not run (see findings)`,
    });
    return [...f.svg, '</svg>'].join('\n');
  }
  const xs = e.map((p) => p.chainage);
  const all = e.flatMap((p) => [p.elevation, p.hglMax, p.hglMin, p.vapourLine, p.hglSteady]);
  const f = frame([xs[0], xs[xs.length - 1]], [Math.min(...all), Math.max(...all)], width, height, {
    x: 'chainage (m)',
    y: 'head above datum (m)',
    title,
  });
  const band = `${path(
    f,
    xs,
    e.map((p) => p.hglMax),
  )}${[...e]
    .reverse()
    .map((p) => `L${f.x(p.chainage).toFixed(1)},${f.y(p.hglMin).toFixed(1)}`)
    .join('')}Z`;
  f.svg.push(`<path d="${band}" fill="${SURGE_COLOURS.band}" stroke="none"/>`);
  f.svg.push(
    `<path d="${path(
      f,
      xs,
      e.map((p) => p.elevation),
    )}" fill="none" stroke="${SURGE_COLOURS.pipe}" stroke-width="3"/>`,
  );
  f.svg.push(
    `<path d="${path(
      f,
      xs,
      e.map((p) => p.vapourLine),
    )}" fill="none" stroke="${SURGE_COLOURS.vapour}" stroke-dasharray="6 4"/>`,
  );
  f.svg.push(
    `<path d="${path(
      f,
      xs,
      e.map((p) => p.hglSteady),
    )}" fill="none" stroke="${SURGE_COLOURS.steady}" stroke-width="2"/>`,
  );
  f.svg.push(
    `<path d="${path(
      f,
      xs,
      e.map((p) => p.hglMax),
    )}" fill="none" stroke="${SURGE_COLOURS.max}" stroke-width="1.5"/>`,
  );
  f.svg.push(
    `<path d="${path(
      f,
      xs,
      e.map((p) => p.hglMin),
    )}" fill="none" stroke="${SURGE_COLOURS.min}" stroke-width="1.5"/>`,
  );
  const biggest = Math.max(...run.cavities.map((c) => c.maxVolume), 0);
  for (const c of run.cavities) {
    const p = e[c.section];
    if (!p || biggest <= 0) continue;
    const r = 2 + 6 * Math.sqrt(c.maxVolume / biggest);
    f.svg.push(
      `<circle cx="${f.x(c.chainage).toFixed(1)}" cy="${f.y(p.elevation).toFixed(1)}" r="${r.toFixed(1)}" fill="${SURGE_COLOURS.cavity}" fill-opacity="0.6"><title>cavity ${(c.maxVolume * 1000).toPrecision(3)} L, open ${c.duration.toFixed(2)} s</title></circle>`,
    );
  }
  legend(f, width, [
    ['pipe', SURGE_COLOURS.pipe],
    ['vapour line', SURGE_COLOURS.vapour, '6 4'],
    ['steady HGL', SURGE_COLOURS.steady],
    ['max HGL', SURGE_COLOURS.max],
    ['min HGL', SURGE_COLOURS.min],
    ['cavity', SURGE_COLOURS.cavity],
  ]);
  f.svg.push('</svg>');
  return f.svg.join('\n');
}

/** Head (with the vapour line) or flow (m³/h) against time at one traced section. */
export function surgeTimeSvg(
  run: SurgeResult,
  trace: number,
  options: SurgeChartOptions & { quantity?: 'head' | 'flow' } = {},
): string {
  const width = options.width ?? 900;
  const height = options.height ?? 360;
  const quantity = options.quantity ?? 'head';
  const t = run.traces[trace];
  const title = options.title ?? (quantity === 'head' ? 'Head against time' : 'Flow against time');
  const yLabel = quantity === 'head' ? 'HGL (m)' : 'flow (m³/h)';
  if (!run.ok || !t) {
    const f = frame([0, 1], [0, 1], width, height, {
      x: 'time (s)',
      y: yLabel,
      title: `${title} — not run`,
    });
    return [...f.svg, '</svg>'].join('\n');
  }
  const end = run.times[run.times.length - 1] || 1;
  const values = quantity === 'head' ? t.head : t.flow.map((q) => q * 3600);
  const point = run.envelope.find((p) => p.chainage === t.chainage);
  const vap = quantity === 'head' ? (point?.vapourLine ?? Math.min(...values)) : 0;
  const f = frame([0, end], [Math.min(...values, vap), Math.max(...values, vap)], width, height, {
    x: 'time (s)',
    y: yLabel,
    title,
  });
  const refColour = quantity === 'head' ? SURGE_COLOURS.vapour : SURGE_COLOURS.grid;
  f.svg.push(
    `<path d="${path(f, [0, end], [vap, vap])}" fill="none" stroke="${refColour}" stroke-dasharray="6 4"/>`,
  );
  f.svg.push(
    `<path d="${path(f, run.times, values)}" fill="none" stroke="${SURGE_COLOURS.steady}" stroke-width="1.5"/>`,
  );
  legend(
    f,
    width,
    quantity === 'head'
      ? [
          ['HGL', SURGE_COLOURS.steady],
          ['vapour line', SURGE_COLOURS.vapour, '6 4'],
        ]
      : [['flow', SURGE_COLOURS.steady]],
  );
  f.svg.push('</svg>');
  return f.svg.join('\n');
}

/** The envelope as CSV, SI, one row per computing section; the caution on the first line. */
export function surgeEnvelopeCsv(run: SurgeResult, title = ''): string {
  const rows = [
    `# ${SCREENING_CAUTION}`,
    ...(title ? [`# ${title}`] : []),
    'chainage (m),elevation (m),HGL steady (m),HGL max (m),HGL min (m),vapour line (m),pipe,cavity max volume (m3),cavity open (s)',
  ];
  const cav = new Map(run.cavities.map((c) => [c.section, c]));
  for (const [i, p] of run.envelope.entries()) {
    const c = cav.get(i);
    const n = (v: number) => (Number.isFinite(v) ? v.toFixed(4) : '');
    rows.push(
      [
        n(p.chainage),
        n(p.elevation),
        n(p.hglSteady),
        n(p.hglMax),
        n(p.hglMin),
        n(p.vapourLine),
        p.elementId,
        c ? c.maxVolume.toExponential(4) : '0',
        c ? c.duration.toFixed(4) : '0',
      ].join(','),
    );
  }
  return rows.join('\n') + '\n';
}
