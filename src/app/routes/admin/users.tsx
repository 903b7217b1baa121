import { useState } from 'react';
import { useUsers } from '@/api/users.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { InviteUserForm } from '@/features/users/components/invite-user-form.tsx';
import { UsersTable } from '@/features/users/components/users-table.tsx';

export function Component() {
  const users = useUsers();
  const invite = useFormOpener();
  const [sent, setSent] = useState(false);
  return (
    <>
      <PageHeader
        title="Users"
        description="Everyone who works in Starproof, with their role. Deactivating someone signs them out at once."
        actions={
          !invite.open && (
            <Button
              ref={invite.openerRef}
              onClick={() => {
                invite.show();
                setSent(false);
              }}
            >
              <Icon name="plus" className="size-4" />
              Invite someone
            </Button>
          )
        }
      />
      <div className="space-y-4">
        {invite.open && (
          <InviteUserForm
            onDone={() => {
              invite.close();
              setSent(true);
            }}
          />
        )}
        {sent && <Notice tone="success">Invitation sent. It is in the Outbox while mail is caught locally.</Notice>}
        {users.isPending && <p className="text-sm text-muted">Loading users…</p>}
        {users.error && <Notice tone="error">{users.error.message}</Notice>}
        {users.data && <UsersTable users={users.data} />}
      </div>
    </>
  );
}
