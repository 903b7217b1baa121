import type { VenueChoiceDto, VenueDto } from '@shared/schemas/venue.ts';
import type { User, Venue } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The API contract for a venue, with what the viewer may do to it. */
export function presentVenue(venue: Venue, viewer: User, screenCount: number): VenueDto {
  return {
    id: venue.id,
    name: venue.name,
    latitude: venue.latitude,
    longitude: venue.longitude,
    elevationM: venue.elevationM,
    timeZone: venue.timeZone,
    isDemo: venue.isDemo,
    screenCount,
    createdAt: venue.createdAt.toISOString(),
    updatedAt: venue.updatedAt.toISOString(),
    can: {
      update: can(viewer, 'venue', 'update', venue),
      delete: can(viewer, 'venue', 'delete', venue),
      manageScreens: can(viewer, 'venue', 'manageScreens', venue),
    },
  };
}

/** A venue as a choice in a list: its id, name and time zone, nothing an admin alone should see. */
export function presentVenueChoice(venue: Pick<Venue, 'id' | 'name' | 'timeZone'>): VenueChoiceDto {
  return { id: venue.id, name: venue.name, timeZone: venue.timeZone };
}
