import { Link } from 'react-router-dom';
import type { ChannelRowDto } from '@shared/schemas/channel.ts';
import { paths } from '@/config/paths.ts';

/** Channels with their venue, number of slides and the screens showing them. */
export function ChannelsTable({ channels }: { channels: ChannelRowDto[] }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
      <table className="w-full text-left text-sm">
        <thead className="sticky top-0 border-b border-rule bg-wash text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="px-4 py-2.5 font-semibold">Channel</th>
            <th scope="col" className="px-4 py-2.5 font-semibold">Venue</th>
            <th scope="col" className="px-4 py-2.5 text-right font-semibold">Slides</th>
            <th scope="col" className="px-4 py-2.5 font-semibold">Shown on</th>
          </tr>
        </thead>
        <tbody>
          {channels.map((c) => (
            <tr key={c.id} className="h-10 border-b border-rule last:border-0">
              <td className="px-4 py-2">
                <Link to={paths.channel.href(c.id)} className="font-medium text-accent hover:underline">
                  {c.name}
                </Link>
              </td>
              <td className="px-4 py-2">{c.venue.name}</td>
              <td className="px-4 py-2 text-right tabular-nums">{c.slideCount}</td>
              <td className="px-4 py-2 text-muted">{c.screens.length ? c.screens.map((s) => s.name).join(', ') : 'No screens yet'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
