/**
 * For each route on the review sheet: the spans where any case falls below vapour pressure or
 * under vacuum, merged across cases, each naming the worst case (see chart/envelope.ts).
 */
import { envelopeSpans, type EnvelopeCase } from '../chart/envelope';
import type { HeadrouteDocument, Id } from '../model/types';
import type { CaseComparison } from '../solver/compareCases';
import { profile } from '../solver/profile';
import { formatQuantity, type UnitSystem } from '../units';
import { escapeHtml, tableHtml, type Cell } from './html';

/** The cases' profiles along a route (cases that cannot follow it are left out). */
export function caseProfiles(
  doc: HeadrouteDocument,
  comparison: CaseComparison,
  route: readonly Id[],
): EnvelopeCase[] {
  const out: EnvelopeCase[] = [];
  for (const c of comparison.cases) {
    try {
      out.push({ name: c.name, profile: profile(doc, c.result, [...route]) });
    } catch {
      // this case's flow cannot follow the route
    }
  }
  return out;
}

/** HTML: the merged marked spans along one route across all cases, or a sentence saying none. */
export function envelopeSpansHtml(
  routeName: string,
  cases: readonly EnvelopeCase[],
  system: UnitSystem,
): string {
  const spans = envelopeSpans(cases);
  if (spans.length === 0) {
    return `<p class="empty">${escapeHtml(`${routeName}: no case falls below the vapour pressure or under vacuum along this route.`)}</p>`;
  }
  const q = (v: number, quantity: 'length' | 'head' | 'pressureDrop') =>
    formatQuantity(v, quantity, system, { digits: 4 });
  const rows = spans.map((s): Cell[] => [
    s.kind === 'vapour' ? 'STOP: below vapour pressure' : 'CAUTION: vacuum',
    { text: `${q(s.start, 'length')} – ${q(s.end, 'length')}`, className: 'num' },
    s.worstCaseName,
    {
      text: `${q(s.minMargin, 'head')} (${q(s.minMarginPa, 'pressureDrop')}) at ${q(s.minChainage, 'length')}`,
      className: 'num',
    },
    s.cases.map((i) => cases[i].name).join(', '),
  ]);
  return tableHtml(
    `Marked spans across all cases — ${routeName}`,
    ['Limit', 'Chainage', 'Worst case', 'Least margin', 'Cases with the span'],
    rows,
  );
}
