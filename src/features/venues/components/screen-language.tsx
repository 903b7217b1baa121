import { LOCALE_REGISTRY } from '@shared/statements/locales.ts';
import type { KioskScreenDto } from '@shared/schemas/kiosk.ts';
import { useSetScreenLanguage } from '@/api/screens.ts';

/** The language a screen plays: one of ours, or its channel's languages in turn. Saved on change. */
export function ScreenLanguage({ venueId, screen, canManage }: { venueId: string; screen: KioskScreenDto; canManage: boolean }) {
  const set = useSetScreenLanguage(venueId);
  const id = `screen-language-${screen.id}`;
  const current = LOCALE_REGISTRY.find((l) => l.tag === screen.language)?.label ?? 'the channel’s languages';
  if (!canManage) return <span className="text-xs text-muted">Plays {current}</span>;
  return (
    <span className="flex items-center gap-1.5 text-xs">
      <label htmlFor={id} className="text-muted">
        Plays
      </label>
      <select
        id={id}
        aria-label={`Language ${screen.name} plays`}
        className="rounded-md border border-rule bg-panel px-2 py-1 text-xs"
        value={screen.language ?? ''}
        disabled={set.isPending}
        onChange={(e) => set.mutate({ screenId: screen.id, language: e.target.value || null })}
      >
        <option value="">the channel’s languages</option>
        {LOCALE_REGISTRY.map((l) => (
          <option key={l.tag} value={l.tag}>
            {l.label} only
          </option>
        ))}
      </select>
      {set.error && (
        <span role="alert" className="text-broken">
          {set.error.message}
        </span>
      )}
    </span>
  );
}
