import { REQUIREMENT_LABELS, type MediaDto } from '@shared/media/schemas.ts';
import { Icon } from '@/components/ui/icon.tsx';

/** Whether an image may go on an approved page, in words with an icon (never colour alone). */
export function MediaStatus({ media }: { media: Pick<MediaDto, 'missing' | 'renditionsStatus'> }) {
  if (media.renditionsStatus === 'failed') {
    return (
      <span className="inline-flex items-center gap-1 text-broken">
        <Icon name="alert" className="size-3.5" />
        Renditions failed
      </span>
    );
  }
  if (media.renditionsStatus !== 'ready') {
    return (
      <span className="inline-flex items-center gap-1 text-neutral">
        <Icon name="image" className="size-3.5" />
        Making renditions…
      </span>
    );
  }
  if (media.missing.length === 0) {
    return (
      <span className="inline-flex items-center gap-1 text-ok">
        <Icon name="check" className="size-3.5" />
        Ready to publish
      </span>
    );
  }
  return (
    <span className="inline-flex items-start gap-1 text-changed">
      <Icon name="alert" className="mt-0.5 size-3.5 shrink-0" />
      Needs {media.missing.map((m) => REQUIREMENT_LABELS[m]).join(', ')}
    </span>
  );
}
