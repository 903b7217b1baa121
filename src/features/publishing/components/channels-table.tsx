import { Link } from 'react-router-dom';
import type { ChannelRowDto } from '@shared/schemas/channel.ts';
import { paths } from '@/config/paths.ts';
import { DataTable } from '@/components/ui/data-table.tsx';

/** Channels with their venue, number of slides and the screens showing them. */
export function ChannelsTable({ channels }: { channels: ChannelRowDto[] }) {
  return (
    <DataTable columns={[{ label: 'Channel' }, { label: 'Venue' }, { label: 'Slides', align: 'right' }, { label: 'Shown on' }]}>
      {channels.map((c) => (
        <tr key={c.id} className="h-10 border-b border-rule last:border-0">
          <td className="px-4 py-2">
            <Link to={paths.channel.href(c.id)} className="font-medium text-accent hover:underline">
              {c.name}
            </Link>
          </td>
          <td className="px-4 py-2">{c.venue.name}</td>
          <td className="px-4 py-2 text-right tabular-nums">{c.slideCount}</td>
          <td className="px-4 py-2 text-muted">
            {c.screens.length ? c.screens.map((s) => s.name).join(', ') : 'No screens yet'}
          </td>
        </tr>
      ))}
    </DataTable>
  );
}
