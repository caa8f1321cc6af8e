/**
 * Which panels of the right column are folded, and how tall the lower pane (findings and
 * cases) is. Session state kept in the browser, never in the project file.
 */
const KEY = 'headroute-side-panels';

type PanelName = 'details' | 'findings' | 'cases';

function load(): Record<PanelName, boolean> {
  const none = { details: false, findings: false, cases: false };
  try {
    const saved = JSON.parse(localStorage.getItem(KEY) ?? '{}') as Partial<typeof none>;
    return {
      details: saved.details === true,
      findings: saved.findings === true,
      cases: saved.cases === true,
    };
  } catch {
    return none;
  }
}

class SidePanels {
  folded = $state<Record<PanelName, boolean>>({ details: false, findings: false, cases: false });
  /** The lower pane's share of the column's height. */
  lowerShare = $state(0.42);

  /** Read the saved folds (call once in the browser). */
  restore(): void {
    this.folded = load();
  }

  toggle(name: PanelName): void {
    this.folded = { ...this.folded, [name]: !this.folded[name] };
    try {
      localStorage.setItem(KEY, JSON.stringify(this.folded));
    } catch {
      /* private mode: the fold lasts for this visit */
    }
  }
}

/** The right column's folds and split. */
export const sidePanels = new SidePanels();
