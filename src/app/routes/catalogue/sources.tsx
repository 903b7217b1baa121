import { useState } from 'react';
import type { SourceDto } from '@shared/schemas/source.ts';
import { useSources } from '@/api/sources.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { ProposalList } from '@/features/catalogue/components/proposal-list.tsx';
import { SourceForm } from '@/features/catalogue/components/source-form.tsx';
import { SourcesTable } from '@/features/catalogue/components/sources-table.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';

export function Component() {
  const user = useCurrentUser();
  const sources = useSources();
  const [editing, setEditing] = useState<SourceDto | 'new' | null>(null);
  const keeper = user.role === 'reviewer' || user.role === 'admin';
  const [proposed, setProposed] = useState<string | null>(null);
  return (
    <>
      <PageHeader
        title="Sources"
        description="Papers, catalogues and pages that measurements come from. A measurement needs a source before it can be preferred."
        actions={
          !editing && (
            <Button
              onClick={() => {
                setProposed(null);
                setEditing('new');
              }}
            >
              <Icon name="plus" className="size-4" />
              {keeper ? 'Add source' : 'Propose a source'}
            </Button>
          )
        }
      />
      <div className="space-y-4">
        {!keeper && (
          <p className="text-sm text-muted">
            Reviewers and admins add and correct sources. As {user.role === 'editor' ? 'an editor' : 'a writer'}, you propose a
            source with a bibcode, DOI or URL, and a reviewer accepts or declines it.
          </p>
        )}
        {proposed && (
          <Notice tone="success" title="Proposed">
            “{proposed}” is waiting for a reviewer. Once accepted, you can cite it in measurements and object proposals.
          </Notice>
        )}
        {editing && (
          <SourceForm
            key={editing === 'new' ? 'new' : editing.id}
            source={editing === 'new' ? undefined : editing}
            onDone={() => setEditing(null)}
            onProposed={
              keeper
                ? undefined
                : (title) => {
                    setProposed(title);
                    setEditing(null);
                  }
            }
          />
        )}
        <ProposalList kind="source" reviewer={keeper} />
        {sources.error && <Notice tone="error">{sources.error.message}</Notice>}
        {sources.data && <SourcesTable sources={sources.data} onEdit={setEditing} />}
      </div>
    </>
  );
}
