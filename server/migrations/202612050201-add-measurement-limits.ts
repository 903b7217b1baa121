import type { Migration } from './runner.ts';

// The hard physical limits of every quantity, as in shared/catalogue/quantities.ts (where each is
// explained), held by the database too: a raw insert, a script or a future code path cannot store
// a redshift of −2 or a zero uncertainty. Written out here, not read from the shared module, so the
// migration keeps meaning what it meant when it ran. Values are in each quantity's canonical unit.
const VALUE_LIMITS: Array<[quantity: string, predicate: string]> = [
  ['redshift', 'value > -1'],
  ['apparent_magnitude', 'value BETWEEN -30 AND 40'],
  ['extinction', 'value BETWEEN 0 AND 100'],
  ['spectral_index', 'value BETWEEN -10 AND 10'],
  ['parallax', 'value BETWEEN -1000 AND 1000'],
  ['distance', 'value > 0 AND value <= 1e11'],
  ['radius', 'value > 0'],
  ['mass', 'value > 0'],
  ['angular_size', 'value > 0 AND value <= 648000'],
];

const valueConstraint = (quantity: string) => `measurements_${quantity}_range`;

export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    `ALTER TABLE measurements ADD CONSTRAINT measurements_value_finite CHECK (value NOT IN ('NaN', 'Infinity', '-Infinity'))`,
  );
  await q(
    `ALTER TABLE measurements ADD CONSTRAINT measurements_uncertainty_positive
       CHECK ((uncertainty IS NULL OR uncertainty > 0) AND (uncertainty_minus IS NULL OR uncertainty_minus > 0)
              AND (uncertainty_plus IS NULL OR uncertainty_plus > 0))`,
  );
  for (const [quantity, predicate] of VALUE_LIMITS)
    await q(
      `ALTER TABLE measurements ADD CONSTRAINT ${valueConstraint(quantity)} CHECK (quantity <> '${quantity}' OR (${predicate}))`,
    );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  for (const [quantity] of VALUE_LIMITS)
    await q(`ALTER TABLE measurements DROP CONSTRAINT IF EXISTS ${valueConstraint(quantity)}`);
  await q('ALTER TABLE measurements DROP CONSTRAINT IF EXISTS measurements_uncertainty_positive');
  await q('ALTER TABLE measurements DROP CONSTRAINT IF EXISTS measurements_value_finite');
};
