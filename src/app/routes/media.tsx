import { useCallback, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { MediaListQuery } from '@shared/media/schemas.ts';
import { useMediaList } from '@/api/media.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { MediaDetailPanel } from '@/features/media/components/media-detail-panel.tsx';
import { MediaFilters } from '@/features/media/components/media-filters.tsx';
import { MediaGrid } from '@/features/media/components/media-grid.tsx';
import { UploadPanel } from '@/features/media/components/upload-panel.tsx';

export function Component() {
  const [query, setQuery] = useState<MediaListQuery>({});
  const [page, setPage] = useState(1);
  const [params, setParams] = useSearchParams();
  const openId = params.get('image');
  const list = useMediaList({ ...query, page });
  const onFilters = useCallback((next: MediaListQuery) => {
    setQuery(next);
    setPage(1);
  }, []);
  const open = (id: string) => setParams({ image: id });
  const close = useCallback(() => setParams({}), [setParams]);
  const meta = list.data?.meta;
  const pages = meta ? Math.max(1, Math.ceil(meta.total / meta.pageSize)) : 1;
  return (
    <>
      <PageHeader
        title="Media"
        description="Images for pages and kiosk screens. Each needs a credit line, a licence, a source web address and alt text before it can appear on an approved page."
      />
      <div className="space-y-6">
        <UploadPanel maxBytes={meta?.uploadMaxBytes ?? 100 * 1024 * 1024} onOpen={open} />
        <MediaFilters onChange={onFilters} />
        {list.error && <Notice tone="error">{list.error.message}</Notice>}
        {list.isPending && <p className="text-sm text-muted">Loading images…</p>}
        {list.data && list.data.data.length === 0 && (
          <p className="rounded-lg border border-rule bg-panel px-4 py-6 text-center text-sm text-muted">
            {Object.values(query).some(Boolean)
              ? 'No image matches this search.'
              : 'No images yet. Drop some above to start the library.'}
          </p>
        )}
        {list.data && list.data.data.length > 0 && (
          <>
            <p className="text-sm text-muted tabular-nums">
              {meta!.total} {meta!.total === 1 ? 'image' : 'images'}
            </p>
            <MediaGrid items={list.data.data} onOpen={open} />
            {pages > 1 && (
              <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
                <Button variant="secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>
                  Previous
                </Button>
                <span className="tabular-nums text-muted">
                  Page {page} of {pages}
                </span>
                <Button variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>
                  Next
                </Button>
              </nav>
            )}
          </>
        )}
      </div>
      {openId && <MediaDetailPanel id={openId} onClose={close} />}
    </>
  );
}
