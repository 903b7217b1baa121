import { useState } from 'react';
import { useCreateStatement, useStatementTemplates } from '@/api/statements.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ObjectPicker } from './object-picker.tsx';

/**
 * Inserts a checked statement: choose the object (the page's, by default), then a template. The
 * server works it out at once; when it cannot, the reason is shown (which measurement is missing).
 */
export function StatementPicker({ defaultObject, replacing, onPick, onClose }: { defaultObject: { id: string; name: string }; replacing?: string; onPick: (statementId: string) => void; onClose: () => void }) {
  const [objectId, setObjectId] = useState(defaultObject.id);
  const [objectName, setObjectName] = useState(defaultObject.name);
  const [changingObject, setChangingObject] = useState(false);
  const templates = useStatementTemplates();
  const create = useCreateStatement();
  return (
    <div role="dialog" aria-label="Insert a statement" className="space-y-4 rounded-lg border border-accent/40 bg-panel p-4 shadow-lg">
      <div className="flex items-start justify-between gap-3">
        <div>
          <h2 className="font-semibold">{replacing ? `Replace “${replacing}” with a statement` : 'Insert a statement'}</h2>
          <p className="text-xs text-muted">The number is worked out by the server from the catalogue and stays correct when the data changes.</p>
        </div>
        <Button variant="quiet" onClick={onClose} aria-label="Close">Close</Button>
      </div>
      <div className="text-sm">
        About <strong>{objectName}</strong>{' '}
        <button type="button" className="text-accent hover:underline" onClick={() => setChangingObject((v) => !v)}>{changingObject ? 'keep this object' : 'choose another object'}</button>
      </div>
      {changingObject && <ObjectPicker value={objectId} valueLabel={objectName} onChange={(id, name) => { setObjectId(id); setObjectName(name.split(' · ')[0]); create.reset(); }} />}
      <fieldset className="space-y-1.5">
        <legend className="mb-1 text-sm font-medium">Statement</legend>
        {(templates.data ?? []).map((t) => (
          <button
            key={t.id}
            type="button"
            disabled={create.isPending}
            onClick={() => create.mutate({ objectId, templateId: t.id }, { onSuccess: (s) => onPick(s.id) })}
            className="block w-full rounded-md border border-rule px-3 py-2 text-left text-sm hover:border-accent disabled:opacity-60"
          >
            <span className="font-medium">{t.title}</span>
            <span className="block text-xs text-muted">Needs {t.needs}{t.usesCosmology ? ' · uses the adopted cosmology' : ''}</span>
          </button>
        ))}
      </fieldset>
      {create.error && <Notice tone="warning" title="This statement cannot be worked out">{create.error.message}</Notice>}
    </div>
  );
}
