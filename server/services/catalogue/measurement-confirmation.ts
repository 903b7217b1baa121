import { Op, QueryTypes } from 'sequelize';
import { parallaxWarnings, type MeasurementWarning } from '@shared/catalogue/measurement-warnings.ts';
import type { MeasurementConfirmationDto } from '@shared/schemas/measurement.ts';
import { getSequelize } from '../../db.ts';
import { HttpError } from '../../errors.ts';
import { Measurement } from '../../models/index.ts';

/** The larger side of a measurement's uncertainty, or none. */
const sigmaOf = (v: { uncertainty: number | null; uncertaintyMinus: number | null; uncertaintyPlus: number | null }) =>
  v.uncertainty ??
  (v.uncertaintyMinus !== null && v.uncertaintyPlus !== null ? Math.max(v.uncertaintyMinus, v.uncertaintyPlus) : null);

/**
 * The warnings a value needs confirmed before it is stored: for a parallax, compared with the
 * object's other accepted, current parallaxes. Other quantities have none yet.
 * @param exceptId the measurement being edited, left out of the comparison
 */
export async function warningsForValue(
  objectId: string,
  values: {
    quantity: string;
    value: number;
    uncertainty: number | null;
    uncertaintyMinus: number | null;
    uncertaintyPlus: number | null;
  },
  exceptId?: string,
): Promise<MeasurementWarning[]> {
  if (values.quantity !== 'parallax') return [];
  const others = await Measurement.findAll({
    where: {
      skyObjectId: objectId,
      quantity: 'parallax',
      status: 'accepted',
      retiredAt: null,
      ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}),
    },
    attributes: ['value', 'uncertainty', 'uncertaintyMinus', 'uncertaintyPlus'],
  });
  return parallaxWarnings(
    values.value,
    sigmaOf(values),
    others.map((m) => ({ value: m.value, uncertainty: sigmaOf(m) })),
  );
}

/**
 * The object's statements that use a parallax now and can no longer work out a distance once a
 * parallax of zero or below is preferred (their wording, in English, for the reviewer to read).
 */
export async function statementsUsingParallax(objectId: string): Promise<MeasurementConfirmationDto['statements']> {
  return getSequelize().query<{ id: string; text: string }>(
    `SELECT DISTINCT s.id, coalesce(s.texts->>'en-GB', s.template_id) AS text
       FROM statements s
       JOIN statement_inputs si ON si.statement_id = s.id
       JOIN measurements m ON m.id = si.measurement_id AND m.quantity = 'parallax'
      WHERE s.sky_object_id = $1 AND s.status <> 'broken'
      ORDER BY text LIMIT 50`,
    { type: QueryTypes.SELECT, bind: [objectId] },
  );
}

/**
 * Refuses a request whose warnings have not been confirmed: 409 `confirmation_needed`, with the
 * warnings (and the statements at stake) in `current`, for the client to show before it asks again
 * with `confirm: true`. Nothing has been written.
 */
export function requireConfirmation(
  confirmed: boolean,
  warnings: MeasurementWarning[],
  statements: MeasurementConfirmationDto['statements'] = [],
): void {
  if (confirmed || warnings.length === 0) return;
  const current: MeasurementConfirmationDto = { warnings, statements };
  throw new HttpError(409, 'confirmation_needed', `Please confirm: ${warnings.map((w) => w.message).join(' ')}`, undefined, {
    current,
  });
}
