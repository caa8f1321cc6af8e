/**
 * The cases comparison as text: what each cell of the table shows, shared by the review sheet
 * and the app's cases panel so both read the same.
 */
import type { CaseComparison, ComparisonRow } from '../solver/compareCases';
import type { Finding } from '../solver/types';
import { formatQuantity, NOT_A_VALUE, type UnitSystem } from '../units';
import { escapeHtml, tableHtml, type Cell } from './html';

/** One cell as text: the value, a smaller note under it, and whether it is the row's worst. */
export interface ComparisonCellText {
  value: string;
  note: string | null;
  worst: boolean;
}

function findingText(f: Finding): string {
  return `${f.level.toUpperCase()}: ${f.message}`;
}

/** The text of row `row`, case `index`, in `system` units. */
export function comparisonCellText(
  comparison: CaseComparison,
  row: ComparisonRow,
  index: number,
  system: UnitSystem,
): ComparisonCellText {
  const v = row.values[index];
  const worst = row.worst === index;
  let note = row.notes[index];
  if (v === null) {
    return { value: row.key === 'worst-finding' ? 'none' : NOT_A_VALUE, note, worst };
  }
  if (typeof v !== 'number') return { value: findingText(v), note, worst };
  const quantity = row.quantity ?? 'fraction';
  let value = formatQuantity(v, quantity, system, { digits: 4 });
  if (row.key === 'vapour-margin') {
    const m = comparison.cases[index].minVapourMargin;
    if (m) {
      value = `${value} (${formatQuantity(m.marginHead, 'head', system, { digits: 3 })})`;
      const chainage =
        m.chainage === undefined
          ? ''
          : `, chainage ${formatQuantity(m.chainage, 'length', system, { digits: 4 })}`;
      note = `at ${m.elementName}${chainage}`;
    }
  }
  return { value, note, worst };
}

/** The comparison as an HTML table: one column per case, worst cell bold, boxed and marked. */
export function comparisonTableHtml(comparison: CaseComparison, system: UnitSystem): string {
  const head = ['', ...comparison.cases.map((c) => c.name)];
  const rows = comparison.rows.map((row): Cell[] => [
    row.label,
    ...comparison.cases.map((_, i): Cell => {
      const t = comparisonCellText(comparison, row, i, system);
      const note = t.note ? `<span class="note">${escapeHtml(t.note)}</span>` : '';
      const cls = [row.quantity ? 'num' : '', t.worst ? 'worst' : ''].filter(Boolean).join(' ');
      return { html: `${escapeHtml(t.value)}${note}`, className: cls || undefined };
    }),
  ]);
  return tableHtml(
    'Cases side by side (◆ marks the worst value in each row)',
    head,
    rows,
    'data comparison',
  );
}
