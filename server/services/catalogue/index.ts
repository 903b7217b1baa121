/**
 * The catalogue: sky objects, sources, measurements (and which one is preferred), CSV import and export.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { exportMeasurementsCsv, exportObjectsCsv } from './catalogue-export.ts';
export { checkCatalogueImport } from './catalogue-import-check.ts';
export { commitCatalogueImport } from './catalogue-import-commit.ts';
export { catalogueEvents } from './events.ts';
export { reviewMeasurement } from './measurement-review.ts';
export { findProposal, listProposals } from './proposal-list.ts';
export { proposeSkyObject, proposeSource, reviewProposal } from './proposal-write.ts';
export { createMeasurement, retireMeasurement, updateMeasurement } from './measurement-write.ts';
export { getPreferredMeasurements, type PreferredMeasurement } from './preferred-read.ts';
export { setPreferred } from './preferred-write.ts';
export { listSkyObjects } from './sky-object-list.ts';
export { createSkyObject, deleteSkyObject, updateSkyObject } from './sky-object-write.ts';
export { createSource, updateSource } from './source-write.ts';
export { listSources } from './source-list.ts';
export { measurementsCiting } from './source-list.ts';
export { loadObjectHistory } from './object-history.ts';
