import { Link } from 'react-router-dom';
import type { VenueDto } from '@shared/schemas/venue.ts';
import { paths } from '@/config/paths.ts';
import { DataTable } from '@/components/ui/data-table.tsx';

const fmt = new Intl.NumberFormat(undefined, { minimumFractionDigits: 2, maximumFractionDigits: 4 });

/** Latitude and longitude written with N/S and E/W, as people read them. */
export function formatPosition(latitude: number, longitude: number): string {
  return `${fmt.format(Math.abs(latitude))}° ${latitude >= 0 ? 'N' : 'S'}, ${fmt.format(Math.abs(longitude))}° ${longitude >= 0 ? 'E' : 'W'}`;
}

/** Venues with their position, time zone and number of screens. */
export function VenuesTable({ venues }: { venues: VenueDto[] }) {
  return (
    <DataTable
      columns={[
        { label: 'Venue' },
        { label: 'Position' },
        { label: 'Elevation' },
        { label: 'Time zone' },
        { label: 'Screens', align: 'right' },
      ]}
    >
      {venues.map((venue) => (
        <tr key={venue.id} className="h-10 border-b border-rule last:border-0">
          <td className="px-4 py-2">
            <Link to={paths.venue.href(venue.id)} className="font-medium text-accent hover:underline">
              {venue.name}
            </Link>
          </td>
          <td className="px-4 py-2 tabular-nums">{formatPosition(venue.latitude, venue.longitude)}</td>
          <td className="px-4 py-2 tabular-nums">{venue.elevationM} m</td>
          <td className="px-4 py-2">{venue.timeZone}</td>
          <td className="px-4 py-2 text-right tabular-nums">{venue.screenCount}</td>
        </tr>
      ))}
    </DataTable>
  );
}
