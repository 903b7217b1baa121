import { SCREEN_HEALTH_LABELS } from '@shared/schemas/kiosk.ts';
import { useEffect, useState } from 'react';
import type { ChannelDetailDto } from '@shared/schemas/channel.ts';
import { Button } from '@/components/ui/button.tsx';

/** Which of the venue's screens show this channel; a screen shows one channel, so ticking one moves it here. */
export function ScreensPicker({
  channel,
  busy,
  onSave,
}: {
  channel: ChannelDetailDto;
  busy: boolean;
  onSave: (ids: string[]) => void;
}) {
  const mine = channel.venueScreens.filter((s) => s.channelId === channel.id).map((s) => s.id);
  const [chosen, setChosen] = useState<string[]>(mine);
  useEffect(() => setChosen(channel.venueScreens.filter((s) => s.channelId === channel.id).map((s) => s.id)), [channel]);
  if (!channel.venueScreens.length)
    return <p className="text-sm text-muted">{channel.venue.name} has no kiosk screens yet. An admin adds them under Venues.</p>;
  const changed = chosen.length !== mine.length || chosen.some((id) => !mine.includes(id));
  return (
    <form
      aria-label="Screens showing this channel"
      onSubmit={(e) => {
        e.preventDefault();
        onSave(chosen);
      }}
    >
      <ul className="space-y-1.5">
        {channel.venueScreens.map((s) => (
          <li key={s.id}>
            <label className="flex flex-wrap items-center gap-x-2 text-sm">
              <input
                type="checkbox"
                className="accent-accent"
                checked={chosen.includes(s.id)}
                onChange={(e) => setChosen(e.target.checked ? [...chosen, s.id] : chosen.filter((x) => x !== s.id))}
              />
              <span className="font-medium text-ink">{s.name}</span>
              <span className="text-xs text-muted">
                {SCREEN_HEALTH_LABELS[s.health]}
                {s.channelId && s.channelId !== channel.id ? ` · now showing “${s.channelName}”` : ''}
              </span>
            </label>
          </li>
        ))}
      </ul>
      <Button type="submit" variant="secondary" className="mt-3" busy={busy} disabled={!changed}>
        Save screens
      </Button>
    </form>
  );
}
