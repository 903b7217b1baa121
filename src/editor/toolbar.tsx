import type { Editor } from '@tiptap/react';
import { useEditorState } from '@tiptap/react';
import { isSafeHref } from '@shared/editor/extensions.ts';
import { Icon, type IconName } from '@/components/ui/icon.tsx';

function Tool({
  label,
  icon,
  text,
  active,
  onClick,
}: {
  label: string;
  icon?: IconName;
  text?: string;
  active?: boolean;
  onClick: () => void;
}) {
  return (
    <button
      type="button"
      aria-label={label}
      aria-pressed={active}
      title={label}
      onMouseDown={(e) => e.preventDefault()}
      onClick={onClick}
      className={`inline-flex h-8 min-w-8 items-center justify-center gap-1 rounded px-2 text-sm ${active ? 'bg-accent/15 text-accent' : 'text-ink hover:bg-wash'}`}
    >
      {icon && <Icon name={icon} className="size-4" />}
      {text}
    </button>
  );
}

/** The editor's toolbar: structure, marks, links, and our own blocks (statement, image, eye-safety notice). */
export function Toolbar({ editor, onStatement, onImage }: { editor: Editor; onStatement: () => void; onImage: () => void }) {
  const s = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      h2: e.isActive('heading', { level: 2 }),
      h3: e.isActive('heading', { level: 3 }),
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      bullet: e.isActive('bulletList'),
      ordered: e.isActive('orderedList'),
      quote: e.isActive('blockquote'),
      link: e.isActive('link'),
    }),
  });
  const link = () => {
    if (s.link) return editor.chain().focus().unsetLink().run();
    const href = window.prompt('Link address (https://… or mailto:…)');
    if (!href) return;
    if (!isSafeHref(href)) {
      window.alert('Links must start with https://, http:// or mailto:.');
      return;
    }
    editor.chain().focus().extendMarkRange('link').setLink({ href }).run();
  };
  return (
    <div
      role="toolbar"
      aria-label="Formatting"
      className="sticky top-0 z-10 flex flex-wrap items-center gap-0.5 rounded-t-lg border border-rule bg-panel px-2 py-1"
    >
      <Tool label="Heading" text="H2" active={s.h2} onClick={() => editor.chain().focus().toggleHeading({ level: 2 }).run()} />
      <Tool label="Subheading" text="H3" active={s.h3} onClick={() => editor.chain().focus().toggleHeading({ level: 3 }).run()} />
      <span className="mx-1 h-5 w-px bg-rule" />
      <Tool label="Bold" icon="bold" active={s.bold} onClick={() => editor.chain().focus().toggleBold().run()} />
      <Tool label="Italic" icon="italic" active={s.italic} onClick={() => editor.chain().focus().toggleItalic().run()} />
      <Tool label="Link" icon="link" active={s.link} onClick={link} />
      <span className="mx-1 h-5 w-px bg-rule" />
      <Tool label="Bulleted list" icon="list" active={s.bullet} onClick={() => editor.chain().focus().toggleBulletList().run()} />
      <Tool label="Numbered list" text="1." active={s.ordered} onClick={() => editor.chain().focus().toggleOrderedList().run()} />
      <Tool label="Quote" text="“ ”" active={s.quote} onClick={() => editor.chain().focus().toggleBlockquote().run()} />
      <span className="mx-1 h-5 w-px bg-rule" />
      <Tool label="Insert statement" icon="quote" text="Statement" onClick={onStatement} />
      <Tool label="Insert image" icon="image" text="Image" onClick={onImage} />
      <Tool
        label="Eye-safety notice"
        icon="shield"
        text="Eye-safety notice"
        onClick={() => editor.chain().focus().insertContent({ type: 'eyeSafetyNotice' }).run()}
      />
    </div>
  );
}
