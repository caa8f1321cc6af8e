/** Unique ids for label/input pairs in the details panel. */
let counter = 0;

/** A new element id with a readable prefix. */
export function fieldId(prefix: string): string {
  counter += 1;
  return `${prefix}-${counter}`;
}
