import { findTemplate } from '@shared/statements/index.ts';
import { workingForPeople } from '@shared/statements/working-names.ts';
import type { StatementDto } from '@shared/schemas/statement.ts';
import type { Step } from '@shared/engine/working.ts';
import type { SkyObject, Statement, User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/**
 * The API contract for a statement. The working is included only when given (it is large, and
 * reading it means fetching its skeletons: see readWorking). The cosmology needs `modelDescription`
 * loaded, and a statement about a venue its `venue`.
 */
export function presentStatement(
  statement: Statement,
  object: Pick<SkyObject, 'id' | 'name' | 'kind'>,
  viewer: User,
  { working }: { working?: Step[] } = {},
): StatementDto {
  const venue = statement.venue;
  return {
    id: statement.id,
    object: { id: object.id, name: object.name, kind: object.kind },
    template: { id: statement.templateId, title: findTemplate(statement.templateId)?.title ?? statement.templateId },
    venue: venue ? { id: venue.id, name: venue.name, timeZone: venue.timeZone } : null,
    night: statement.night ? { localDate: statement.night.localDate, observationUtc: statement.night.observationUtc } : null,
    status: statement.status,
    statusReason: statement.statusReason ?? null,
    value: statement.value ?? null,
    unit: statement.unit ?? null,
    interval:
      statement.intervalLow != null && statement.intervalHigh != null
        ? { low: statement.intervalLow, high: statement.intervalHigh }
        : null,
    significantFigures: statement.significantFigures ?? null,
    texts: statement.texts ?? null,
    footnotes: statement.footnotes ?? null,
    acknowledgedTexts: statement.acknowledgedTexts ?? null,
    acknowledgedAt: statement.acknowledgedAt?.toISOString() ?? null,
    inputs: statement.inputs ?? [],
    // People read a measurement by its object, quantity and source, never by its id.
    ...(working ? { working: workingForPeople(working, statement.inputs ?? [], object.name) } : {}),
    warnings: statement.warnings ?? [],
    model: statement.model ?? null,
    computedAt: statement.computedAt.toISOString(),
    can: { recompute: can(viewer, 'statement', 'recompute'), acknowledge: can(viewer, 'statement', 'accept', statement) },
  };
}
