import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { useStatement } from '@/api/statements.ts';
import { Icon } from '@/components/ui/icon.tsx';
import { usePageEditorContext } from '../editor-context.tsx';

/**
 * A statement in the page: its current public wording in the page's locale, looked up, never
 * typed. A click shows its working beside the page.
 */
export function StatementRefView({ node, selected }: ReactNodeViewProps) {
  const id = String(node.attrs.statementId);
  const { locale, openStatement } = usePageEditorContext();
  const statement = useStatement(id);
  const s = statement.data;
  const text = s?.texts?.[locale];
  const state = s?.status ?? 'current';
  return (
    <NodeViewWrapper
      as="span"
      className={`statement-ref ${selected ? 'is-selected' : ''} statement-${state}`}
      data-statement-id={id}
      contentEditable={false}
    >
      <button
        type="button"
        className="statement-ref-button"
        onClick={() => openStatement(id)}
        title="Checked statement: show its working"
      >
        {statement.isPending ? 'Loading statement…' : (text ?? `[${s?.template.title ?? 'Statement'}: cannot be worked out]`)}
        <Icon
          name={state === 'current' ? 'check' : 'alert'}
          className="statement-ref-mark"
          label={state === 'current' ? 'checked statement' : `statement ${state}`}
        />
      </button>
    </NodeViewWrapper>
  );
}
