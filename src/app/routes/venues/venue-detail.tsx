import { useVenue } from '@/api/venues.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { useParams } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { ScreensPanel } from '@/features/venues/components/screens-panel.tsx';
import { SkyTonightPanel } from '@/features/venues/components/sky-tonight-panel.tsx';
import { VenueForm } from '@/features/venues/components/venue-form.tsx';
import { formatPosition } from '@/features/venues/components/venues-table.tsx';

export function Component() {
  const { venueId = '' } = useParams();
  const venue = useVenue(venueId);
  const editing = useFormOpener();
  if (venue.isPending) return <p className="text-sm text-muted">Loading venue…</p>;
  if (venue.error) return <Notice tone="error">{venue.error.message}</Notice>;
  const v = venue.data;
  return (
    <>
      <PageHeader
        title={v.name}
        description={`${formatPosition(v.latitude, v.longitude)} · ${v.elevationM} m above sea level · ${v.timeZone}`}
        actions={
          v.can.update && !editing.open ? (
            <Button ref={editing.openerRef} variant="secondary" onClick={editing.show}>
              Edit venue
            </Button>
          ) : undefined
        }
      />
      <div className="space-y-8">
        {editing.open && <VenueForm venue={v} onDone={editing.close} onCancel={editing.close} />}
        <ScreensPanel venueId={v.id} canManage={v.can.manageScreens} />
        <SkyTonightPanel venueId={v.id} />
      </div>
    </>
  );
}
