import { Link, useNavigate } from 'react-router-dom';
import { useAddPageVersion, usePageVersions } from '@/api/page-versions.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { PageStatusBadge } from './page-status-badge.tsx';

/**
 * The page in other languages: each version with its own state (each is reviewed and published on
 * its own), links between them, and a button per language it does not have yet.
 */
export function LanguageVersions({ pageId }: { pageId: string }) {
  const versions = usePageVersions(pageId);
  const add = useAddPageVersion(pageId);
  const navigate = useNavigate();
  if (!versions.data) return null;
  const { versions: list, missing, can } = versions.data;
  return (
    <section aria-labelledby="languages" className="space-y-3 rounded-lg border border-rule bg-panel p-4">
      <h2 id="languages" className="font-semibold">
        Languages
      </h2>
      <ul className="space-y-2">
        {list.map((v) => (
          <li key={v.id} lang={v.locale} className="flex min-w-0 flex-wrap items-center gap-x-2 gap-y-1 text-sm">
            <span className="w-28 shrink-0 font-medium">{v.label}</span>
            {v.current ? (
              <span aria-current="page" className="min-w-0 break-words">
                {v.title} <span className="text-muted">(this version)</span>
              </span>
            ) : v.readable ? (
              <Link to={paths.pageEdit.href(v.id)} className="min-w-0 break-words text-accent underline">
                {v.title}
              </Link>
            ) : (
              <span className="min-w-0 break-words text-muted">A colleague’s draft, not yet submitted</span>
            )}
            <PageStatusBadge status={v.status} />
            {v.isDefault && list.length > 1 && <span className="text-xs text-muted">default for other languages</span>}
          </li>
        ))}
      </ul>
      {can.add && missing.length > 0 && (
        <div className="flex flex-wrap gap-2">
          {missing.map((m) => (
            <Button
              key={m.locale}
              variant="secondary"
              busy={add.isPending && add.variables === m.locale}
              onClick={() => add.mutate(m.locale, { onSuccess: (page) => void navigate(paths.pageEdit.href(page.id)) })}
            >
              {m.addLabel}
            </Button>
          ))}
        </div>
      )}
      {can.add && missing.length > 0 && (
        <p className="text-xs text-muted">
          A new version copies this page’s text, images and statements. The statements read in the new language by themselves;
          translate the text around them, then send the version for review on its own.
        </p>
      )}
      {add.error && (
        <Notice tone="error" title="No new version">
          {add.error.message}
        </Notice>
      )}
    </section>
  );
}
