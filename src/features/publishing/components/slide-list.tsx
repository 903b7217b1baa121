import { useEffect, useState, type DragEvent } from 'react';
import type { ChannelDetailDto, SlideDto, SlideUpdateInput } from '@shared/schemas/channel.ts';
import { SLIDE_KIND_LABELS } from '@shared/schemas/channel.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { SlideTimingForm } from './slide-timing-form.tsx';
import { slideTitle } from '../slide-title.ts';

const moved = (ids: string[], from: number, to: number) => {
  const next = [...ids];
  const [id] = next.splice(from, 1);
  next.splice(to, 0, id);
  return next;
};

interface Props {
  channel: ChannelDetailDto;
  busy: boolean;
  onReorder: (ids: string[]) => void;
  onUpdate: (slideId: string, input: SlideUpdateInput) => void;
  onRemove: (slideId: string) => void;
  updateError: { slideId: string; message: string; fields?: Record<string, string> } | null;
}

/**
 * The channel's slides in playing order. Drag a row to move it, or use its Move up / Move down
 * buttons (keyboard and screen readers); focus stays on the moved slide's button.
 */
export function SlideList({ channel, busy, onReorder, onUpdate, onRemove, updateError }: Props) {
  const ids = channel.slides.map((s) => s.id);
  const [dragging, setDragging] = useState<string | null>(null);
  const [over, setOver] = useState<number | null>(null);
  const [open, setOpen] = useState<string | null>(null);
  const [focusAfterMove, setFocusAfterMove] = useState<{ id: string; dir: 'up' | 'down' } | null>(null);

  // biome-ignore lint/correctness/useExhaustiveDependencies: runs again when the slides come back in their new order, so the moved row's button exists to take focus
  useEffect(() => {
    if (!focusAfterMove) return;
    const el = document.querySelector<HTMLButtonElement>(
      `[data-slide-id="${focusAfterMove.id}"] [data-move="${focusAfterMove.dir}"]`,
    );
    (el && !el.disabled
      ? el
      : document.querySelector<HTMLButtonElement>(`[data-slide-id="${focusAfterMove.id}"] [data-move]:not(:disabled)`)
    )?.focus();
  }, [channel.slides, focusAfterMove]);

  const drop = (e: DragEvent, index: number) => {
    e.preventDefault();
    const from = dragging ? ids.indexOf(dragging) : -1;
    setDragging(null);
    setOver(null);
    if (from < 0 || from === index) return;
    onReorder(moved(ids, from, index));
  };

  if (!channel.slides.length)
    return (
      <p className="rounded-lg border border-dashed border-rule bg-panel p-6 text-sm text-muted">
        No slides yet: the screens show a calm holding screen. Add a page, an image or the sky tonight below.
      </p>
    );

  return (
    <ol className="space-y-2" aria-label="Slides in playing order">
      {channel.slides.map((s, i) => (
        <li
          key={s.id}
          data-slide-id={s.id}
          draggable={!busy}
          onDragStart={(e) => {
            setDragging(s.id);
            e.dataTransfer.effectAllowed = 'move';
            e.dataTransfer.setData('text/plain', s.id);
          }}
          onDragEnd={() => {
            setDragging(null);
            setOver(null);
          }}
          onDragOver={(e) => {
            e.preventDefault();
            setOver(i);
          }}
          onDrop={(e) => drop(e, i)}
          className={`rounded-lg border bg-panel p-3 ${over === i && dragging && dragging !== s.id ? 'border-accent ring-2 ring-accent/30' : 'border-rule'} ${dragging === s.id ? 'opacity-50' : ''}`}
        >
          <div className="flex flex-wrap items-center gap-3">
            <span className="cursor-grab select-none text-muted" aria-hidden="true" title="Drag to move">
              ⠿
            </span>
            <span className="w-6 text-right text-sm tabular-nums text-muted">{i + 1}</span>
            {s.media?.thumbnailUrl ? (
              <img src={s.media.thumbnailUrl} alt="" className="h-10 w-16 rounded object-cover" />
            ) : (
              <span className="flex h-10 w-16 items-center justify-center rounded bg-wash text-muted">
                <Icon name={s.kind === 'sky_tonight' ? 'moon' : 'page'} className="size-4" />
              </span>
            )}
            <div className="min-w-[14rem] flex-1">
              <p className="truncate font-medium text-ink">{slideTitle(s)}</p>
              <p className="text-xs text-muted">
                {SLIDE_KIND_LABELS[s.kind]} · {s.durationS} s
                {s.kind === 'page' ? ` · ${s.statementIds.length} statement${s.statementIds.length === 1 ? '' : 's'}` : ''}
                {s.startsAt || s.endsAt ? ' · timed' : ''}
              </p>
              {s.schedule && <p className="text-xs text-muted">Shown {s.scheduleText} (venue time)</p>}
            </div>
            <SlideStateBadge slide={s} />
            <div className="ml-auto flex gap-1">
              <Button
                variant="secondary"
                className="px-2"
                data-move="up"
                aria-label={`Move “${slideTitle(s)}” up`}
                disabled={busy || i === 0}
                onClick={() => {
                  setFocusAfterMove({ id: s.id, dir: 'up' });
                  onReorder(moved(ids, i, i - 1));
                }}
              >
                ↑
              </Button>
              <Button
                variant="secondary"
                className="px-2"
                data-move="down"
                aria-label={`Move “${slideTitle(s)}” down`}
                disabled={busy || i === ids.length - 1}
                onClick={() => {
                  setFocusAfterMove({ id: s.id, dir: 'down' });
                  onReorder(moved(ids, i, i + 1));
                }}
              >
                ↓
              </Button>
              <Button variant="quiet" aria-expanded={open === s.id} onClick={() => setOpen(open === s.id ? null : s.id)}>
                Timing
              </Button>
              <Button variant="danger" aria-label={`Remove “${slideTitle(s)}”`} disabled={busy} onClick={() => onRemove(s.id)}>
                <Icon name="trash" className="size-4" />
              </Button>
            </div>
          </div>
          {open === s.id && (
            <SlideTimingForm
              slide={s}
              busy={busy}
              error={
                updateError?.slideId === s.id && !Object.keys(updateError.fields ?? {}).some((k) => k.startsWith('schedule'))
                  ? updateError.message
                  : null
              }
              scheduleErrors={
                updateError?.slideId === s.id
                  ? Object.entries(updateError.fields ?? {})
                      .filter(([k]) => k.startsWith('schedule'))
                      .map(([, v]) => v)
                  : []
              }
              onSave={(input) => onUpdate(s.id, input)}
            />
          )}
        </li>
      ))}
    </ol>
  );
}

/** Whether the slide is on the screens now, in words with an icon (never colour alone). */
function SlideStateBadge({ slide }: { slide: SlideDto }) {
  if (slide.state === 'showing')
    return (
      <span className="inline-flex items-center gap-1 text-xs font-medium text-ok">
        <Icon name="check" className="size-3.5" />
        Showing
      </span>
    );
  const label =
    slide.state === 'scheduled'
      ? 'Scheduled'
      : slide.state === 'ended'
        ? 'Ended'
        : slide.state === 'off_schedule'
          ? 'Not now (schedule)'
          : 'Not shown';
  const calm = slide.state === 'scheduled' || slide.state === 'off_schedule';
  return (
    <span
      className={`inline-flex items-center gap-1 text-xs font-medium ${calm ? 'text-neutral' : 'text-changed'}`}
      title={slide.stateText ?? undefined}
    >
      <Icon name={calm ? 'history' : 'alert'} className="size-3.5" />
      {label}
      <span className="sr-only">: {slide.stateText}</span>
    </span>
  );
}
