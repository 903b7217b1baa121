import { useState } from 'react';
import type { SourceDto } from '@shared/schemas/source.ts';
import { useSources } from '@/api/sources.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { SourceForm } from '@/features/catalogue/components/source-form.tsx';
import { SourcesTable } from '@/features/catalogue/components/sources-table.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';

export function Component() {
  const user = useCurrentUser();
  const sources = useSources();
  const [editing, setEditing] = useState<SourceDto | 'new' | null>(null);
  const keeper = user.role === 'reviewer' || user.role === 'admin';
  return (
    <>
      <PageHeader
        title="Sources"
        description="Papers, catalogues and pages that measurements come from. A measurement needs a source before it can be preferred."
        actions={
          keeper &&
          !editing && (
            <Button onClick={() => setEditing('new')}>
              <Icon name="plus" className="size-4" />
              Add source
            </Button>
          )
        }
      />
      <div className="space-y-4">
        {editing && (
          <SourceForm
            key={editing === 'new' ? 'new' : editing.id}
            source={editing === 'new' ? undefined : editing}
            onDone={() => setEditing(null)}
          />
        )}
        {sources.error && <Notice tone="error">{sources.error.message}</Notice>}
        {sources.data && <SourcesTable sources={sources.data} onEdit={setEditing} />}
      </div>
    </>
  );
}
