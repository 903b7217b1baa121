import { useRef, useState, type DragEvent } from 'react';
import { ACCEPT_ATTRIBUTE, ACCEPTED_IMAGE_TYPES } from '@shared/media/limits.ts';
import { uploadMedia } from '@/api/media-upload.ts';
import { useRefreshMedia } from '@/api/media.ts';
import { Icon } from '@/components/ui/icon.tsx';

interface UploadItem {
  key: string;
  name: string;
  progress: number;
  state: 'uploading' | 'done' | 'failed';
  message?: string;
  mediaId?: string;
}

const megabytes = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

/** Drag-and-drop (or chosen) uploads, one progress bar per file; finished files open for describing. */
export function UploadPanel({ maxBytes, onOpen }: { maxBytes: number; onOpen: (id: string) => void }) {
  const [items, setItems] = useState<UploadItem[]>([]);
  const [dragging, setDragging] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const refresh = useRefreshMedia();
  const update = (key: string, change: Partial<UploadItem>) =>
    setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));

  function start(files: Iterable<File>) {
    for (const file of files) {
      const key = crypto.randomUUID();
      if (file.size > maxBytes) {
        setItems((all) => [
          { key, name: file.name, progress: 0, state: 'failed', message: `Larger than the ${megabytes(maxBytes)} limit.` },
          ...all,
        ]);
        continue;
      }
      setItems((all) => [{ key, name: file.name, progress: 0, state: 'uploading' }, ...all]);
      uploadMedia(file, (progress) => update(key, { progress }))
        .then((media) => {
          update(key, { state: 'done', progress: 1, mediaId: media.id });
          void refresh();
        })
        .catch((error: Error) => update(key, { state: 'failed', message: error.message }));
    }
  }

  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    start(event.dataTransfer.files);
  };

  return (
    <section aria-label="Upload images" className="space-y-3">
      {/* biome-ignore lint/a11y/noStaticElementInteractions: dropping files is a pointer shortcut; the file button inside does the same from the keyboard */}
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        data-testid="drop-zone"
        className={`flex flex-col items-center gap-2 rounded-lg border-2 border-dashed px-6 py-7 text-center ${dragging ? 'border-accent bg-accent/5' : 'border-rule bg-panel'}`}
      >
        <Icon name="upload" className="size-6 text-muted" />
        <p className="text-sm text-ink">
          Drop images here, or{' '}
          <button
            type="button"
            className="font-medium text-accent underline-offset-2 hover:underline"
            onClick={() => input.current?.click()}
          >
            choose files
          </button>
        </p>
        <p className="text-xs text-muted">
          {ACCEPTED_IMAGE_TYPES.join(', ')} · up to {megabytes(maxBytes)} each · add credit, licence, source and alt text after
          uploading
        </p>
        <input
          ref={input}
          type="file"
          multiple
          accept={ACCEPT_ATTRIBUTE}
          className="sr-only"
          aria-label="Choose images to upload"
          onChange={(e) => {
            if (e.target.files) start(Array.from(e.target.files));
            e.target.value = '';
          }}
        />
      </div>
      {items.length > 0 && (
        <ul className="divide-y divide-rule rounded-lg border border-rule bg-panel" aria-label="Uploads">
          {items.map((item) => (
            <UploadRow key={item.key} item={item} onOpen={onOpen} />
          ))}
        </ul>
      )}
    </section>
  );
}

function UploadRow({ item, onOpen }: { item: UploadItem; onOpen: (id: string) => void }) {
  const percent = Math.round(item.progress * 100);
  return (
    <li className="flex items-center gap-4 px-4 py-2.5 text-sm">
      <span className="w-56 shrink-0 truncate font-medium" title={item.name}>
        {item.name}
      </span>
      <div
        role="progressbar"
        aria-label={`Upload of ${item.name}`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-1.5 flex-1 overflow-hidden rounded-full bg-wash"
      >
        <div
          className={`h-full rounded-full ${item.state === 'failed' ? 'bg-broken' : item.state === 'done' ? 'bg-ok' : 'bg-accent'}`}
          style={{ width: `${item.state === 'failed' ? 100 : percent}%` }}
        />
      </div>
      <span className="w-72 shrink-0 text-right">
        {item.state === 'uploading' && <span className="text-muted tabular-nums">{percent}%</span>}
        {item.state === 'done' && (
          <span className="inline-flex items-center gap-2 text-ok">
            <Icon name="check" className="size-4" />
            Uploaded
            <button type="button" className="font-medium text-accent hover:underline" onClick={() => onOpen(item.mediaId!)}>
              Describe it
            </button>
          </span>
        )}
        {item.state === 'failed' && (
          <span role="alert" className="inline-flex items-start gap-1.5 text-left text-broken">
            <Icon name="alert" className="mt-0.5 size-4 shrink-0" />
            {item.message}
          </span>
        )}
      </span>
    </li>
  );
}
