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
          <td className="px-4 py-2">
            {user.can.deactivate ? (
              <select
                aria-label={`Role of ${user.name}`}
                value={user.role}
                onChange={(e) => update.mutate({ id: user.id, role: e.target.value as Role })}
                className="rounded border border-rule bg-panel px-2 py-1 text-sm"
              >
                {ROLES.map((role) => (
                  <option key={role} value={role}>
                    {ROLE_LABELS[role]}
                  </option>
                ))}
              </select>
            ) : (
              ROLE_LABELS[user.role]
            )}
          </td>
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
