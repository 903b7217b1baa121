import { Icon } from '@/components/ui/icon.tsx';
import type { SaveState } from './use-autosave.ts';
import { formatTime } from '@/lib/format-date.ts';

const WORDS: Record<SaveState, string> = {
  saved: 'All changes saved',
  unsaved: 'Unsaved changes (kept in this browser)',
  saving: 'Saving…',
  offline: 'Not saved yet: retrying',
  conflict: 'Not saved: someone else saved first',
  refused: 'Not saved',
};

/** Where the writer's text is: saved, waiting, kept locally, or refused (and why). */
export function SaveStatus({
  state,
  message,
  savedAt,
  editable,
}: {
  state: SaveState;
  message: string | null;
  savedAt: Date | null;
  editable: boolean;
}) {
  if (!editable) return null;
  const bad = state === 'offline' || state === 'conflict' || state === 'refused';
  return (
    <div
      role="status"
      aria-live="polite"
      className={`rounded-lg border px-3 py-2 text-sm ${bad ? 'border-changed/50 bg-changed/10' : 'border-rule bg-panel'}`}
    >
      <p className="flex items-center gap-2 font-medium">
        <Icon
          name={bad ? 'alert' : state === 'saved' ? 'check' : 'history'}
          className={`size-4 ${bad ? 'text-changed' : state === 'saved' ? 'text-ok' : 'text-muted'}`}
        />
        {WORDS[state]}
      </p>
      {savedAt && state === 'saved' && <p className="text-xs text-muted">Last saved {formatTime(savedAt)}</p>}
      {message && <p className="mt-1 text-xs">{message}</p>}
    </div>
  );
}
