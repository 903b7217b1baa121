import type { JSONContent } from '@tiptap/core';
import { EditorContent, useEditor, useEditorState } from '@tiptap/react';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import type { PageDto } from '@shared/schemas/page.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { ConflictView } from '@/features/pages/components/conflict-view.tsx';
import { MediaPicker } from '@/features/pages/components/media-picker.tsx';
import { NumberCheckPanel, type LiveFlag } from '@/features/pages/components/number-check-panel.tsx';
import type { PhraseFit } from '@/features/pages/components/phrase-fit.ts';
import { StatementPicker } from '@/features/pages/components/statement-picker.tsx';
import { StatementWorking } from '@/features/pages/components/statement-working.tsx';
import { PageEditorContext } from './editor-context.tsx';
import { clientExtensions } from './extensions.ts';
import { dropLocalDraft, readLocalDraft, type LocalDraft } from './local-draft.ts';
import { flagRanges, surroundings, type FlagRange } from './number-flags.ts';
import { cleanPastedHtml } from './paste-clean.ts';
import { Toolbar } from './toolbar.tsx';
import { SaveStatus } from './save-status.tsx';
import { useAutosave } from './use-autosave.ts';
import './editor.css';

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** Handles a page's editor screen gives back to its header: save now, and the version saved. */
export interface WorkspaceHandle {
  flush: () => Promise<number>;
  /** The hand-typed numbers on the page now that no reviewer has resolved (one per wording). */
  openFlags: () => string[];
}

/**
 * The writing desk: title, toolbar, the page in serif with live statements and the number check,
 * autosave with a local copy, and a side column for flags, statements and their working.
 */
export function PageWorkspace({
  page,
  eyeSafetyNotice,
  onSaved,
  handleRef,
}: {
  page: PageDto;
  eyeSafetyNotice: string;
  onSaved: (page: PageDto) => void;
  handleRef: React.MutableRefObject<WorkspaceHandle | null>;
}) {
  const [title, setTitle] = useState(page.title);
  const titleRef = useRef(page.title);
  const [picker, setPicker] = useState<{ replace?: FlagRange } | null>(null);
  const [mediaPicker, setMediaPicker] = useState(false);
  const [working, setWorking] = useState<string | null>(null);
  const [restore, setRestore] = useState<LocalDraft | null>(null);
  const editable = page.can.edit;
  const autosaveRef = useRef<(() => void) | null>(null);

  const editor = useEditor({
    extensions: clientExtensions,
    content: page.doc as JSONContent,
    editable,
    immediatelyRender: true,
    editorProps: {
      // The text's language (a French version is French): spell-checking, hyphenation and screen readers follow it.
      attributes: {
        class: 'page-prose',
        'aria-label': 'Page text',
        role: 'textbox',
        'aria-multiline': 'true',
        lang: page.locale,
      },
      transformPastedHTML: cleanPastedHtml,
    },
    onUpdate: () => autosaveRef.current?.(),
  });
  const read = useCallback(() => ({ title: titleRef.current, doc: editor.getJSON() }), [editor]);
  const autosave = useAutosave({ pageId: page.id, version: page.version, read, onSaved });
  autosaveRef.current = editable ? autosave.changed : null;
  const openFlagsRef = useRef<string[]>([]);
  handleRef.current = { flush: autosave.flush, openFlags: () => openFlagsRef.current };

  // No update event: becoming read-only is not an edit to save.
  useEffect(() => editor.setEditable(editable, false), [editor, editable]);

  // A copy kept in this browser that the server never confirmed: restore it or offer a choice.
  // Only when a page is opened (not after each save), so the rest is read from a ref that
  // always holds this render's values.
  const openedRef = useRef({ page, editable, editor, changed: autosave.changed });
  openedRef.current = { page, editable, editor, changed: autosave.changed };
  const pageId = page.id;
  useEffect(() => {
    const { page: opened, editable: canEdit, editor: openedEditor, changed } = openedRef.current;
    const draft = readLocalDraft(pageId);
    if (!draft || !canEdit) return;
    if (same(draft.doc, opened.doc) && draft.title === opened.title) return dropLocalDraft(pageId);
    if (draft.baseVersion === opened.version) {
      openedEditor.commands.setContent(draft.doc);
      titleRef.current = draft.title;
      setTitle(draft.title);
      changed();
    } else setRestore(draft);
  }, [pageId]);

  const ranges = useEditorState({ editor, selector: ({ editor: e }) => flagRanges(e.state.doc), equalityFn: same });
  const flags: LiveFlag[] = useMemo(() => {
    const resolved = new Map(page.flags.map((f) => [f.normalised, f.resolution]));
    return (ranges ?? []).map((r) => ({ ...r, resolution: resolved.get(r.normalised) ?? null }));
  }, [ranges, page.flags]);
  openFlagsRef.current = [...new Map(flags.filter((f) => !f.resolution).map((f) => [f.normalised, f.text])).values()];

  const apply = (t: string, doc: JSONContent) => {
    editor.commands.setContent(doc);
    titleRef.current = t;
    setTitle(t);
  };

  const insertStatement = (statementId: string, fit?: PhraseFit) => {
    const node = { type: 'statementRef', attrs: { statementId } };
    const chain = editor.chain().focus();
    const replace = picker?.replace;
    if (replace)
      chain
        .insertContentAt({ from: replace.from - (fit?.absorbBefore ?? 0), to: replace.to - (fit?.keepAfter ?? 0) }, node)
        .run();
    else chain.insertContent(node).run();
    setPicker(null);
  };
  // The paragraph around a number being replaced, for the picker's preview.
  const replacing = picker?.replace ? surroundings(editor.state.doc, picker.replace) : undefined;

  const context = useMemo(
    () => ({ locale: page.locale, eyeSafetyNotice, openStatement: setWorking }),
    [page.locale, eyeSafetyNotice],
  );

  return (
    <PageEditorContext.Provider value={context}>
      {restore && (
        <div className="mb-6">
          <ConflictView
            message="This browser kept changes that were never saved, and the page has been saved since. Compare them and choose."
            mine={restore}
            theirs={{ title: page.title, doc: page.doc as JSONContent, by: page.revision.author }}
            onKeepMine={() => {
              apply(restore.title, restore.doc);
              setRestore(null);
              autosave.changed();
            }}
            onTakeTheirs={() => {
              dropLocalDraft(page.id);
              setRestore(null);
            }}
          />
        </div>
      )}
      {autosave.conflict && (
        <div className="mb-6">
          <ConflictView
            message={autosave.message ?? ''}
            mine={autosave.conflict.mine}
            theirs={{
              title: autosave.conflict.theirs.title,
              doc: autosave.conflict.theirs.doc as JSONContent,
              by: autosave.conflict.theirs.savedBy,
            }}
            onKeepMine={() => autosave.resolve('mine', apply)}
            onTakeTheirs={() => autosave.resolve('theirs', apply)}
          />
        </div>
      )}
      {/* The side column widens while a statement's working is open: its value table needs the room. */}
      <div
        className={`grid gap-6 ${working ? 'lg:grid-cols-[minmax(0,1fr)_22rem] xl:grid-cols-[minmax(0,1fr)_26rem]' : 'lg:grid-cols-[minmax(0,1fr)_18rem]'}`}
      >
        <div className="min-w-0 space-y-3">
          <label className="block">
            <span className="sr-only">Title</span>
            {/* A textarea that grows, so a long title wraps instead of being cut off beside the side panel; it stays one line of text. */}
            <textarea
              rows={1}
              value={title}
              readOnly={!editable}
              onKeyDown={(e) => {
                if (e.key === 'Enter') e.preventDefault();
              }}
              onChange={(e) => {
                const t = e.target.value.replace(/\s*\n\s*/g, ' ');
                titleRef.current = t;
                setTitle(t);
                autosave.changed();
              }}
              className="field-sizing-content w-full resize-none border-0 border-b border-transparent bg-transparent font-serif text-3xl font-semibold text-ink focus:border-accent focus:outline-none"
              aria-label="Title"
            />
          </label>
          {editable && <Toolbar editor={editor} onStatement={() => setPicker({})} onImage={() => setMediaPicker(true)} />}
          {!editable && (
            <Notice tone="info" title="Read-only">
              {page.status === 'in_review'
                ? 'This page is with the reviewers; it cannot be changed until it is sent back or withdrawn.'
                : 'You can read this page but not change it.'}
              {page.can.review && page.status !== 'draft' && (
                <>
                  {' '}
                  <Link to={paths.pageReview.href(page.id)} className="font-medium text-accent underline">
                    Sign off in the review view
                  </Link>
                </>
              )}
            </Notice>
          )}
          <div className={`rounded-b-lg border border-rule bg-panel ${editable ? 'border-t-0' : 'rounded-t-lg'}`}>
            <EditorContent editor={editor} />
          </div>
        </div>
        <div className="min-w-0 space-y-4">
          <SaveStatus state={autosave.state} message={autosave.message} savedAt={autosave.savedAt} editable={editable} />
          {picker && (
            <StatementPicker
              defaultObject={page.object}
              locale={page.locale}
              replacing={replacing}
              onPick={insertStatement}
              onClose={() => setPicker(null)}
            />
          )}
          {mediaPicker && (
            <MediaPicker
              onPick={(mediaId) => {
                editor
                  .chain()
                  .focus()
                  .insertContent({ type: 'mediaImage', attrs: { mediaId, caption: null } })
                  .run();
                setMediaPicker(false);
              }}
              onClose={() => setMediaPicker(false)}
            />
          )}
          {working && <StatementWorking id={working} locale={page.locale} onClose={() => setWorking(null)} />}
          <NumberCheckPanel
            flags={flags}
            onConvert={editable ? (f) => setPicker({ replace: f }) : undefined}
            onShow={(f) => editor.chain().focus().setTextSelection({ from: f.from, to: f.to }).scrollIntoView().run()}
          />
          {page.eyeSafety.required && (
            <Notice tone={page.eyeSafety.present ? 'success' : 'warning'} title="Eye safety">
              {page.eyeSafety.required}.{' '}
              {page.eyeSafety.present ? 'The notice is on the page.' : 'Add the eye-safety notice block before submitting.'}
            </Notice>
          )}
        </div>
      </div>
    </PageEditorContext.Provider>
  );
}
