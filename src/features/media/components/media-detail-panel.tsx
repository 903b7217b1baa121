import { useEffect, useRef, useState } from 'react';
import type { MediaDetailDto } from '@shared/media/schemas.ts';
import { useDeleteMedia, useMedia, useRetryRenditions } from '@/api/media.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { MediaDetailsForm } from './media-details-form.tsx';
import { MediaStatus } from './media-status.tsx';
import { pickRendition } from '@/lib/renditions.ts';
import { describeRendition } from '@shared/media/renditions.ts';

/** Where an image is used, in words (the codes are the usage providers' names). */
const USAGE_KINDS: Record<string, string> = { page: 'Page:', channel: '' };

const sizeFormat = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });
const bytesText = (b: number) =>
  b >= 1024 * 1024 ? `${sizeFormat.format(b / (1024 * 1024))} MB` : `${sizeFormat.format(b / 1024)} KB`;

/** One image's details in a panel that slides over the grid, so the library stays in view. */
export function MediaDetailPanel({ id, onClose }: { id: string; onClose: () => void }) {
  const media = useMedia(id);
  const heading = useRef<HTMLHeadingElement>(null);
  // biome-ignore lint/correctness/useExhaustiveDependencies: runs again on purpose when another image opens in the same panel, so focus moves to its heading
  useEffect(() => heading.current?.focus(), [id]);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && onClose();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);
  return (
    <aside
      role="dialog"
      aria-modal="false"
      aria-labelledby="media-panel-title"
      className="fixed inset-y-0 right-0 z-30 flex w-full max-w-md flex-col border-l border-rule bg-panel shadow-2xl"
    >
      <div className="flex items-center justify-between border-b border-rule px-5 py-3">
        <h2 id="media-panel-title" ref={heading} tabIndex={-1} className="truncate text-base font-semibold focus:outline-none">
          {media.data?.fileName ?? 'Image'}
        </h2>
        <button
          type="button"
          onClick={onClose}
          aria-label="Close details"
          className="rounded p-1 text-muted hover:bg-wash hover:text-ink"
        >
          <Icon name="x" className="size-5" />
        </button>
      </div>
      <div className="flex-1 space-y-5 overflow-y-auto px-5 py-4">
        {media.isPending && <p className="text-sm text-muted">Loading…</p>}
        {media.error && <Notice tone="error">{media.error.message}</Notice>}
        {media.data && <PanelBody media={media.data} onDeleted={onClose} />}
      </div>
    </aside>
  );
}

function PanelBody({ media, onDeleted }: { media: MediaDetailDto; onDeleted: () => void }) {
  const page = pickRendition(media.renditions, 'page');
  const retry = useRetryRenditions();
  return (
    <>
      <dl className="grid grid-cols-[7rem_1fr] gap-x-3 gap-y-1 text-sm">
        <dt className="text-muted">Size</dt>
        <dd className="tabular-nums">
          {media.width} × {media.height} px · {bytesText(media.bytes)} · {media.format.toUpperCase()}
        </dd>
        <dt className="text-muted">Uploaded by</dt>
        <dd>{media.uploadedBy?.name ?? 'A former member of staff'}</dd>
        <dt className="text-muted">Status</dt>
        <dd>
          <MediaStatus media={media} />
        </dd>
      </dl>
      {media.renditionsStatus === 'failed' && (
        <Notice tone="error" title="The renditions could not be made">
          <p>{media.renditionsError}</p>
          <Button variant="secondary" className="mt-2" busy={retry.isPending} onClick={() => retry.mutate(media.id)}>
            Try again
          </Button>
        </Notice>
      )}
      <MediaDetailsForm key={media.id} media={media} preview={page?.url ?? media.thumbnailUrl} />
      <Renditions media={media} />
      <Usage media={media} onDeleted={onDeleted} />
    </>
  );
}

function Renditions({ media }: { media: MediaDetailDto }) {
  const names = [...new Set(media.renditions.map((r) => r.name))];
  if (!names.length) return null;
  return (
    <section aria-labelledby="renditions-title">
      <h3 id="renditions-title" className="mb-1 text-sm font-semibold">
        Renditions
      </h3>
      <table className="w-full text-left text-xs">
        <tbody>
          {names.map((name) => {
            const set = media.renditions.filter((r) => r.name === name);
            const about = describeRendition(name, set[0].width, set[0].height);
            return (
              <tr key={name} className="border-b border-rule last:border-0">
                <th scope="row" className="py-1.5 pr-2 font-medium">
                  {about.label}
                  {about.warning && (
                    <p className="mt-0.5 font-normal text-changed">
                      <Icon name="alert" className="mr-1 inline size-3" />
                      {about.warning}
                    </p>
                  )}
                </th>
                <td className="py-1.5 pr-2 tabular-nums text-muted">
                  {set[0].width} × {set[0].height}
                </td>
                <td className="py-1.5 text-right">
                  {set.map((r) => (
                    <a key={r.format} href={r.url} target="_blank" rel="noreferrer" className="ml-2 text-accent hover:underline">
                      {r.format.toUpperCase()} <span className="text-muted">{bytesText(r.bytes)}</span>
                    </a>
                  ))}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </section>
  );
}

function Usage({ media, onDeleted }: { media: MediaDetailDto; onDeleted: () => void }) {
  const remove = useDeleteMedia();
  const [confirming, setConfirming] = useState(false);
  const inUse = media.usage.length + media.hiddenUsageCount;
  return (
    <section aria-labelledby="usage-title" className="space-y-2 border-t border-rule pt-4">
      <h3 id="usage-title" className="text-sm font-semibold">
        Where it is used
      </h3>
      {inUse === 0 ? (
        <p className="text-sm text-muted">Not used on any page or kiosk channel.</p>
      ) : (
        <ul className="list-disc pl-5 text-sm">
          {media.usage.map((u) => (
            <li key={`${u.kind}-${u.id}`}>
              {(USAGE_KINDS[u.kind] ?? 'Used by:') && <span className="text-muted">{USAGE_KINDS[u.kind] ?? 'Used by:'}</span>}{' '}
              {u.title}
            </li>
          ))}
          {media.hiddenUsageCount > 0 && (
            <li className="text-muted">
              {media.usage.length ? 'and ' : ''}
              {media.hiddenUsageCount === 1 ? 'a private draft' : `${media.hiddenUsageCount} private drafts`} by other writers
            </li>
          )}
        </ul>
      )}
      {media.can.delete && inUse === 0 && !confirming && (
        <Button variant="danger" onClick={() => setConfirming(true)}>
          <Icon name="trash" className="size-4" />
          Delete image
        </Button>
      )}
      {confirming && (
        <div className="flex flex-wrap items-center gap-2 rounded-md border border-broken/40 bg-broken/5 p-3 text-sm">
          <span>Delete this image and all its renditions?</span>
          <Button variant="danger" busy={remove.isPending} onClick={() => remove.mutate(media.id, { onSuccess: onDeleted })}>
            Delete
          </Button>
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </div>
      )}
      {inUse > 0 && <p className="text-xs text-muted">An image in use cannot be deleted. Remove it from these places first.</p>}
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
    </section>
  );
}
