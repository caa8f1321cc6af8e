/**
 * Browser side of the profile exports: SVG and CSV text from src/lib/chart, PNG at 2× by
 * drawing that same SVG onto a canvas, each offered as a download.
 */
import { exportMeta, profileSvg, stationsCsv } from '../../chart';
import type { HeadrouteDocument, Id } from '../../model/types';
import type { Profile, SolveResult } from '../../solver/types';

/** Size of exported drawings, px (PNG doubles it). */
export const EXPORT_SIZE = { width: 1200, height: 760 };

/** What one export needs. */
export interface ProfileExport {
  doc: HeadrouteDocument;
  result: SolveResult;
  profile: Profile;
  routeName: string;
}

/** File-name friendly text: letters, digits and dashes. */
export function slug(text: string): string {
  return (
    text
      .normalize('NFKD')
      .replace(/[^\w\s-]/g, '')
      .trim()
      .replace(/[\s_]+/g, '-')
      .toLowerCase() || 'profile'
  );
}

function baseName(e: ProfileExport): string {
  return `${slug(e.doc.name)}-${slug(e.routeName)}-profile`;
}

function download(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function svgText(e: ProfileExport): string {
  return profileSvg(e.doc, e.result, e.profile, { routeName: e.routeName, ...EXPORT_SIZE });
}

/** Downloads the profile as a self-contained SVG. */
export function exportSvg(e: ProfileExport): void {
  download(new Blob([svgText(e)], { type: 'image/svg+xml' }), `${baseName(e)}.svg`);
}

/** Downloads the station table as CSV with the title-block comment lines. */
export function exportCsv(e: ProfileExport): void {
  const meta = exportMeta(e.doc, e.result, e.profile.route, { routeName: e.routeName });
  const names: Record<Id, string> = {};
  for (const n of Object.values(e.doc.nodes)) names[n.id] = n.name;
  for (const p of Object.values(e.doc.pipes)) names[p.id] = p.name;
  const csv = stationsCsv(e.profile, e.doc.settings.unitSystem, meta, names);
  download(new Blob([csv], { type: 'text/csv' }), `${baseName(e)}.csv`);
}

/** Downloads the profile as a PNG at twice the drawing size (for slides). */
export async function exportPng(e: ProfileExport, scale = 2): Promise<void> {
  const url = URL.createObjectURL(new Blob([svgText(e)], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = EXPORT_SIZE.width * scale;
    canvas.height = EXPORT_SIZE.height * scale;
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('This browser cannot draw to a canvas.');
    ctx.scale(scale, scale);
    ctx.drawImage(image, 0, 0, EXPORT_SIZE.width, EXPORT_SIZE.height);
    const png = await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob(
        (b) => (b ? resolve(b) : reject(new Error('PNG encoding failed.'))),
        'image/png',
      ),
    );
    download(png, `${baseName(e)}.png`);
  } finally {
    URL.revokeObjectURL(url);
  }
}
