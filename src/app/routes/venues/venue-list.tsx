import { useVenues } from '@/api/venues.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { VenueForm } from '@/features/venues/components/venue-form.tsx';
import { VenuesTable } from '@/features/venues/components/venues-table.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';

export function Component() {
  const venues = useVenues();
  const user = useCurrentUser();
  const navigate = useNavigate();
  const adding = useFormOpener();
  return (
    <>
      <PageHeader
        title="Venues"
        description="The buildings with kiosk screens, and the places the sky tonight is worked out for."
        actions={
          user.role === 'admin' && !adding.open ? (
            <Button ref={adding.openerRef} onClick={adding.show}>
              <Icon name="plus" className="size-4" />
              Add a venue
            </Button>
          ) : undefined
        }
      />
      <div className="space-y-4">
        {adding.open && <VenueForm onDone={(venue) => navigate(paths.venue.href(venue.id))} onCancel={adding.close} />}
        {venues.isPending && <p className="text-sm text-muted">Loading venues…</p>}
        {venues.error && <Notice tone="error">{venues.error.message}</Notice>}
        {venues.data && venues.data.length === 0 && <Notice>No venues yet.</Notice>}
        {venues.data && venues.data.length > 0 && <VenuesTable venues={venues.data} />}
      </div>
    </>
  );
}
