import type { Sequelize } from 'sequelize';
import { getSequelize } from '../db.ts';
import { AuditEvent } from './audit-event.ts';
import { AuthToken } from './auth-token.ts';
import { initCatalogueModels } from './catalogue-models.ts';
import { Media } from './media.ts';
import { MediaRendition } from './media-rendition.ts';
import { OrganisationSettings } from './organisation-settings.ts';
import { OutboxMessage } from './outbox-message.ts';
import { Statement } from './statement.ts';
import { TimelineEntry } from './timeline-entry.ts';
import { CosmologyDescription } from './cosmology-description.ts';
import { User } from './user.ts';
import { Venue } from './venue.ts';
import { KioskScreen } from './kiosk-screen.ts';
import { SkySnapshot } from './sky-snapshot.ts';
import { initPageModels } from './page-models.ts';
import { initChannelModels } from './channel-models.ts';

export { AuditEvent, AuthToken, OutboxMessage, User, Venue };
export type { TokenPurpose } from './auth-token.ts';
export { CatalogueImport, CatalogueProposal, Measurement, MeasurementHistory, SkyObject, Source } from './catalogue-models.ts';
export { Media, MediaRendition };
export { CosmologyDescription, OrganisationSettings, Statement, TimelineEntry };
export type { StatementStatus } from './statement.ts';
export { KioskScreen, SkySnapshot };
export { Page, PageComment, PageNumberFlag, PageRevision, PageSignoff, PageVersionGroup } from './page-models.ts';
export { Channel, ChannelScreen, ChannelSlide } from './channel-models.ts';

let initialised: Sequelize | undefined;

/** Binds every model to the Sequelize instance and sets up associations; safe to call twice. */
export function initModels(sequelize: Sequelize = getSequelize()): Sequelize {
  if (initialised === sequelize) return sequelize;
  for (const model of [User, AuthToken, AuditEvent, OutboxMessage, Venue]) model.initModel(sequelize);

  Media.initModel(sequelize);
  MediaRendition.initModel(sequelize);

  initCatalogueModels(sequelize);

  OrganisationSettings.initModel(sequelize);
  CosmologyDescription.initModel(sequelize);
  Statement.initModel(sequelize);
  TimelineEntry.initModel(sequelize);

  KioskScreen.initModel(sequelize);
  SkySnapshot.initModel(sequelize);

  initPageModels(sequelize);
  initChannelModels(sequelize);

  // associations
  AuthToken.belongsTo(User, { foreignKey: 'userId' });
  AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  Media.hasMany(MediaRendition, { foreignKey: 'mediaId', as: 'renditions' });
  Media.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });

  Statement.belongsTo(CosmologyDescription, { foreignKey: 'modelId', as: 'modelDescription' });
  Statement.belongsTo(Venue, { foreignKey: 'venueId', as: 'venue' });

  KioskScreen.belongsTo(Venue, { foreignKey: 'venueId', as: 'venue' });
  Venue.hasMany(KioskScreen, { foreignKey: 'venueId', as: 'screens' });

  initialised = sequelize;
  return sequelize;
}
