import type { MediaDto } from '@shared/media/schemas.ts';
import { Icon } from '@/components/ui/icon.tsx';
import { MediaStatus } from './media-status.tsx';

/** The library as a grid of cards; choosing one opens its details. */
export function MediaGrid({ items, onOpen }: { items: MediaDto[]; onOpen: (id: string) => void }) {
  return (
    <ul className="grid grid-cols-[repeat(auto-fill,minmax(13rem,1fr))] gap-4" aria-label="Images">
      {items.map((media) => (
        <li key={media.id}>
          <button
            type="button"
            onClick={() => onOpen(media.id)}
            className="group block w-full overflow-hidden rounded-lg border border-rule bg-panel text-left hover:border-accent"
          >
            {/* No aria-label: the card's own text (name, credit, licence, state) is its accessible name, so speech input users can say what they see. */}
            <div className="flex aspect-[4/3] items-center justify-center bg-wash">
              {media.thumbnailUrl ? (
                <img src={media.thumbnailUrl} alt={media.altText} className="h-full w-full object-cover" loading="lazy" />
              ) : (
                <Icon name="image" className="size-8 text-muted" />
              )}
            </div>
            <div className="space-y-1 px-3 py-2.5 text-xs">
              <p className="truncate text-sm font-medium text-ink" title={media.fileName}>
                {media.fileName}
              </p>
              <p className="truncate text-muted">{media.credit || 'No credit yet'}</p>
              <p className="truncate text-muted">{media.licence?.label ?? 'No licence yet'}</p>
              <MediaStatus media={media} />
            </div>
          </button>
        </li>
      ))}
    </ul>
  );
}
