/**
 * Browser side of the surge exports: the envelope as SVG, PNG (that SVG drawn at 2×) and CSV,
 * from src/lib/chart/surgeChart.ts.
 */
import { surgeEnvelopeCsv, surgeEnvelopeSvg } from '../../chart/surgeChart';
import type { SurgeResult } from '../../solver/surge/types';
import { slug } from '../profile/exports';

const SIZE = { width: 1200, height: 560 };

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

/** Downloads the envelope in `format` with `title` on it. */
export async function exportSurge(
  run: SurgeResult,
  title: string,
  format: 'svg' | 'png' | 'csv',
): Promise<void> {
  const base = `${slug(title)}-surge`;
  if (format === 'csv') {
    download(new Blob([surgeEnvelopeCsv(run, title)], { type: 'text/csv' }), `${base}.csv`);
    return;
  }
  const svg = surgeEnvelopeSvg(run, { title, ...SIZE });
  if (format === 'svg') {
    download(new Blob([svg], { type: 'image/svg+xml' }), `${base}.svg`);
    return;
  }
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = SIZE.width * 2;
    canvas.height = SIZE.height * 2;
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('This browser cannot draw to a canvas.');
    ctx.scale(2, 2);
    ctx.drawImage(image, 0, 0, SIZE.width, SIZE.height);
    const png = await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob(
        (b) => (b ? resolve(b) : reject(new Error('PNG encoding failed.'))),
        'image/png',
      ),
    );
    download(png, `${base}.png`);
  } finally {
    URL.revokeObjectURL(url);
  }
}
