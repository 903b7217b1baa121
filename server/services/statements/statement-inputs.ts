import type { Transaction } from 'sequelize';
import type { UsedInput } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';

/**
 * Records which measurements and sources a new statement uses, so a change to any of them finds it
 * (recomputes keep the links current in bulk; see recompute.ts).
 * @param statementId the statement
 * @param inputs the inputs it used
 * @param transaction the transaction creating the statement
 */
export async function linkStatementInputs(statementId: string, inputs: UsedInput[], transaction: Transaction): Promise<void> {
  if (inputs.length === 0) return;
  await getSequelize().query(
    `INSERT INTO statement_inputs (statement_id, measurement_id, source_id)
       SELECT $1::uuid, l.measurement_id, l.source_id FROM json_to_recordset($2::json) AS l(measurement_id uuid, source_id uuid)
     ON CONFLICT (statement_id, measurement_id) DO NOTHING`,
    {
      bind: [statementId, JSON.stringify(inputs.map((i) => ({ measurement_id: i.measurementId, source_id: i.sourceId })))],
      transaction,
    },
  );
}
