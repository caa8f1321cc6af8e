/**
 * Plain-text and CSV tables for the command line, with values in the project's units.
 */
import {
  displayUnit,
  formatQuantity,
  toDisplay,
  type Quantity,
  type UnitSystem,
} from '../lib/units';

/** A column: its title, the quantity of its values (null for text), and how to get the value. */
export interface Column<T> {
  title: string;
  quantity: Quantity | null;
  value(row: T): number | string | null;
  /** Significant figures for numbers without a quantity (default 4). */
  digits?: number;
}

/** Title with its display unit, e.g. "flow (m³/h)". */
export function columnTitle<T>(c: Column<T>, system: UnitSystem): string {
  return c.quantity ? `${c.title} (${displayUnit(c.quantity, system)})` : c.title;
}

function cellText<T>(c: Column<T>, row: T, system: UnitSystem): string {
  const v = c.value(row);
  if (v === null) return '—';
  if (typeof v === 'string') return v;
  if (c.quantity) return formatQuantity(v, c.quantity, system, { withUnit: false });
  if (!Number.isFinite(v)) return '—';
  return Number(v.toPrecision(c.digits ?? 4)).toString();
}

/** A text table with aligned columns (numbers right-aligned), or "(none)" when empty. */
export function textTable<T>(rows: readonly T[], columns: Column<T>[], system: UnitSystem): string {
  if (rows.length === 0) return '  (none)';
  const head = columns.map((c) => columnTitle(c, system));
  const body = rows.map((r) => columns.map((c) => cellText(c, r, system)));
  const width = head.map((h, i) => Math.max(h.length, ...body.map((b) => b[i].length)));
  const numeric = columns.map((c) => c.quantity !== null || c.digits !== undefined);
  const line = (cells: string[]) =>
    '  ' +
    cells
      .map((cell, i) => (numeric[i] ? cell.padStart(width[i]) : cell.padEnd(width[i])))
      .join('  ')
      .trimEnd();
  return [line(head), line(width.map((w) => '-'.repeat(w))), ...body.map(line)].join('\n');
}

/** Quotes a CSV field when it holds a comma, quote or line break (RFC 4180). */
export function csvField(text: string): string {
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A CSV table: a header row with units, then one row per record; numbers to 6 significant figures. */
export function csvTable<T>(
  rows: readonly T[],
  columns: Column<T>[],
  system: UnitSystem,
): string[] {
  const header = columns.map((c) => csvField(columnTitle(c, system))).join(',');
  const body = rows.map((r) =>
    columns
      .map((c) => {
        const v = c.value(r);
        if (v === null) return '';
        if (typeof v === 'string') return csvField(v);
        const shown = c.quantity ? toDisplay(v, c.quantity, system) : v;
        return Number.isFinite(shown) ? String(Number(shown.toPrecision(6))) : '';
      })
      .join(','),
  );
  return [header, ...body];
}
