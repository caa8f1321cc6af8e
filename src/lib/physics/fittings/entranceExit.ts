/**
 * Pipe entrance and exit losses, referred to the velocity in the pipe.
 */

/**
 * Square-edged, flush pipe entrance from a vessel: K = 0.5.
 * Sources: Crane Technical Paper No. 410, "Flow of fluids through valves, fittings and pipe",
 * pipe entrance, flush, r/d = 0 (K = 0.5); Hooper (1981) 2-K table, "normal entrance",
 * K∞ = 0.5. Both from memory.
 */
export const ENTRANCE_K = 0.5;

/**
 * Pipe exit into a large vessel: K = 1.0, all the kinetic energy is lost. This is the
 * Borda–Carnot sudden-expansion loss (1 − A1/A2)² with A2 → ∞; Crane TP-410 gives K = 1.0
 * for projecting, sharp-edged and rounded exits alike (from memory).
 */
export const EXIT_K = 1.0;
