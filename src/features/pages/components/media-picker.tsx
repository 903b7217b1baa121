import { useState } from 'react';
import { useMediaSearch } from '@/api/media.ts';
import { Button } from '@/components/ui/button.tsx';

/** Chooses an image from the media library (images are uploaded there, with their credits). */
export function MediaPicker({ onPick, onClose }: { onPick: (mediaId: string) => void; onClose: () => void }) {
  const [q, setQ] = useState('');
  const media = useMediaSearch(q);
  return (
    <div
      role="dialog"
      aria-label="Insert an image"
      className="space-y-3 rounded-lg border border-accent/40 bg-panel p-4 shadow-lg"
    >
      <div className="flex items-center justify-between">
        <h2 className="font-semibold">Insert an image from the library</h2>
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </div>
      <input
        type="search"
        aria-label="Search images"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        placeholder="Search by name, object or credit"
        className="block w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm"
      />
      <div className="grid max-h-72 grid-cols-3 gap-2 overflow-y-auto">
        {(media.data ?? []).map((m) => (
          <button
            key={m.id}
            type="button"
            onClick={() => onPick(m.id)}
            className="rounded border border-rule p-1 text-left text-xs hover:border-accent"
          >
            {m.thumbnailUrl ? (
              <img src={m.thumbnailUrl} alt={m.altText} className="aspect-video w-full rounded object-cover" />
            ) : (
              <span className="grid aspect-video place-items-center bg-wash">No preview</span>
            )}
            <span className="mt-1 block truncate">{m.fileName}</span>
            {m.missing.length > 0 && <span className="block text-changed">Incomplete: not publishable yet</span>}
          </button>
        ))}
      </div>
      {media.data?.length === 0 && (
        <p className="text-sm text-muted">No images found. Upload images in the media library first.</p>
      )}
    </div>
  );
}
