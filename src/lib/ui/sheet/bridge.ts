/**
 * What the sheet offers other panels (shelf, findings): coordinate conversion and reveal.
 * Set by the Sheet component while it is mounted.
 */
import type { SheetPoint } from './viewport';

export interface SheetBridge {
  /** Sheet point under a client (page) position, or null when it is outside the sheet. */
  clientToSheet(clientX: number, clientY: number): SheetPoint | null;
  /** Sheet point at the centre of the visible sheet. */
  centre(): SheetPoint;
  /** Pan so that the element is visible. */
  reveal(id: string): void;
  /** Give the sheet keyboard focus. */
  focus(): void;
}

let current: SheetBridge | null = null;

/** Register (or clear) the mounted sheet. */
export function setSheetBridge(bridge: SheetBridge | null): void {
  current = bridge;
}

/** The mounted sheet, if any. */
export function sheetBridge(): SheetBridge | null {
  return current;
}
