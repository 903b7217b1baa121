import { useState } from 'react';
import { ROLE_LABELS, ROLES, type Role } from '@shared/roles.ts';
import type { UserDto } from '@shared/schemas/user.ts';
import { useResendInvitation, useUpdateUser } from '@/api/users.ts';
import { Button } from '@/components/ui/button.tsx';
import { DataTable } from '@/components/ui/data-table.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

function Status({ user }: { user: UserDto }) {
  if (!user.active)
    return (
      <span className="inline-flex items-center gap-1 text-broken">
        <Icon name="x" className="size-3.5" />
        Deactivated
      </span>
    );
  if (user.invitationPending)
    return (
      <span className="inline-flex items-center gap-1 text-changed">
        <Icon name="mail" className="size-3.5" />
        Invited
      </span>
    );
  return (
    <span className="inline-flex items-center gap-1 text-ok">
      <Icon name="check" className="size-3.5" />
      Active
    </span>
  );
}

/**
 * A role picker that changes nothing until confirmed: choosing a role asks "Make … an editor?",
 * Save applies it and says so; Cancel puts the old role back.
 */
function RoleCell({ user, update }: { user: UserDto; update: ReturnType<typeof useUpdateUser> }) {
  const [choice, setChoice] = useState<Role | null>(null);
  const [saved, setSaved] = useState<Role | null>(null);
  const busy = update.isPending && update.variables?.id === user.id;
  return (
    <div className="space-y-1">
      <select
        aria-label={`Role of ${user.name}`}
        value={choice ?? user.role}
        onChange={(e) => {
          const next = e.target.value as Role;
          setSaved(null);
          setChoice(next === user.role ? null : next);
        }}
        className="rounded border border-rule bg-panel px-2 py-1 text-sm"
      >
        {ROLES.map((role) => (
          <option key={role} value={role}>
            {ROLE_LABELS[role]}
          </option>
        ))}
      </select>
      {choice && (
        <div className="flex flex-wrap items-center gap-1 text-xs">
          <span>
            Make {user.name} {ROLE_LABELS[choice].toLowerCase()}?
          </span>
          <Button
            variant="secondary"
            busy={busy}
            onClick={() =>
              update.mutate(
                { id: user.id, role: choice },
                {
                  onSuccess: () => {
                    setSaved(choice);
                    setChoice(null);
                  },
                },
              )
            }
          >
            Save role
          </Button>
          <Button variant="quiet" onClick={() => setChoice(null)}>
            Cancel
          </Button>
        </div>
      )}
      <p role="status" className="text-xs text-ok">
        {saved && saved === user.role ? `Saved: ${user.name} is now ${ROLE_LABELS[saved].toLowerCase()}.` : ''}
      </p>
    </div>
  );
}

/** Staff accounts with their role and status; admins change roles and deactivate here. */
export function UsersTable({ users }: { users: UserDto[] }) {
  const update = useUpdateUser();
  const resend = useResendInvitation();
  return (
    <DataTable
      columns={[
        { label: 'Name' },
        { label: 'Role' },
        { label: 'Status' },
        { label: 'Last signed in' },
        { label: 'Actions', hidden: true },
      ]}
      footer={
        (update.error || resend.error) && (
          <p role="alert" className="border-t border-rule px-4 py-2 text-sm text-broken">
            {(update.error ?? resend.error)?.message}
          </p>
        )
      }
    >
      {users.map((user) => (
        <tr key={user.id} className="h-10 border-b border-rule last:border-0">
          <td className="px-4 py-2">
            <span className="block font-medium">{user.name}</span>
            <span className="block text-xs text-muted">{user.email}</span>
          </td>
          <td className="px-4 py-2">{user.can.deactivate ? <RoleCell user={user} update={update} /> : ROLE_LABELS[user.role]}</td>
          <td className="px-4 py-2">
            <Status user={user} />
          </td>
          <td className="px-4 py-2 text-muted">{user.lastSignInAt ? formatDateTime(user.lastSignInAt) : '—'}</td>
          <td className="px-4 py-2 text-right">
            <div className="flex justify-end gap-2">
              {user.invitationPending && user.active && (
                <Button
                  variant="quiet"
                  onClick={() => resend.mutate(user.id)}
                  busy={resend.isPending && resend.variables === user.id}
                >
                  Resend invitation
                </Button>
              )}
              {user.can.deactivate && (
                <Button
                  variant={user.active ? 'danger' : 'secondary'}
                  onClick={() => update.mutate({ id: user.id, active: !user.active })}
                >
                  {user.active ? 'Deactivate' : 'Reactivate'}
                </Button>
              )}
            </div>
          </td>
        </tr>
      ))}
    </DataTable>
  );
}
