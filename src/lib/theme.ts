/** Interface looks: follow the system, or fix paper, night, or red-only for dark domes. */
export const THEMES = ['system', 'paper', 'night', 'red'] as const;
export type Theme = (typeof THEMES)[number];

export const THEME_LABELS: Record<Theme, string> = {
  system: 'Follow system',
  paper: 'Paper',
  night: 'Night',
  red: 'Red (dark-adapted eyes)',
};

const KEY = 'starproof.theme';

export function storedTheme(): Theme {
  const value = localStorage.getItem(KEY);
  return (THEMES as readonly string[]).includes(value ?? '') ? (value as Theme) : 'system';
}

/** Sets data-theme on <html>; "system" removes it so prefers-color-scheme decides. */
export function applyTheme(theme: Theme): void {
  localStorage.setItem(KEY, theme);
  if (theme === 'system') document.documentElement.removeAttribute('data-theme');
  else document.documentElement.setAttribute('data-theme', theme);
}

export function applyStoredTheme(): void {
  applyTheme(storedTheme());
}
