/**
 * Whether a pointer button is held anywhere in the page: while it is, a drag (of a node, a
 * waypoint, a splitter) may be under way, and costly views that follow the document (the case
 * envelope, the comparison table) wait for it to end. Session state only.
 */
class PointerHeld {
  /** True from a pointer press until its release or cancellation. */
  down = $state(false);
  #installed = false;

  /** Listens on the window (capture phase, so handlers that stop propagation do not hide it). */
  install(): () => void {
    if (this.#installed || typeof window === 'undefined') return () => {};
    this.#installed = true;
    const press = () => (this.down = true);
    const release = () => (this.down = false);
    window.addEventListener('pointerdown', press, true);
    window.addEventListener('pointerup', release, true);
    window.addEventListener('pointercancel', release, true);
    window.addEventListener('blur', release);
    return () => {
      this.#installed = false;
      window.removeEventListener('pointerdown', press, true);
      window.removeEventListener('pointerup', release, true);
      window.removeEventListener('pointercancel', release, true);
      window.removeEventListener('blur', release);
    };
  }
}

/** The page's one pointer-held flag (installed by the page). */
export const pointerHeld = new PointerHeld();
