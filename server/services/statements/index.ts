/**
 * Checked statements: creation, recompute, acceptance, public wording and stored workings.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { acceptStatementWording } from './accept.ts';
export { findOrCreateStatement } from './create.ts';
export { statementEvents } from './events.ts';
export { previewCosmologyChange } from './model-preview.ts';
export { loadStatementEvidence } from './statement-evidence.ts';
export { publicNote, publicStatements, publicText, type PublicStatement } from './public-texts.ts';
export { enqueueRecompute, RECOMPUTE_BATCH, RECOMPUTE_JOB, recomputeStatements, runRecomputeJobs } from './recompute.ts';
export { queueRecompute } from './triggers.ts';
export { recomputeAfterRulesRelease } from './rules-release.ts';
export { listStatements, loadStatementView } from './statement-read.ts';
export { statementIncludes } from './statement-read.ts';
