import { Op, QueryTypes } from 'sequelize';
import {
  nightFromSky,
  type SentenceNames,
  type StatementAssumptions,
  type StatementMeasurement,
  type StatementNight,
  type StatementVenue,
  type TemplateContext,
  type TimelineEntry,
} from '@shared/statements/index.ts';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { H0Range } from '@shared/schemas/settings.ts';
import { findQuantity } from '@shared/catalogue/quantities.ts';
import { SkyInputError } from '@shared/sky/errors.ts';
import { nightDateAt } from '@shared/sky/time-zone.ts';
import { getSequelize } from '../../db.ts';
import { Venue } from '../../models/index.ts';
import { getPreferredMeasurements, type PreferredMeasurement } from '../catalogue/index.ts';
import { getSkySnapshot } from '../sky/index.ts';

/** The organisation's choices a statement depends on. */
export interface SettingsSnapshot {
  model: CalcModel;
  band: string;
  /** The organisation's H0 range; null or absent: the default. */
  h0Range?: H0Range | null;
  version: number;
  /** Stated defaults for missing measurements (absent: none). */
  assumptions?: StatementAssumptions;
  /** Earth's timeline, for statements that compare a light-travel time with it (absent: none). */
  timeline?: TimelineEntry[];
}

type ObjectRef = { id: string; name: string; kind: string; designations?: string[]; sentenceNames?: SentenceNames | null };

function asStatementMeasurement(
  m: Pick<PreferredMeasurement, 'measurementId' | 'quantity' | 'value' | 'unit' | 'band' | 'uncertainty' | 'source'>,
): StatementMeasurement {
  return {
    id: m.measurementId,
    quantity: m.quantity,
    value: m.value,
    unit: m.unit,
    band: m.band ?? null,
    sigma: m.uncertainty?.kind === 'symmetric' ? m.uncertainty.sigma : null,
    minus: m.uncertainty?.kind === 'asymmetric' ? m.uncertainty.minus : null,
    plus: m.uncertainty?.kind === 'asymmetric' ? m.uncertainty.plus : null,
    source: { id: m.source.id, citation: m.source.citation },
  };
}

function contextFor(object: ObjectRef, measurements: StatementMeasurement[], settings: SettingsSnapshot): TemplateContext {
  return {
    object: {
      id: object.id,
      name: object.name,
      kind: object.kind,
      designations: object.designations ?? [],
      sentenceNames: object.sentenceNames ?? null,
    },
    measurements,
    model: settings.model,
    band: settings.band,
    assumptions: settings.assumptions ?? null,
    h0Range: settings.h0Range ?? null,
    timeline: settings.timeline ?? [],
  };
}

/** A venue and the night a statement about it reads (null when its sky could not be computed). */
export interface VenueNight {
  venue: StatementVenue;
  night: StatementNight | null;
}

/**
 * The venues statements are for, each with its night: the night in progress at the venue at `at`
 * (or the night given for one venue, e.g. by the daily sky job), from the stored sky snapshot,
 * which is computed and stored when missing or made for the venue's old position.
 * @param venueIds the venues
 * @param at the instant whose night counts
 * @param night a night chosen for one venue
 * @returns by venue id; venues that no longer exist are left out
 */
export async function buildVenueNights(
  venueIds: string[],
  at: Date,
  night?: { venueId: string; localDate: string },
): Promise<Map<string, VenueNight>> {
  const found = new Map<string, VenueNight>();
  if (venueIds.length === 0) return found;
  for (const v of await Venue.findAll({ where: { id: { [Op.in]: venueIds } } })) {
    const localDate = night?.venueId === v.id ? night.localDate : nightDateAt(at.getTime(), v.timeZone);
    let sky: StatementNight | null = null;
    try {
      const snapshot = await getSkySnapshot(v.id, localDate);
      sky = snapshot ? nightFromSky(snapshot.data) : null;
    } catch (error) {
      // A venue the sky cannot be computed for: its statements break, saying so (the template's refusal).
      if (!(error instanceof SkyInputError)) throw error;
    }
    found.set(v.id, {
      venue: {
        id: v.id,
        name: v.name,
        latitude: v.latitude,
        longitude: v.longitude,
        elevationM: v.elevationM,
        timeZone: v.timeZone,
      },
      night: sky,
    });
  }
  return found;
}

/** An object's context for one venue: the same measurements and settings, with the venue and its night. */
export function withVenue(ctx: TemplateContext, venueNight: VenueNight): TemplateContext {
  return { ...ctx, venue: venueNight.venue, night: venueNight.night };
}

/**
 * Builds what a template reads: the object's preferred measurements (values in canonical units,
 * each with its source) and the organisation's model and band.
 */
export async function buildTemplateContext(object: ObjectRef, settings: SettingsSnapshot): Promise<TemplateContext> {
  const preferred = await getPreferredMeasurements(object.id);
  return contextFor(object, preferred.map(asStatementMeasurement), settings);
}

interface PreferredRow {
  id: string;
  object_id: string;
  quantity: string;
  band: string | null;
  value: number;
  uncertainty: number | null;
  uncertainty_minus: number | null;
  uncertainty_plus: number | null;
  source_id: string;
  citation: string;
}

/**
 * The same contexts as buildTemplateContext for many objects, with one query for all their
 * preferred measurements (a recompute of the whole catalogue would otherwise make one per object).
 * Measurements come in the same order (quantity, then band), so templates pick the same ones.
 * @param objects the sky objects
 * @param settings the adopted settings
 * @returns each object's context by object id
 */
export async function buildTemplateContexts(
  objects: ObjectRef[],
  settings: SettingsSnapshot,
): Promise<Map<string, TemplateContext>> {
  const byObject = new Map<string, StatementMeasurement[]>(objects.map((o) => [o.id, []]));
  if (objects.length > 0) {
    const rows = await getSequelize().query<PreferredRow>(
      `SELECT m.id, m.object_id, m.quantity, m.band, m.value, m.uncertainty, m.uncertainty_minus, m.uncertainty_plus, s.id AS source_id, s.citation
         FROM measurements m JOIN sources s ON s.id = m.source_id
        WHERE m.preferred AND m.object_id IN (:ids)
        ORDER BY m.object_id, m.quantity ASC, m.band ASC`,
      { replacements: { ids: objects.map((o) => o.id) }, type: QueryTypes.SELECT },
    );
    for (const r of rows) {
      const uncertainty: PreferredMeasurement['uncertainty'] =
        r.uncertainty !== null
          ? { kind: 'symmetric', sigma: r.uncertainty }
          : r.uncertainty_minus !== null && r.uncertainty_plus !== null
            ? { kind: 'asymmetric', minus: r.uncertainty_minus, plus: r.uncertainty_plus }
            : null;
      byObject.get(r.object_id)?.push(
        asStatementMeasurement({
          measurementId: r.id,
          quantity: r.quantity,
          value: r.value,
          unit: findQuantity(r.quantity)?.canonicalUnit ?? '',
          band: r.band,
          uncertainty,
          source: { id: r.source_id, citation: r.citation, bibcode: null, doi: null, url: null },
        }),
      );
    }
  }
  return new Map(objects.map((o) => [o.id, contextFor(o, byObject.get(o.id) ?? [], settings)]));
}
