import { useState } from 'react';
import { useAddComment, useComments } from '@/api/page-comments.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

/** The conversation on a page, oldest first, each comment with the revision it was about. */
export function PageComments({ pageId, canComment }: { pageId: string; canComment: boolean }) {
  const comments = useComments(pageId);
  const add = useAddComment(pageId);
  const [body, setBody] = useState('');
  return (
    <section aria-labelledby="comments" className="space-y-3">
      <h2 id="comments" className="font-semibold">
        Comments
      </h2>
      <ul className="space-y-2">
        {(comments.data ?? []).map((c) => (
          <li key={c.id} className="rounded-md border border-rule bg-panel px-3 py-2 text-sm">
            <p className="whitespace-pre-wrap">{c.body}</p>
            <p className="mt-1 text-xs text-muted">
              {c.author ?? 'Former staff'} · {formatDateTime(c.createdAt)}
              {c.revisionNumber ? ` · on revision ${c.revisionNumber}` : ''}
            </p>
          </li>
        ))}
        {comments.data?.length === 0 && <li className="text-sm text-muted">No comments yet.</li>}
      </ul>
      {canComment && (
        <form
          className="space-y-2"
          onSubmit={(e) => {
            e.preventDefault();
            add.mutate(body, { onSuccess: () => setBody('') });
          }}
        >
          <label htmlFor="new-comment" className="block text-sm font-medium">
            Add a comment
          </label>
          <textarea
            id="new-comment"
            rows={3}
            value={body}
            onChange={(e) => setBody(e.target.value)}
            className="w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm"
          />
          {add.error && <Notice tone="error">{add.error.message}</Notice>}
          <Button type="submit" variant="secondary" busy={add.isPending} disabled={!body.trim()}>
            Comment
          </Button>
        </form>
      )}
    </section>
  );
}
