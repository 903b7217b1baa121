import type { StatementMeasurement } from '../../shared/statements/index.ts';

/** The source every invented test measurement cites (values for automated checks, not real data). */
export const TEST_SOURCE = { id: 'src-1', citation: 'Values for automated checks' };

/** An invented measurement for statement tests: unitless, no band, citing TEST_SOURCE, unless `extra` says otherwise. */
export const testMeasurement = (
  id: string,
  quantity: string,
  value: number,
  extra: Partial<StatementMeasurement> = {},
): StatementMeasurement => ({ id, quantity, value, unit: '', band: null, source: TEST_SOURCE, ...extra });
