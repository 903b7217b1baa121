import { Link } from 'react-router-dom';
import type { VenueDto } from '@shared/schemas/venue.ts';
import { paths } from '@/config/paths.ts';

const fmt = new Intl.NumberFormat(undefined, { minimumFractionDigits: 2, maximumFractionDigits: 4 });

/** Latitude and longitude written with N/S and E/W, as people read them. */
export function formatPosition(latitude: number, longitude: number): string {
  return `${fmt.format(Math.abs(latitude))}° ${latitude >= 0 ? 'N' : 'S'}, ${fmt.format(Math.abs(longitude))}° ${longitude >= 0 ? 'E' : 'W'}`;
}

/** Venues with their position, time zone and number of screens. */
export function VenuesTable({ venues }: { venues: VenueDto[] }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
      <table className="w-full text-left text-sm">
        <thead className="sticky top-0 border-b border-rule bg-wash text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="px-4 py-2.5 font-semibold">Venue</th>
            <th scope="col" className="px-4 py-2.5 font-semibold">Position</th>
            <th scope="col" className="px-4 py-2.5 font-semibold">Elevation</th>
            <th scope="col" className="px-4 py-2.5 font-semibold">Time zone</th>
            <th scope="col" className="px-4 py-2.5 text-right font-semibold">Screens</th>
          </tr>
        </thead>
        <tbody>
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
        </tbody>
      </table>
    </div>
  );
}
