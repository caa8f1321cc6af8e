/**
 * A plain schematic of the sheet for the review sheet: nodes at their plan positions drawn as
 * simple outline shapes, pipes as straight lines between their port positions, and names as
 * text. Black on white, so it prints in greyscale; it is not the app's symbol set.
 */
import type { HeadrouteDocument, SheetNode } from '../model/types';
import { portPosition, VESSEL_HEIGHT, VESSEL_WIDTH } from '../model/ports';
import type { SolveResult } from '../solver/types';
import { formatQuantity } from '../units';
import { escapeHtml } from './html';

const PAD = 60;
const INK = '#111111';
const MUTED = '#555555';

/** Pixel value to two decimals. */
function f(v: number): string {
  return Number.isFinite(v) ? String(Math.round(v * 100) / 100) : '0';
}

function bounds(doc: HeadrouteDocument) {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  for (const n of Object.values(doc.nodes)) {
    const hw = n.kind === 'vessel' ? VESSEL_WIDTH / 2 : 32;
    const hh = n.kind === 'vessel' ? VESSEL_HEIGHT / 2 : 24;
    x0 = Math.min(x0, n.x - hw);
    x1 = Math.max(x1, n.x + hw);
    y0 = Math.min(y0, n.y - hh);
    y1 = Math.max(y1, n.y + hh + 18); // room for the name below
  }
  if (!Number.isFinite(x0)) return { x0: 0, y0: 0, x1: 400, y1: 200 };
  return { x0, y0, x1, y1 };
}

function bowtie(x: number, y: number, line: string): string {
  return `<path d="M${f(x - 13)} ${f(y - 9)}L${f(x + 13)} ${f(y + 9)}V${f(y - 9)}L${f(x - 13)} ${f(y + 9)}Z" ${line}/>`;
}

/** Simple outline of a fitting by its type: valves as bow-ties, elbows as corners, etc. */
function fittingShape(n: Extract<SheetNode, { kind: 'fitting' }>, line: string): string {
  const { x, y } = n;
  const stroke = `fill="none" stroke="${INK}" stroke-width="1.5"`;
  const shut = n.closed
    ? `<line x1="${f(x)}" x2="${f(x)}" y1="${f(y - 13)}" y2="${f(y + 13)}" stroke="${INK}" stroke-width="2.2"/>`
    : '';
  switch (n.fittingType) {
    case 'elbow-90-standard':
    case 'elbow-90-long-radius':
    case 'elbow-45-standard':
    case 'elbow-45-long-radius':
      return `<path d="M${f(x - 10)} ${f(y)}H${f(x)}V${f(y - 10)}" ${stroke}/>`;
    case 'tee-run':
    case 'tee-branch':
      return `<path d="M${f(x - 10)} ${f(y)}H${f(x + 10)}M${f(x)} ${f(y)}V${f(y - 10)}" ${stroke}/>`;
    case 'swing-check-valve':
    case 'lift-check-valve':
      return (
        bowtie(x, y, line) +
        `<line x1="${f(x + 13)}" x2="${f(x + 13)}" y1="${f(y - 12)}" y2="${f(y + 12)}" stroke="${INK}" stroke-width="2"/>` +
        shut
      );
    case 'strainer':
      return `<rect x="${f(x - 10)}" y="${f(y - 10)}" width="20" height="20" ${line}/><path d="M${f(x - 10)} ${f(y + 10)}L${f(x + 10)} ${f(y - 10)}" ${stroke}/>`;
    case 'flow-meter':
      return `<circle cx="${f(x)}" cy="${f(y)}" r="11" ${line}/><text x="${f(x)}" y="${f(y + 3.5)}" text-anchor="middle" font-size="9" font-weight="700">FM</text>`;
    case 'reducer':
      return `<path d="M${f(x - 10)} ${f(y - 10)}L${f(x + 10)} ${f(y - 5)}V${f(y + 5)}L${f(x - 10)} ${f(y + 10)}Z" ${line}/>`;
    case 'expander':
      return `<path d="M${f(x - 10)} ${f(y - 5)}L${f(x + 10)} ${f(y - 10)}V${f(y + 10)}L${f(x - 10)} ${f(y + 5)}Z" ${line}/>`;
    case 'restriction-orifice':
      return `<path d="M${f(x - 3)} ${f(y - 12)}V${f(y + 12)}M${f(x + 3)} ${f(y - 12)}V${f(y + 12)}" ${stroke}/>`;
    default:
      return bowtie(x, y, line) + shut;
  }
}

/** Outward direction of a port along x (+1 right, −1 left, 0 centre). */
function portSide(node: SheetNode, port: string): number {
  const dx = portPosition(node, port).x - node.x;
  return Math.abs(dx) < 1e-9 ? 0 : Math.sign(dx);
}

/**
 * A pipe drawn orthogonally: a short lead out of each port, then horizontal, vertical,
 * horizontal through the middle.
 */
function pipePoints(a: SheetNode, portA: string, b: SheetNode, portB: string) {
  const p = portPosition(a, portA);
  const q = portPosition(b, portB);
  const lead = 12;
  const p1 = { x: p.x + portSide(a, portA) * lead, y: p.y };
  const q1 = { x: q.x + portSide(b, portB) * lead, y: q.y };
  const mx = (p1.x + q1.x) / 2;
  return [p, p1, { x: mx, y: p1.y }, { x: mx, y: q1.y }, q1, q];
}

/** The outline shape of one node, centred on its plan position. */
function shape(n: SheetNode): string {
  const { x, y } = n;
  const line = `fill="#ffffff" stroke="${INK}" stroke-width="1.5"`;
  switch (n.kind) {
    case 'vessel': {
      const w = VESSEL_WIDTH;
      const h = VESSEL_HEIGHT;
      const dash = n.open ? ' stroke-dasharray="6 4"' : '';
      // Open vessels: dashed roof line; closed: solid. The liquid level as a line with a mark.
      const frac = n.height > 0 ? Math.min(1, Math.max(0, (n.liquidLevel - n.z) / n.height)) : 0;
      const ly = y + h / 2 - frac * h;
      return [
        `<path d="M${f(x - w / 2)} ${f(y - h / 2)}V${f(y + h / 2)}H${f(x + w / 2)}V${f(y - h / 2)}" ${line}/>`,
        `<line x1="${f(x - w / 2)}" x2="${f(x + w / 2)}" y1="${f(y - h / 2)}" y2="${f(y - h / 2)}" stroke="${INK}" stroke-width="1.5"${dash}/>`,
        `<line x1="${f(x - w / 2 + 4)}" x2="${f(x + w / 2 - 4)}" y1="${f(ly)}" y2="${f(ly)}" stroke="${MUTED}" stroke-width="1"/>`,
        `<path d="M${f(x - 5)} ${f(ly - 8)}h10l-5 7z" fill="${MUTED}"/>`,
      ].join('');
    }
    case 'pump':
      return (
        `<circle cx="${f(x)}" cy="${f(y)}" r="17" ${line}/>` +
        `<path d="M${f(x - 8)} ${f(y - 12)}L${f(x + 14)} ${f(y)}L${f(x - 8)} ${f(y + 12)}" fill="none" stroke="${INK}" stroke-width="1.2"/>`
      );
    case 'control-valve':
      return (
        bowtie(x, y, line) +
        `<line x1="${f(x)}" x2="${f(x)}" y1="${f(y)}" y2="${f(y - 18)}" stroke="${INK}" stroke-width="1.2"/>` +
        `<path d="M${f(x - 8)} ${f(y - 18)}a8 8 0 0 1 16 0z" ${line}/>`
      );
    case 'fitting':
      return fittingShape(n, line);
    case 'waypoint':
      return `<path d="M${f(x)} ${f(y - 6)}L${f(x + 6)} ${f(y)}L${f(x)} ${f(y + 6)}L${f(x - 6)} ${f(y)}Z" ${line}/>`;
    case 'junction':
      return `<circle cx="${f(x)}" cy="${f(y)}" r="4" fill="${INK}"/>`;
    case 'boundary':
      return `<rect x="${f(x - 10)}" y="${f(y - 10)}" width="20" height="20" ${line}/><text x="${f(x)}" y="${f(y + 4)}" text-anchor="middle" font-size="11" font-weight="700">${n.holds === 'flow' ? 'Q' : 'P'}</text>`;
  }
}

function labelY(n: SheetNode): number {
  if (n.kind === 'vessel') return n.y + VESSEL_HEIGHT / 2 + 14;
  if (n.kind === 'junction' || n.kind === 'waypoint') return n.y + 18;
  return n.y + 30;
}

/**
 * The sheet as an SVG fragment (an `<svg>` element, no XML declaration) for inline use. With
 * a result, each pipe carries its flow as a small label in the project's unit system.
 */
export function sheetDrawingSvg(doc: HeadrouteDocument, result: SolveResult | null): string {
  const b = bounds(doc);
  const x0 = b.x0 - PAD;
  const y0 = b.y0 - PAD;
  const w = Math.max(200, b.x1 - b.x0 + 2 * PAD);
  const h = Math.max(120, b.y1 - b.y0 + 2 * PAD);
  const system = doc.settings.unitSystem;
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${f(x0)} ${f(y0)} ${f(w)} ${f(h)}" width="${f(w)}" height="${f(h)}" font-family="'IBM Plex Sans', Arial, sans-serif" font-size="12" fill="${INK}" role="img" aria-label="${escapeHtml(`Sheet of ${doc.name}`)}">`,
    `<rect x="${f(x0)}" y="${f(y0)}" width="${f(w)}" height="${f(h)}" fill="#ffffff"/>`,
    `<g data-part="pipes">`,
  ];
  for (const pipe of Object.values(doc.pipes)) {
    const a = Object.hasOwn(doc.nodes, pipe.from.node) ? doc.nodes[pipe.from.node] : undefined;
    const z = Object.hasOwn(doc.nodes, pipe.to.node) ? doc.nodes[pipe.to.node] : undefined;
    if (!a || !z) continue;
    const points = pipePoints(a, pipe.from.port, z, pipe.to.port);
    const flow = result?.pipes[pipe.id]?.flow;
    // Label and arrow on the longest segment; the label only where it has room.
    let k = 1;
    for (let i = 2; i < points.length; i++) {
      const len = (j: number) =>
        Math.hypot(points[j].x - points[j - 1].x, points[j].y - points[j - 1].y);
      if (len(i) > len(k)) k = i;
    }
    const [s0, s1] = [points[k - 1], points[k]];
    const span = Math.hypot(s1.x - s0.x, s1.y - s0.y);
    const mx = (s0.x + s1.x) / 2;
    const my = (s0.y + s1.y) / 2;
    const reverse = flow !== undefined && flow < 0;
    const angle = (Math.atan2(s1.y - s0.y, s1.x - s0.x) * 180) / Math.PI + (reverse ? 180 : 0);
    const text =
      flow === undefined
        ? pipe.name
        : `${pipe.name} · ${formatQuantity(Math.abs(flow), 'volumeFlow', system, { digits: 3 })}`;
    const fits = span > text.length * 5.6;
    const vertical = Math.abs(s1.x - s0.x) < 1e-9;
    const label = !fits
      ? ''
      : vertical
        ? `<text x="${f(mx - 6)}" y="${f(my)}" text-anchor="middle" font-size="10" fill="${MUTED}" transform="rotate(-90 ${f(mx - 6)} ${f(my)})">${escapeHtml(text)}</text>`
        : `<text x="${f(mx)}" y="${f(my - 7)}" text-anchor="middle" font-size="10" fill="${MUTED}">${escapeHtml(text)}</text>`;
    out.push(
      `<g data-pipe="${escapeHtml(pipe.id)}">`,
      `<polyline points="${points.map((pt) => `${f(pt.x)},${f(pt.y)}`).join(' ')}" fill="none" stroke="${INK}" stroke-width="1.6" stroke-linejoin="round"/>`,
      `<path d="M-6 -4L2 0L-6 4Z" fill="${INK}" transform="translate(${f(mx)} ${f(my)}) rotate(${f(angle)})"/>`,
      label,
      `</g>`,
    );
  }
  out.push(`</g>`, `<g data-part="nodes">`);
  for (const n of Object.values(doc.nodes)) {
    out.push(
      `<g data-node="${escapeHtml(n.id)}">`,
      shape(n),
      `<text x="${f(n.x)}" y="${f(labelY(n))}" text-anchor="middle" font-weight="600">${escapeHtml(n.name || n.id)}</text>`,
      `</g>`,
    );
  }
  out.push(`</g>`, `</svg>`);
  return out.join('\n');
}
