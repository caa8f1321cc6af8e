/**
 * The review sheet's table of the fittings pipes carry (their fittings lists and lumped K):
 * what each list holds, by which method, where its loss acts, the K and the loss in the case.
 */
import type { HeadrouteDocument, PipeFittings } from '../model/types';
import { fittingLabel } from '../model/pipeFittingList';
import type { SolveResult } from '../solver/types';
import { NOT_A_VALUE } from '../units';
import type { Formatter } from './elementTables';
import { tableHtml, type Cell } from './html';

const METHOD = { fixed: 'fixed K', '2K': '2-K', '3K': '3-K' } as const;

/** One list in words: "6 × 90° elbow (3-K); 1 × strainer (fixed K 1.5); lumped K 0.8". */
export function fittingsListText(list: PipeFittings): string {
  const parts = list.items.map((i) => {
    const method = i.lossMethod === 'fixed' ? `fixed K ${i.fixedK}` : METHOD[i.lossMethod];
    return `${i.count} × ${fittingLabel(i.fittingType).toLowerCase()} (${method})`;
  });
  if (list.lumpedK > 0) parts.push(`lumped K ${list.lumpedK}`);
  return parts.length ? parts.join('; ') : 'none';
}

function placeText(list: PipeFittings, fmt: Formatter): string {
  switch (list.place) {
    case 'inlet':
      return 'at the inlet';
    case 'outlet':
      return 'at the outlet';
    case 'spread':
      return 'spread along the pipe';
    case 'chainage':
      return `at ${fmt.q(list.chainage ?? 0, 'length')} from the inlet`;
  }
}

/** Pipes that carry fittings: the list, where the loss acts, K and loss in the case shown. */
export function pipeFittingsTable(
  doc: HeadrouteDocument,
  result: SolveResult,
  fmt: Formatter,
): string {
  const rows: Cell[][] = [];
  for (const pipe of Object.values(doc.pipes)) {
    if (!pipe.fittings) continue;
    const r = result.pipes[pipe.id];
    rows.push([
      pipe.name || pipe.id,
      fittingsListText(pipe.fittings),
      placeText(pipe.fittings, fmt),
      {
        text: r?.fittingK !== undefined ? String(Number(r.fittingK.toPrecision(3))) : NOT_A_VALUE,
        className: 'num',
      },
      { text: fmt.q(r?.fittingLoss, 'head', 3), className: 'num' },
    ]);
  }
  return tableHtml('Fittings on pipes', ['Pipe', 'Fittings', 'Loss acts', 'K', 'Loss'], rows);
}
