import { useState } from 'react';
import type { SlideCreateInput, SlideKind } from '@shared/schemas/channel.ts';
import { SLIDE_KIND_LABELS, SLIDE_KINDS } from '@shared/schemas/channel.ts';
import { ChannelLimits } from '@shared/validations.ts';
import { useSlideSources } from '@/api/channels.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';

/** Adds a slide at the end: a published page with chosen statements, a credited image, or the sky tonight. */
export function AddSlideForm({
  busy,
  error,
  onAdd,
}: {
  busy: boolean;
  error: string | null;
  onAdd: (input: SlideCreateInput) => void;
}) {
  const sources = useSlideSources();
  const [kind, setKind] = useState<SlideKind>('page');
  const [pageId, setPageId] = useState('');
  const [statementIds, setStatementIds] = useState<string[]>([]);
  const [mediaId, setMediaId] = useState('');
  const [caption, setCaption] = useState('');
  const [duration, setDuration] = useState(String(ChannelLimits.durationDefault));
  const page = sources.data?.pages.find((p) => p.id === pageId);
  const image = sources.data?.media.find((m) => m.id === mediaId);
  const durationS = Number(duration) || ChannelLimits.durationDefault;

  const submit = () => {
    if (kind === 'page') onAdd({ kind, pageId, statementIds, mediaId: mediaId || null, durationS });
    else if (kind === 'image') onAdd({ kind, mediaId, caption, durationS });
    else onAdd({ kind, durationS });
  };
  const ready = kind === 'sky_tonight' || (kind === 'page' ? !!pageId : !!mediaId);

  return (
    <form
      aria-label="Add a slide"
      className="space-y-4 rounded-lg border border-rule bg-panel p-4"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <fieldset>
        <legend className="mb-2 text-sm font-semibold text-ink">Add a slide</legend>
        <div className="flex flex-wrap gap-4">
          {SLIDE_KINDS.map((k) => (
            <label key={k} className="inline-flex items-center gap-2 text-sm">
              <input
                type="radio"
                name="slide-kind"
                value={k}
                checked={kind === k}
                onChange={() => setKind(k)}
                className="accent-accent"
              />
              {SLIDE_KIND_LABELS[k]}
            </label>
          ))}
        </div>
      </fieldset>
      {sources.error && <Notice tone="error">{sources.error.message}</Notice>}
      {kind === 'page' && (
        <>
          <SelectField
            label="Published page"
            value={pageId}
            onChange={(e) => {
              setPageId(e.target.value);
              setStatementIds([]);
            }}
          >
            <option value="">{sources.data?.pages.length === 0 ? 'No page is published yet' : 'Choose a page…'}</option>
            {sources.data?.pages.map((p) => (
              <option key={p.id} value={p.id}>
                {p.title} · {p.objectName}
              </option>
            ))}
          </SelectField>
          {page && page.statements.length > 0 && (
            <fieldset>
              <legend className="mb-1 text-sm font-medium text-ink">
                Statements to show (at most {ChannelLimits.statementsPerSlideMax})
              </legend>
              <ul className="space-y-1">
                {page.statements.map((s) => (
                  <li key={s.id}>
                    <label className="flex items-start gap-2 text-sm">
                      <input
                        type="checkbox"
                        className="mt-1 accent-accent"
                        checked={statementIds.includes(s.id)}
                        disabled={!statementIds.includes(s.id) && statementIds.length >= ChannelLimits.statementsPerSlideMax}
                        onChange={(e) =>
                          setStatementIds(e.target.checked ? [...statementIds, s.id] : statementIds.filter((x) => x !== s.id))
                        }
                      />
                      <span>{s.text}</span>
                    </label>
                  </li>
                ))}
              </ul>
            </fieldset>
          )}
        </>
      )}
      {kind !== 'sky_tonight' && (
        <div className="flex items-end gap-3">
          <SelectField
            className="flex-1"
            label={kind === 'page' ? 'Image (optional: the page’s first image otherwise)' : 'Image'}
            value={mediaId}
            onChange={(e) => setMediaId(e.target.value)}
          >
            <option value="">{kind === 'page' ? 'The page’s own image' : 'Choose an image…'}</option>
            {sources.data?.media.map((m) => (
              <option key={m.id} value={m.id}>
                {m.altText.slice(0, 80)} · {m.credit}
              </option>
            ))}
          </SelectField>
          {image?.thumbnailUrl && <img src={image.thumbnailUrl} alt={image.altText} className="h-16 w-24 rounded object-cover" />}
        </div>
      )}
      {kind === 'image' && (
        <TextField
          label="Title (shown on the screen; names the slide in this list)"
          maxLength={ChannelLimits.captionMax}
          value={caption}
          onChange={(e) => setCaption(e.target.value)}
        />
      )}
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          className="w-40"
          label="Seconds on screen"
          type="number"
          min={ChannelLimits.durationMin}
          max={ChannelLimits.durationMax}
          value={duration}
          onChange={(e) => setDuration(e.target.value)}
        />
        <Button type="submit" busy={busy} disabled={!ready}>
          Add slide
        </Button>
      </div>
      {error && <Notice tone="error">{error}</Notice>}
    </form>
  );
}
