/**
 * Shallow comparison of display records, for keeping an unchanged record identical so the
 * component that draws it is skipped.
 */

/** True when two records have the same own fields with the same values (compared with ===). */
export function sameFields<T extends object>(a: T, b: T): boolean {
  for (const key in a) if (a[key] !== b[key]) return false;
  for (const key in b) if (!(key in a)) return false;
  return true;
}
