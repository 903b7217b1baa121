import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { REQUIREMENT_LABELS } from '@shared/media/schemas.ts';
import { useMedia } from '@/api/media.ts';
import { pickRendition } from '@/lib/renditions.ts';

/** An image from the library with its caption (editable here), credit and licence. */
export function MediaImageView({ node, updateAttributes, selected }: ReactNodeViewProps) {
  const media = useMedia(String(node.attrs.mediaId));
  const m = media.data;
  const page = pickRendition(m?.renditions, 'page');
  return (
    <NodeViewWrapper as="figure" className={`media-block ${selected ? 'is-selected' : ''}`} data-drag-handle="">
      {page ? (
        <img src={page.url} alt={m?.altText ?? ''} className="max-h-96 w-auto rounded" />
      ) : (
        <div className="grid h-40 place-items-center rounded bg-wash font-sans text-sm text-muted">
          {media.isPending ? 'Loading image…' : 'Image not available'}
        </div>
      )}
      <figcaption className="mt-2 space-y-1 font-sans text-sm" contentEditable={false}>
        <input
          aria-label="Caption"
          placeholder="Caption (optional)"
          value={(node.attrs.caption as string | null) ?? ''}
          onChange={(e) => updateAttributes({ caption: e.target.value || null })}
          className="w-full rounded border border-rule bg-panel px-2 py-1"
        />
        <span className="block text-xs text-muted">
          {[m?.credit, m?.licence?.label].filter(Boolean).join(' · ') || 'No credit yet'}
        </span>
        {m && m.missing.length > 0 && (
          <span className="block text-xs text-changed">
            Before approval this image needs: {m.missing.map((x) => REQUIREMENT_LABELS[x]).join(', ')}.
          </span>
        )}
      </figcaption>
    </NodeViewWrapper>
  );
}
