import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ROLE_DESCRIPTIONS, ROLE_LABELS, ROLES } from '@shared/roles.ts';
import { UserInviteSchema, type UserInviteInput } from '@shared/schemas/user.ts';
import { useInviteUser } from '@/api/users.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';

/** Invites a member of staff by e-mail with a role. Focus starts in its first field, since the button that opened it is gone. */
export function InviteUserForm({ onDone }: { onDone: () => void }) {
  const invite = useInviteUser();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<UserInviteInput>({
    resolver: zodResolver(UserInviteSchema),
    defaultValues: { role: 'writer' },
  });
  const onSubmit = handleSubmit((values) => {
    setFormError(undefined);
    invite.mutate(values, {
      onSuccess: onDone,
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'name', 'role'])),
    });
  });
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-4 rounded-lg border border-rule bg-panel p-5 sm:grid-cols-3"
      aria-label="Invite someone"
    >
      {formError && (
        <div className="sm:col-span-3">
          <Notice tone="error">{formError}</Notice>
        </div>
      )}
      <TextField label="Name" autoComplete="off" autoFocus error={formState.errors.name?.message} {...register('name')} />
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="off"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <SelectField label="Role" error={formState.errors.role?.message} {...register('role')}>
        {ROLES.map((role) => (
          <option key={role} value={role}>
            {ROLE_LABELS[role]} — {ROLE_DESCRIPTIONS[role]}
          </option>
        ))}
      </SelectField>
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" busy={invite.isPending}>
          Send invitation
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
