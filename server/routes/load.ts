import { IdSchema } from '@shared/schemas/common.ts';
import { NotFoundError } from '../errors.ts';
import {
  CatalogueImport,
  Channel,
  KioskScreen,
  Measurement,
  Media,
  MediaRendition,
  Page,
  PageRevision,
  SkyObject,
  Source,
  Statement,
  TimelineEntry,
  User,
  Venue,
} from '../models/index.ts';
import { findProposal } from '../services/catalogue/index.ts';
import { statementIncludes } from '../services/statements/index.ts';

/*
 * The one rule for a record named in the URL: a malformed id (not a UUID) and a well-formed id with
 * no record both answer 404 `not_found`, the same for every role. A malformed id names no record,
 * so it is "not found" rather than bad input, and it never reaches the database. Routes load first,
 * then ask the policy about the loaded record (route → validate → load → authorize → service →
 * presenter); a 403 therefore always means "this record exists and your role may not do this".
 */

const isId = (id: unknown): id is string => IdSchema.safeParse(id).success;

/**
 * A path parameter named by a parent router (mounted with mergeParams), whose own route type does not
 * list it; unknown until a loader checks it.
 */
export const parentParam = (req: { params: object }, name: string): unknown => Reflect.get(req.params, name);

/**
 * Loads the record whose id is in the URL, or throws 404.
 * @param id the raw path parameter (anything a client sent)
 * @param find the query for a well-formed id
 * @param message what the 404 says, e.g. "There is no page with that id."
 * @throws HttpError 404 `not_found` for a malformed or unknown id
 */
export async function loadRecord<T>(id: unknown, find: (id: string) => Promise<T | null>, message: string): Promise<T> {
  const record = isId(id) ? await find(id) : null;
  if (!record) throw NotFoundError(message);
  return record;
}

/** The associations a measurement's presenter reads (source, who entered it, who reviewed it). */
export function measurementIncludes() {
  return [
    { model: Source, as: 'source' },
    { model: User, as: 'createdBy', attributes: ['id', 'name'] },
    { model: User, as: 'reviewedBy', attributes: ['id', 'name'] },
  ];
}

/** @throws HttpError 404 */
export const loadPage = (id: unknown) => loadRecord(id, (pk) => Page.findByPk(pk), 'There is no page with that id.');

/** @throws HttpError 404 */
export const loadTimelineEntry = (id: unknown) =>
  loadRecord(id, (pk) => TimelineEntry.findByPk(pk), 'There is no timeline entry with that id.');

/** @throws HttpError 404 */
export const loadVenue = (id: unknown) => loadRecord(id, (pk) => Venue.findByPk(pk), 'There is no venue with that id.');

/** A screen of this venue; another venue's screen is "not found" here, never touched. @throws HttpError 404 */
export const loadScreen = (venue: Venue, id: unknown) =>
  loadRecord(id, (pk) => KioskScreen.findOne({ where: { id: pk, venueId: venue.id } }), 'There is no such screen at this venue.');

/** @throws HttpError 404 */
export const loadUser = (id: unknown) => loadRecord(id, (pk) => User.findByPk(pk), 'There is no user with that id.');

/** An image with its renditions and uploader. @throws HttpError 404 */
export const loadMedia = (id: unknown) =>
  loadRecord(
    id,
    (pk) =>
      Media.findByPk(pk, {
        include: [
          { model: MediaRendition, as: 'renditions' },
          { model: User, as: 'uploadedBy', attributes: ['id', 'name'] },
        ],
      }),
    'There is no image with that id.',
  );

/** @throws HttpError 404 */
export const loadChannel = (id: unknown) => loadRecord(id, (pk) => Channel.findByPk(pk), 'There is no channel with that id.');

/** @throws HttpError 404 */
export const loadSkyObject = (id: unknown) =>
  loadRecord(id, (pk) => SkyObject.findByPk(pk), 'There is no object with that id in the catalogue.');

/** A measurement with what its presenter shows. @throws HttpError 404 */
export const loadMeasurement = (id: unknown) =>
  loadRecord(id, (pk) => Measurement.findByPk(pk, { include: measurementIncludes() }), 'There is no measurement with that id.');

/** @throws HttpError 404 */
export const loadSource = (id: unknown) => loadRecord(id, (pk) => Source.findByPk(pk), 'There is no source with that id.');

/** A proposed object or source, with its source and people. @throws HttpError 404 */
export const loadProposal = (id: unknown) => loadRecord(id, findProposal, 'There is no proposal with that id.');

/** A CSV import without its accepted rows (they can be large). @throws HttpError 404 */
export const loadImport = (id: unknown) =>
  loadRecord(
    id,
    (pk) => CatalogueImport.findByPk(pk, { attributes: { exclude: ['acceptedRows'] } }),
    'There is no import with that id.',
  );

/** A statement with its cosmology and venue. @throws HttpError 404 */
export const loadStatement = (id: unknown) =>
  loadRecord(id, (pk) => Statement.findByPk(pk, { include: statementIncludes() }), 'There is no such statement.');

/**
 * One saved version of a page, by its number in the URL (1, 2, …).
 * @throws HttpError 404 when the page has no such revision
 */
export async function loadRevision(page: Page, number: unknown): Promise<PageRevision> {
  const n = Number(number);
  const revision = Number.isInteger(n) && n > 0 ? await PageRevision.findOne({ where: { pageId: page.id, number: n } }) : null;
  if (!revision) throw NotFoundError(`This page has no revision ${String(number)}.`);
  return revision;
}
