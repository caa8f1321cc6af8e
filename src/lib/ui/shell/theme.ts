/** Light/dark theme choice, kept in the browser (not in the project file). */
export type Theme = 'light' | 'dark';

const KEY = 'headroute-theme';

/** The saved theme, or the system preference. */
export function initialTheme(): Theme {
  const saved = localStorage.getItem(KEY);
  if (saved === 'light' || saved === 'dark') return saved;
  return matchMedia('(prefers-color-scheme: dark)').matches ? 'dark' : 'light';
}

/** Apply and remember a theme. */
export function applyTheme(theme: Theme): void {
  document.documentElement.dataset.theme = theme;
  localStorage.setItem(KEY, theme);
}
