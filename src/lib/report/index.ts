/** The review sheet: a static, printable HTML document for a design review. */
export { reviewSheetHtml, REVIEW_CAUTION, type ReviewSheetOptions } from './reviewSheet';
export {
  comparisonCellText,
  comparisonTableHtml,
  type ComparisonCellText,
} from './comparisonCells';
export { sheetDrawingSvg } from './sheetDrawing';
export { escapeHtml } from './html';
