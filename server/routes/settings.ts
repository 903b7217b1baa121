import { Router } from 'express';
import {
  CosmologyChangeSchema,
  CosmologyPreviewSchema,
  SettingsUpdateSchema,
  type SettingsDto,
} from '@shared/schemas/settings.ts';
import type { StatementLocale } from '@shared/statements/index.ts';
import { DEFAULT_H0_RANGE } from '@shared/statements/model-uncertainty.ts';
import { calculate } from '@shared/engine/calculate.ts';
import { BadRequestError } from '../errors.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import type { OrganisationSettings } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { getSettings, changeCosmology, updateSettings } from '../services/settings/index.ts';
import { previewCosmologyChange } from '../services/statements/index.ts';

/** The adopted model's name as the engine labels it. */
function modelLabel(settings: OrganisationSettings): string {
  const probe = calculate({ quantity: 'lookback_time', inputs: { z: 1 }, model: settings.cosmologyModel });
  return 'error' in probe ? 'unusable model' : (probe.model?.label ?? 'unknown');
}

function presentSettings(settings: OrganisationSettings): SettingsDto {
  return {
    cosmologyModel: settings.cosmologyModel,
    cosmologyLabel: modelLabel(settings),
    defaultBand: settings.defaultBand,
    defaultLocale: settings.defaultLocale as StatementLocale,
    eyeSafetyNotice: settings.eyeSafetyNotice,
    spectralIndexDefaults: settings.spectralIndexDefaults ?? {},
    h0Range: settings.h0Range ?? null,
    h0RangeInUse: settings.h0Range ?? DEFAULT_H0_RANGE,
    version: settings.version,
    updatedAt: settings.updatedAt.toISOString(),
  };
}

export const settingsRouter = Router();
settingsRouter.use(requireUser);

settingsRouter.get('/', async (req, res) => {
  authorize(currentUser(req), 'settings', 'read');
  res.json({ data: presentSettings(await getSettings()) });
});

settingsRouter.patch('/', validate(SettingsUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'settings', 'update');
  res.json({ data: presentSettings(await updateSettings(req.body, viewer)) });
});

settingsRouter.post('/cosmology/preview', validate(CosmologyPreviewSchema), async (req, res) => {
  authorize(currentUser(req), 'settings', 'update');
  const { model } = req.body;
  const probe = calculate({ quantity: 'lookback_time', inputs: { z: 1 }, model });
  if ('error' in probe) throw BadRequestError(`This cosmology cannot be used: ${probe.error.message}.`, 'invalid_model');
  const settings = await getSettings();
  const preview = await previewCosmologyChange(model);
  res.json({ data: { ...preview, version: settings.version, proposedLabel: probe.model?.label ?? '' } });
});

settingsRouter.put('/cosmology', validate(CosmologyChangeSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'settings', 'update');
  const { model, expectedVersion } = req.body;
  res.json({ data: presentSettings(await changeCosmology(model, expectedVersion, viewer)) });
});
