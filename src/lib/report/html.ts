/**
 * Small helpers for writing HTML as strings: escaping and tables. Every piece of text from the
 * document (names, messages) goes through `escapeHtml`, so markup in a name stays text.
 */

/** Escapes text for HTML content and double- or single-quoted attribute values. */
export function escapeHtml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** A table cell: plain text (escaped here) or ready-made HTML, with an optional class. */
export type Cell =
  string | { html: string; className?: string } | { text: string; className?: string };

function cellHtml(cell: Cell, tag: 'td' | 'th'): string {
  if (typeof cell === 'string') return `<${tag}>${escapeHtml(cell)}</${tag}>`;
  const cls = cell.className ? ` class="${escapeHtml(cell.className)}"` : '';
  const body = 'html' in cell ? cell.html : escapeHtml(cell.text);
  return `<${tag}${cls}>${body}</${tag}>`;
}

/** A table with a caption, one header row and body rows; numbers columns right-aligned by CSS. */
export function tableHtml(
  caption: string,
  head: readonly string[],
  rows: readonly (readonly Cell[])[],
  className = 'data',
): string {
  if (rows.length === 0) {
    return `<p class="empty">${escapeHtml(caption)}: none.</p>`;
  }
  return [
    `<table class="${escapeHtml(className)}">`,
    `<caption>${escapeHtml(caption)}</caption>`,
    `<thead><tr>${head.map((h) => cellHtml(h, 'th')).join('')}</tr></thead>`,
    `<tbody>`,
    ...rows.map((r) => `<tr>${r.map((c, i) => cellHtml(c, i === 0 ? 'th' : 'td')).join('')}</tr>`),
    `</tbody>`,
    `</table>`,
  ].join('\n');
}

/** A section with a heading and body HTML. */
export function sectionHtml(id: string, title: string, body: string): string {
  return `<section id="${escapeHtml(id)}">\n<h2>${escapeHtml(title)}</h2>\n${body}\n</section>`;
}
