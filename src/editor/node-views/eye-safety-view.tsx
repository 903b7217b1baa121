import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { Icon } from '@/components/ui/icon.tsx';
import { usePageEditorContext } from '../editor-context.tsx';

/** The eye-safety notice block: the organisation's wording, shown as it will be published. */
export function EyeSafetyView({ selected }: ReactNodeViewProps) {
  const { eyeSafetyNotice } = usePageEditorContext();
  return (
    <NodeViewWrapper
      as="aside"
      className={`eye-safety-block ${selected ? 'is-selected' : ''}`}
      contentEditable={false}
      data-drag-handle=""
    >
      <Icon name="shield" className="mt-0.5 size-5 shrink-0" />
      <div>
        <p className="font-sans text-sm font-semibold">Eye safety</p>
        <p className="text-[15px]">{eyeSafetyNotice || 'The organisation’s eye-safety notice appears here.'}</p>
        <p className="mt-1 font-sans text-xs text-muted">Set by your organisation; edited by an admin, not here.</p>
      </div>
    </NodeViewWrapper>
  );
}
