/**
 * Opens the review sheet of the current document in a new browser window, ready to print.
 * The HTML comes from the pure generator in src/lib/report; the window gets it as a Blob URL,
 * so nothing is sent anywhere.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import { reviewSheetHtml } from '../../report/reviewSheet';
import type { CaseComparison } from '../../solver/compareCases';
import { surge } from '../surge/surgeState.svelte';

/** The review sheet HTML for the app's document and shown case. */
export function reviewHtml(
  doc: HeadrouteDocument,
  caseId: Id | null,
  comparison?: CaseComparison,
): string {
  // The surge run shown in the app goes on the sheet when it was run on this document and case.
  const run =
    surge.result && surge.ranOn === doc && surge.result.caseId === caseId
      ? surge.result
      : undefined;
  return reviewSheetHtml(doc, { caseId, comparison, surge: run });
}

/**
 * Opens `html` in a new window (or tab). Returns false when the browser blocked the window.
 * The Blob URL is released once the window has had time to load it.
 */
export function openHtmlWindow(html: string): boolean {
  const url = URL.createObjectURL(new Blob([html], { type: 'text/html;charset=utf-8' }));
  const win = window.open(url, '_blank');
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
  return win !== null;
}
