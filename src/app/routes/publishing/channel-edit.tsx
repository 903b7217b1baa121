import { useEffect, useRef, useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import {
  useAddSlide,
  useAssignScreens,
  removeSlide,
  useChannel,
  useChannelSettings,
  useDeleteChannel,
  useRemoveSlide,
  useRenameChannel,
  useReorderSlides,
  useUpdateSlide,
} from '@/api/channels.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { ApiRequestError } from '@/lib/api-client.ts';
import { AddSlideForm } from '@/features/publishing/components/add-slide-form.tsx';
import { ChannelSettingsForm } from '@/features/publishing/components/channel-settings-form.tsx';
import { PlayerPreview } from '@/features/publishing/components/player-preview.tsx';
import { ChannelLanguages } from '@/features/publishing/components/channel-languages.tsx';
import { ScreensPicker } from '@/features/publishing/components/screens-picker.tsx';
import { SlideList } from '@/features/publishing/components/slide-list.tsx';
import { slideTitle } from '@/features/publishing/slide-title.ts';
import { useUndoableRemove } from '@/features/publishing/use-undoable-remove.ts';
import { UndoToast } from '@/components/ui/undo-toast.tsx';

const message = (e: unknown) => (e instanceof Error ? e.message : null);

export function Component() {
  const { channelId = '' } = useParams();
  const channel = useChannel(channelId);
  const navigate = useNavigate();
  const add = useAddSlide(channelId);
  const update = useUpdateSlide(channelId);
  const remove = useRemoveSlide(channelId);
  const reorder = useReorderSlides(channelId);
  const screens = useAssignScreens(channelId);
  const rename = useRenameChannel(channelId);
  const settings = useChannelSettings(channelId);
  const del = useDeleteChannel();
  const [renaming, setRenaming] = useState<string | null>(null);
  const [confirmDelete, setConfirmDelete] = useState(false);
  // While mounted the removal goes through the mutation (the list refreshes); once the screen is left, straight to the server.
  const mounted = useRef(true);
  useEffect(
    () => () => {
      mounted.current = false;
    },
    [],
  );
  const undoable = useUndoableRemove((slideId) => {
    if (!mounted.current) return void removeSlide(channelId, slideId).catch(() => undefined);
    reorder.reset();
    remove.mutate(slideId);
  });

  if (channel.isPending) return <p className="text-sm text-muted">Loading channel…</p>;
  if (channel.error) return <Notice tone="error">{channel.error.message}</Notice>;
  const c = channel.data;
  const busy = add.isPending || update.isPending || remove.isPending || reorder.isPending;
  const listError = message(reorder.error) ?? message(remove.error);
  // A slide waiting out its undo window is already gone as far as this screen is concerned.
  const shown = c.slides.filter((s) => s.id !== undoable.waiting?.id);
  const total = shown.filter((s) => s.state === 'showing').reduce((sum, s) => sum + s.durationS, 0);

  return (
    <>
      <PageHeader
        title={c.name}
        description={`${c.venue.name} · ${shown.length} slide${shown.length === 1 ? '' : 's'} · one loop takes ${Math.floor(total / 60)} min ${total % 60} s`}
        actions={
          c.can.update && renaming === null ? (
            <>
              <Button variant="secondary" onClick={() => setRenaming(c.name)}>
                Rename
              </Button>
              <Button variant="danger" onClick={() => setConfirmDelete(true)}>
                Delete channel
              </Button>
            </>
          ) : undefined
        }
      />
      {renaming !== null && (
        <form
          className="mb-6 flex items-end gap-2"
          aria-label="Rename channel"
          onSubmit={(e) => {
            e.preventDefault();
            rename.mutate(renaming, { onSuccess: () => setRenaming(null) });
          }}
        >
          <TextField
            className="w-80"
            label="Channel name"
            value={renaming}
            onChange={(e) => setRenaming(e.target.value)}
            error={message(rename.error) ?? undefined}
          />
          <Button type="submit" busy={rename.isPending}>
            Save name
          </Button>
          <Button type="button" variant="secondary" onClick={() => setRenaming(null)}>
            Cancel
          </Button>
        </form>
      )}
      {confirmDelete && (
        <div className="mb-6">
          <Notice tone="warning" title={`Delete “${c.name}”?`}>
            <p>Its slides go with it; its screens show the holding screen until they get another channel.</p>
            <div className="mt-2 flex gap-2">
              <Button
                variant="danger"
                busy={del.isPending}
                onClick={() => del.mutate(c.id, { onSuccess: () => navigate(paths.publishing.href()) })}
              >
                Delete channel
              </Button>
              <Button variant="secondary" onClick={() => setConfirmDelete(false)}>
                Keep it
              </Button>
            </div>
          </Notice>
        </div>
      )}
      <div className="grid grid-cols-1 gap-8 xl:grid-cols-[minmax(0,1fr)_28rem]">
        <section aria-labelledby="slides-heading" className="space-y-4">
          <h2 id="slides-heading" className="text-lg font-semibold text-ink">
            Slides
          </h2>
          {listError && <Notice tone="error">{listError}</Notice>}
          <SlideList
            channel={{ ...c, slides: shown }}
            busy={busy}
            onReorder={(ids) => {
              remove.reset();
              // A slide waiting to be removed is still on the server: it keeps its place at the end until it goes.
              reorder.mutate(undoable.waiting ? [...ids, undoable.waiting.id] : ids);
            }}
            onRemove={(id) => {
              const slide = c.slides.find((s) => s.id === id);
              undoable.remove(id, slide ? slideTitle(slide) : 'The slide');
            }}
            onUpdate={(slideId, input) => update.mutate({ slideId, ...input })}
            updateError={
              update.error && update.variables
                ? {
                    slideId: update.variables.slideId,
                    message: update.error.message,
                    fields: update.error instanceof ApiRequestError ? update.error.fields : undefined,
                  }
                : null
            }
          />
          {c.can.update && <AddSlideForm busy={add.isPending} error={message(add.error)} onAdd={(input) => add.mutate(input)} />}
        </section>
        <aside className="space-y-6">
          <section aria-labelledby="preview-heading" className="space-y-2">
            <h2 id="preview-heading" className="text-lg font-semibold text-ink">
              Preview
            </h2>
            <PlayerPreview channelId={c.id} version={c.version} />
          </section>
          <section aria-labelledby="screens-heading" className="space-y-2 rounded-lg border border-rule bg-panel p-4">
            <h2 id="screens-heading" className="text-lg font-semibold text-ink">
              Screens
            </h2>
            {screens.error && <Notice tone="error">{screens.error.message}</Notice>}
            <ScreensPicker channel={c} busy={screens.isPending} onSave={(ids) => screens.mutate(ids)} />
          </section>
          <section aria-labelledby="languages-heading" className="space-y-2 rounded-lg border border-rule bg-panel p-4">
            <h2 id="languages-heading" className="text-lg font-semibold text-ink">
              Languages
            </h2>
            <ChannelLanguages channel={c} />
          </section>
          {c.can.update && (
            <section aria-labelledby="options-heading" className="space-y-2 rounded-lg border border-rule bg-panel p-4">
              <h2 id="options-heading" className="text-lg font-semibold text-ink">
                Screen options
              </h2>
              <ChannelSettingsForm
                key={c.version}
                channel={c}
                busy={settings.isPending}
                error={
                  settings.error instanceof ApiRequestError
                    ? (settings.error.fields?.silenceAlertMinutes ?? settings.error.message)
                    : (message(settings.error) ?? undefined)
                }
                onSave={(input) => settings.mutate(input)}
              />
            </section>
          )}
        </aside>
      </div>
      {undoable.waiting && (
        <UndoToast
          key={undoable.waiting.id}
          message={`“${undoable.waiting.label}” removed from the channel.`}
          until={undoable.waiting.until}
          onUndo={undoable.undo}
        />
      )}
    </>
  );
}
