import type { CalcModel } from '@shared/schemas/calc.ts';
import type { SettingsUpdateInput } from '@shared/schemas/settings.ts';
import { calculate } from '@shared/engine/calculate.ts';
import { getSequelize } from '../../db.ts';
import { BadRequestError, ConflictError } from '../../errors.ts';
import type { OrganisationSettings, User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { getSettings } from './organisation-settings.ts';
import { emitAndWait } from '../../domain-events.ts';
import { settingsEvents } from './events.ts';

/** Refuses a model the engine cannot use (no big bang, negative densities…), with the engine's words. */
function assertUsableModel(model: CalcModel): void {
  const probe = calculate({ quantity: 'lookback_time', inputs: { z: 1 }, model });
  if ('error' in probe) throw BadRequestError(`This cosmology cannot be used: ${probe.error.message}.`, 'invalid_model');
}

/**
 * Adopts a new cosmology. Optimistic: the admin confirms against the version they previewed, so
 * two admins cannot switch past each other unseen. `cosmologyAdopted` then has every statement
 * recomputed in the background; until each is, its stored settings version shows it predates the change.
 * @throws HttpError 409 `settings_moved` when someone else changed the settings since the preview
 */
export async function changeCosmology(model: CalcModel, expectedVersion: number, actor: User): Promise<OrganisationSettings> {
  assertUsableModel(model);
  const settings = await getSequelize().transaction(async (transaction) => {
    const row = await getSettings(transaction, 'update');
    if (row.version !== expectedVersion) {
      throw ConflictError(
        'Someone changed the organisation settings since you opened the preview. Look at the preview again before switching.',
        'settings_moved',
      );
    }
    const before = row.cosmologyModel;
    row.set({ cosmologyModel: model, version: row.version + 1, updatedById: actor.id });
    await row.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'settings.cosmology_changed',
        subjectType: 'organisation_settings',
        subjectId: '1',
        data: { before, after: model },
      },
      transaction,
    );
    return row;
  });
  await emitAndWait(settingsEvents, 'cosmologyAdopted', { version: settings.version });
  return settings;
}

/**
 * Changes the band, locale, eye-safety notice, default spectral indices or H0 range. A band change
 * moves magnitudes, a default spectral index can stand in for a missing measurement, and an H0 range
 * moves every cosmological interval (hence the figures shown): each recomputes every statement.
 */
export async function updateSettings(input: SettingsUpdateInput, actor: User): Promise<OrganisationSettings> {
  const settings = await getSequelize().transaction(async (transaction) => {
    const row = await getSettings(transaction, 'update');
    const defaultsChanged =
      (input.defaultBand !== undefined && input.defaultBand !== row.defaultBand) ||
      (input.spectralIndexDefaults !== undefined &&
        JSON.stringify(input.spectralIndexDefaults) !== JSON.stringify(row.spectralIndexDefaults ?? {})) ||
      (input.h0Range !== undefined && JSON.stringify(input.h0Range) !== JSON.stringify(row.h0Range ?? null));
    const noticeChanged = input.eyeSafetyNotice !== undefined && input.eyeSafetyNotice !== row.eyeSafetyNotice;
    row.set({ ...input, updatedById: actor.id, ...(defaultsChanged ? { version: row.version + 1 } : {}) });
    await row.save({ transaction });
    await recordAudit(
      { actorId: actor.id, action: 'settings.updated', subjectType: 'organisation_settings', subjectId: '1', data: { ...input } },
      transaction,
    );
    return { row, defaultsChanged, noticeChanged };
  });
  if (settings.defaultsChanged) await emitAndWait(settingsEvents, 'statementDefaultsChanged', { version: settings.row.version });
  if (settings.noticeChanged) await emitAndWait(settingsEvents, 'eyeSafetyNoticeChanged', { version: settings.row.version });
  return settings.row;
}
