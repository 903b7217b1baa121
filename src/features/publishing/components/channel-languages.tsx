import { useEffect, useState } from 'react';
import type { ChannelDetailDto } from '@shared/schemas/channel.ts';
import { LOCALE_REGISTRY } from '@shared/statements/locales.ts';
import { useSetChannelLanguages } from '@/api/channels.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';

/**
 * The languages a channel plays. Screens without a language of their own play one round of slides
 * per language ticked, in the order shown; each page slide shows the page's version in that language.
 */
export function ChannelLanguages({ channel }: { channel: ChannelDetailDto }) {
  const save = useSetChannelLanguages(channel.id);
  const [chosen, setChosen] = useState<string[]>(channel.languages);
  useEffect(() => setChosen(channel.languages), [channel]);
  const ordered = LOCALE_REGISTRY.map((l) => l.tag).filter((t) => chosen.includes(t));
  const changed = ordered.join(',') !== channel.languages.join(',');
  return (
    <form
      aria-label="Languages this channel plays"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate({ name: channel.name, languages: ordered });
      }}
    >
      <p className="mb-2 text-sm text-muted">
        {channel.languages.length
          ? 'Screens play one round of slides in each language, in turn, unless a screen has a language of its own.'
          : 'None ticked: each page plays in the language it was written in.'}
      </p>
      <ul className="space-y-1.5">
        {LOCALE_REGISTRY.map((l) => (
          <li key={l.tag}>
            <label className="flex items-center gap-2 text-sm">
              <input
                type="checkbox"
                className="accent-accent"
                checked={chosen.includes(l.tag)}
                onChange={(e) => setChosen(e.target.checked ? [...chosen, l.tag] : chosen.filter((x) => x !== l.tag))}
              />
              <span lang={l.tag}>{l.label}</span>
            </label>
          </li>
        ))}
      </ul>
      {save.error && (
        <div className="mt-2">
          <Notice tone="error">{save.error.message}</Notice>
        </div>
      )}
      <Button type="submit" variant="secondary" className="mt-3" busy={save.isPending} disabled={!changed}>
        Save languages
      </Button>
    </form>
  );
}
