import { useState } from 'react';
import { applyTheme, storedTheme, THEME_LABELS, THEMES, type Theme } from '@/lib/theme.ts';
import { Icon } from '../ui/icon.tsx';

/** Picks the interface look; red-only keeps eyes dark-adapted in a dome. */
export function ThemeSwitch() {
  const [theme, setTheme] = useState<Theme>(storedTheme);
  return (
    <label className="mt-1 flex items-center gap-2.5 rounded-md px-2.5 py-1.5 text-sm text-muted">
      <Icon name="moon" className="size-[18px] shrink-0" />
      <span className="sr-only">Look</span>
      <select
        value={theme}
        onChange={(e) => {
          const next = e.target.value as Theme;
          setTheme(next);
          applyTheme(next);
        }}
        className="w-full rounded border border-rule bg-panel px-1.5 py-1 text-xs text-ink"
      >
        {THEMES.map((t) => (
          <option key={t} value={t}>
            {THEME_LABELS[t]}
          </option>
        ))}
      </select>
    </label>
  );
}
