/**
 * Every keyboard shortcut the app answers, in one list: the `?` help reads it, and a later
 * command registry can take it over. A handler that adds a key adds its line here.
 */
export interface Shortcut {
  /** The keys as the user presses them, e.g. "Ctrl+Z"; alternatives are separate entries. */
  keys: string[];
  /** What it does, in words. */
  action: string;
}

/** A group of shortcuts that work in one place (anywhere, on the sheet, on the profile). */
export interface ShortcutGroup {
  where: string;
  shortcuts: Shortcut[];
}

/** The shortcuts, grouped by where they work. */
export const SHORTCUTS: readonly ShortcutGroup[] = [
  {
    where: 'Anywhere',
    shortcuts: [
      { keys: ['Ctrl+S'], action: 'Save the project file' },
      { keys: ['Ctrl+Z'], action: 'Undo' },
      { keys: ['Ctrl+Shift+Z', 'Ctrl+Y'], action: 'Redo' },
      { keys: ['?'], action: 'Show this list of shortcuts' },
    ],
  },
  {
    where: 'On the sheet',
    shortcuts: [
      { keys: ['P'], action: 'Pipe tool on or off (drag from port to port)' },
      {
        keys: ['Esc'],
        action: 'Cancel the pipe being drawn, leave the tool, or clear the selection',
      },
      { keys: ['Delete', 'Backspace'], action: 'Delete the selection' },
      { keys: ['Ctrl+A'], action: 'Select everything' },
      { keys: ['Ctrl+C'], action: 'Copy the selection' },
      { keys: ['Ctrl+V'], action: 'Paste at the pointer' },
      { keys: ['Ctrl+D'], action: 'Duplicate the selection' },
      { keys: [']', '['], action: 'Select the next or previous element' },
      {
        keys: ['Arrow keys'],
        action: 'Move the selection one grid step, or pan when nothing is selected',
      },
      { keys: ['Shift+Arrow keys'], action: 'Move the selection five grid steps' },
      { keys: ['+', '-'], action: 'Zoom in or out' },
      { keys: ['F', '0'], action: 'Fit the whole sheet' },
      { keys: ['Space+drag'], action: 'Pan' },
    ],
  },
  {
    where: 'On the profile',
    shortcuts: [
      {
        keys: ['Arrow up', 'Arrow down'],
        action: 'Raise or lower the focused waypoint (Shift: ten steps)',
      },
      { keys: ['Enter'], action: 'Select the focused waypoint on the sheet' },
      { keys: ['Esc'], action: 'Cancel a waypoint drag' },
      { keys: ['Double-click'], action: 'Show the whole route' },
    ],
  },
];

/** True when a key press should open the shortcut list (`?`, outside a text field). */
export function isHelpKey(
  e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'altKey'>,
): boolean {
  return e.key === '?' && !e.ctrlKey && !e.metaKey && !e.altKey;
}
