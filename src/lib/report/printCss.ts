/**
 * Styles of the review sheet, screen and print. Greyscale throughout: meaning is carried by
 * words, borders and line styles, never by colour alone. The page margins fit both A4
 * (210 × 297 mm) and US Letter (215.9 × 279.4 mm): `size: auto` lets the printer's paper
 * decide, and 15 mm margins leave a 180 × 249 mm (Letter) or 185 × 267 mm (A4) text block,
 * so the layout is sized to 180 mm wide.
 */
export const REVIEW_SHEET_CSS = `
@page { size: auto; margin: 15mm 15mm 16mm 15mm; }
:root { color-scheme: light; }
* { box-sizing: border-box; }
body {
  margin: 0 auto; max-width: 180mm; padding: 8mm 0;
  font-family: 'IBM Plex Sans', 'Helvetica Neue', Arial, sans-serif;
  font-size: 10pt; line-height: 1.35; color: #111; background: #fff;
}
h1 { font-size: 17pt; margin: 0 0 2mm; }
h2 { font-size: 13pt; margin: 7mm 0 2mm; padding-bottom: 1mm; border-bottom: 1.5pt solid #111;
  break-after: avoid; page-break-after: avoid; }
h3 { font-size: 11pt; margin: 4mm 0 1.5mm; break-after: avoid; page-break-after: avoid; }
p { margin: 1.5mm 0; }
.caution { border: 2pt solid #111; padding: 2.5mm 3.5mm; margin: 3mm 0; font-weight: 600;
  break-inside: avoid; page-break-inside: avoid; }
.caution::before { content: 'CAUTION — '; letter-spacing: 0.04em; }
dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: 0.6mm 5mm; margin: 2mm 0; }
dl.facts dt { font-weight: 600; }
dl.facts dd { margin: 0; }
figure { margin: 2mm 0 4mm; break-inside: avoid; page-break-inside: avoid; }
figure svg { display: block; width: 100%; height: auto; border: 0.5pt solid #777; }
figcaption { font-size: 9pt; color: #333; margin-top: 1mm; }
table { width: 100%; border-collapse: collapse; margin: 2mm 0 4mm; font-size: 8.5pt;
  break-inside: avoid; page-break-inside: avoid; }
caption { text-align: left; font-weight: 600; font-size: 9.5pt; padding-bottom: 1mm; }
th, td { border: 0.5pt solid #777; padding: 0.8mm 1.4mm; vertical-align: top; text-align: left; }
thead th { background: #e6e6e6; border-bottom: 1pt solid #111; }
tbody th { font-weight: 600; }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
td.worst { font-weight: 700; border: 1.8pt solid #111; }
td.worst::after { content: ' ◆ worst'; font-size: 7.5pt; font-weight: 600; }
.note { display: block; font-size: 7.5pt; color: #333; white-space: normal; }
ul.findings { list-style: none; padding: 0; margin: 1mm 0 3mm; }
ul.findings li { margin: 0.8mm 0; padding-left: 19mm; text-indent: -19mm;
  break-inside: avoid; page-break-inside: avoid; }
.level { display: inline-block; width: 17mm; text-indent: 0; text-align: center;
  font-size: 7.5pt; font-weight: 700; letter-spacing: 0.05em; margin-right: 2mm; }
.level-stop { border: 1.8pt solid #111; background: #d0d0d0; }
.level-caution { border: 1pt dashed #111; }
.level-note { border: 0.6pt dotted #555; font-weight: 500; }
.methods li { margin: 1mm 0; }
.empty { font-style: italic; color: #333; }
.mono { font-family: 'IBM Plex Mono', 'Courier New', monospace; font-size: 8pt; }
footer { margin-top: 8mm; font-size: 8.5pt; color: #333; border-top: 0.5pt solid #777; padding-top: 2mm; }
@media print {
  body { padding: 0; max-width: none; }
  a { color: inherit; text-decoration: none; }
  section { break-before: auto; }
  #profiles figure, #sheet figure { break-before: auto; }
}
`;
