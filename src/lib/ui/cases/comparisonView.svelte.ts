/**
 * Whether the comparison of all cases is open: shared by the cases panel (its Compare button)
 * and the comparison panel docked in the centre column. Session state, never saved.
 */
class ComparisonView {
  open = $state(false);
}

/** The one comparison-open flag of the page. */
export const comparisonView = new ComparisonView();
