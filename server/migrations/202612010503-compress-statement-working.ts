import type { Migration } from './runner.ts';

// A statement's working and model are several kilobytes of JSON that are rewritten on every
// recompute; lz4 compresses and decompresses them several times faster than the default pglz.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE statements ALTER COLUMN working SET COMPRESSION lz4;
    ALTER TABLE statements ALTER COLUMN model SET COMPRESSION lz4;
    ALTER TABLE statements ALTER COLUMN texts SET COMPRESSION lz4;
  `);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE statements ALTER COLUMN working SET COMPRESSION pglz;
    ALTER TABLE statements ALTER COLUMN model SET COMPRESSION pglz;
    ALTER TABLE statements ALTER COLUMN texts SET COMPRESSION pglz;
  `);
};
