import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { PageCreateSchema, type PageCreateInput } from '@shared/schemas/page.ts';
import { LOCALE_LABELS, STATEMENT_LOCALES } from '@shared/statements/locales.ts';
import { useCreatePage } from '@/api/pages.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { ObjectPicker } from './object-picker.tsx';

/**
 * Starts a page: a title, the object it is about and its language; then straight into the editor. Focus starts in its first field, since the button that opened it is gone.
 */
export function NewPageForm({ defaultLocale, onCancel }: { defaultLocale: PageCreateInput['locale']; onCancel: () => void }) {
  const create = useCreatePage();
  const navigate = useNavigate();
  const form = useForm<PageCreateInput>({
    resolver: zodResolver(PageCreateSchema),
    defaultValues: { title: '', objectId: '', locale: defaultLocale },
  });
  const submit = form.handleSubmit(async (values) => {
    const page = await create.mutateAsync(values);
    navigate(paths.pageEdit.href(page.id));
  });
  return (
    <form aria-label="New page" onSubmit={submit} className="space-y-4 rounded-lg border border-rule bg-panel p-5">
      <h2 className="text-lg font-semibold">New page</h2>
      <TextField label="Title" autoFocus {...form.register('title')} error={form.formState.errors.title?.message} />
      <Controller
        control={form.control}
        name="objectId"
        render={({ field, fieldState }) => (
          <ObjectPicker
            label="About which object"
            value={field.value}
            onChange={(id) => field.onChange(id)}
            error={fieldState.error?.message}
          />
        )}
      />
      <SelectField label="Language" {...form.register('locale')}>
        {STATEMENT_LOCALES.map((l) => (
          <option key={l} value={l}>
            {LOCALE_LABELS[l]}
          </option>
        ))}
      </SelectField>
      {create.error && <Notice tone="error">{create.error.message}</Notice>}
      <div className="flex gap-2">
        <Button type="submit" busy={create.isPending}>
          Create and start writing
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
