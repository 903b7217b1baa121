import { useChannels } from '@/api/channels.ts';
import { useVenues } from '@/api/venues.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { ChannelCreateForm } from '@/features/publishing/components/channel-create-form.tsx';
import { ChannelsTable } from '@/features/publishing/components/channels-table.tsx';

/** The new-channel form with the venues to choose from; mounted only while adding, so they load then. */
function NewChannel({ onCancel }: { onCancel: () => void }) {
  const venues = useVenues();
  const navigate = useNavigate();
  return <ChannelCreateForm venues={venues.data} onDone={(c) => navigate(paths.channel.href(c.id))} onCancel={onCancel} />;
}

export function Component() {
  const channels = useChannels();
  const adding = useFormOpener();
  return (
    <>
      <PageHeader
        title="Publishing"
        description="Kiosk channels: the slides each venue’s screens play, in order. Only published pages and fully credited images can go on a screen."
        actions={
          !adding.open ? (
            <Button ref={adding.openerRef} onClick={adding.show}>
              <Icon name="plus" className="size-4" />
              New channel
            </Button>
          ) : undefined
        }
      />
      <div className="space-y-4">
        {adding.open && <NewChannel onCancel={adding.close} />}
        {channels.isPending && <p className="text-sm text-muted">Loading channels…</p>}
        {channels.error && <Notice tone="error">{channels.error.message}</Notice>}
        {channels.data && channels.data.length === 0 && (
          <Notice>No channels yet. Create one, add slides, then choose the screens that show it.</Notice>
        )}
        {channels.data && channels.data.length > 0 && <ChannelsTable channels={channels.data} />}
      </div>
    </>
  );
}
